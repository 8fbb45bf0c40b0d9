import 'server-only';
import { z } from 'zod';

const STATUS = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  too_large: 413,
  unsupported_type: 415,
  invalid: 422,
  locked: 423,
  too_many: 429,
} as const;
export type ApiErrorCode = keyof typeof STATUS;

/** The one shape every route handler answers an expected failure with: `{ code, message, fieldErrors? }`. */
export function apiError(code: ApiErrorCode, message: string, fieldErrors?: Record<string, string[]>) {
  return Response.json({ code, message, ...(fieldErrors ? { fieldErrors } : {}) }, { status: STATUS[code] });
}

export function invalid(error: z.ZodError, message = 'Some fields need attention.') {
  const flat = z.flattenError(error);
  const fieldErrors = Object.fromEntries(
    Object.entries(flat.fieldErrors as Record<string, string[] | undefined>).filter(([, v]) => v && v.length),
  ) as Record<string, string[]>;
  return apiError('invalid', flat.formErrors[0] ?? message, fieldErrors);
}

/** Reads a JSON body; a body that is not JSON is a 400, never a 500. */
export async function readJson(
  request: Request,
): Promise<{ ok: true; body: unknown } | { ok: false; response: Response }> {
  try {
    return { ok: true, body: await request.json() };
  } catch {
    return { ok: false, response: apiError('bad_request', 'The request body must be JSON.') };
  }
}
