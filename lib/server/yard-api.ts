import 'server-only';
import { refuse, type Refusal } from '@/lib/result';
import type { Refusal as YardRefusal } from '@/lib/yard/result';

/** A yard write's refusal in the shared shape, its message under the field it concerns. */
export function fromYardRefusal(r: YardRefusal): Refusal {
  return refuse(r.code, r.message, r.field ? { [r.field]: [r.message] } : undefined);
}

export const NO_TERMINAL = refuse('not_found', 'Your account has no home terminal; ask an admin to set one.');
