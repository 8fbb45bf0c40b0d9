/** An expected refusal from a yard write: the route maps `code` to a 4xx, the form shows `message`. */
export type Refusal = {
  ok: false;
  code: 'not_found' | 'conflict' | 'invalid';
  message: string;
  field?: string;
};

export function refuse(code: Refusal['code'], message: string, field?: string): Refusal {
  return field ? { ok: false, code, message, field } : { ok: false, code, message };
}

/** What a yard server action answers an inline form with. */
export type ActionState = { ok: boolean; message?: string; fieldErrors?: Record<string, string[]> };
export const IDLE: ActionState = { ok: false };
