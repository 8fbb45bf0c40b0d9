import 'server-only';
import type { Refusal } from '@/lib/yard/result';
import { apiError } from './api';

/** A yard write's refusal as the shared `{ code, message, fieldErrors }` body with its 4xx status. */
export function refusalResponse(r: Refusal) {
  return apiError(r.code, r.message, r.field ? { [r.field]: [r.message] } : undefined);
}

export const noTerminal = () =>
  apiError('not_found', 'Your account has no home terminal; ask an admin to set one.');
