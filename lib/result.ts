// The one shape of an expected refusal, shared by services, server actions and route handlers.
// Services return `Result`; inside a transaction they `abort` (throw) so the work rolls back, and
// `settle` turns the throw back into a value. HTTP statuses live only in lib/server/api.ts.

export type RefusalCode =
  | 'bad_request'
  | 'unauthenticated'
  | 'forbidden'
  | 'not_found'
  | 'conflict'
  | 'gone'
  | 'too_large'
  | 'unsupported_type'
  | 'invalid'
  | 'locked'
  | 'too_many'
  | 'unavailable';

export type FieldErrors = Record<string, string[]>;

export type Refusal = {
  ok: false;
  code: RefusalCode;
  message: string;
  fieldErrors?: FieldErrors;
  /** Extra facts a caller may show (for example the holds that refused a hook). */
  detail?: Record<string, unknown>;
};

export type Done<T> = { ok: true; value: T };
export type Result<T = void> = Done<T> | Refusal;

export const done = <T>(value: T): Done<T> => ({ ok: true, value });

export function refuse(
  code: RefusalCode,
  message: string,
  fieldErrors?: FieldErrors,
  detail?: Record<string, unknown>,
): Refusal {
  return {
    ok: false,
    code,
    message,
    ...(fieldErrors && Object.keys(fieldErrors).length ? { fieldErrors } : {}),
    ...(detail ? { detail } : {}),
  };
}

/** A refusal about one field: the message shows under that field and as the form's summary. */
export function refuseField(code: RefusalCode, field: string, message: string, summary = message): Refusal {
  return refuse(code, summary, { [field]: [message] });
}

export function isRefusal(value: unknown): value is Refusal {
  return (
    typeof value === 'object' &&
    value !== null &&
    (value as { ok?: unknown }).ok === false &&
    typeof (value as { code?: unknown }).code === 'string'
  );
}

/** Thrown by `abort` so a transaction rolls back; carries the refusal to `settle`. */
export class RefusalError extends Error {
  constructor(readonly refusal: Refusal) {
    super(refusal.message);
    this.name = 'RefusalError';
  }
}

export function abort(refusal: Refusal): never {
  throw new RefusalError(refusal);
}

/** Runs work that may `abort`; an abort comes back as its refusal, anything else is rethrown. */
export async function settle<T>(work: () => Promise<T>): Promise<T | Refusal> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof RefusalError) return error.refusal;
    throw error;
  }
}

/** What a server action answers its form with. `values` refills the form (never secrets). */
export type ActionState = {
  ok: boolean;
  message?: string;
  formError?: string;
  fieldErrors?: FieldErrors;
  values?: Record<string, string>;
};

export const IDLE: ActionState = { ok: false };
