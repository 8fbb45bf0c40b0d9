import { z } from 'zod';
import type { YardPolicy } from './types';

// The terminal's yard rules live in policies.data next to the engine's. When a terminal has no
// figure yet, these are Hitchmark's starting values (common practice, not a regulation).
export const DEFAULT_YARD_POLICY: YardPolicy = { freeTimeHours: 48, lowFuelEighths: 4 };

const yardPolicySchema = z.object({
  freeTimeHours: z
    .number()
    .positive()
    .max(24 * 365)
    .catch(DEFAULT_YARD_POLICY.freeTimeHours),
  lowFuelEighths: z.number().int().min(0).max(8).catch(DEFAULT_YARD_POLICY.lowFuelEighths),
});

/** Reads the yard figures out of a stored policy document; bad or absent values fall back to the defaults. */
export function yardPolicyOf(data: unknown): YardPolicy {
  const parsed = yardPolicySchema.safeParse(data ?? {});
  return parsed.success ? parsed.data : DEFAULT_YARD_POLICY;
}
