// The gate's decision on a hook, from the trailer's holds.
import type { Hold, HoldSeverity } from './types';

/** True when any hold blocks a hook (severity `out_of_service`). */
export function blocksHook(holds: readonly Hold[]): boolean {
  return holds.some((h) => h.severity === 'out_of_service');
}

/** What the gate decides about a hook from the trailer's holds (open ones and those this record found). */
export type HookDecision<H> =
  | { outcome: 'allowed'; askedPerishable: boolean }
  | { outcome: 'refused'; because: 'out_of_service' | 'yard_only' | 'perishable_load'; holds: H[] }
  | { outcome: 'ask_perishable'; holds: H[] };

type HoldLike = { severity: HoldSeverity; restriction: string | null };

/**
 * A hook is refused by any out-of-service hold, then by any "yard moves only" hold; a
 * "no perishable loads" hold asks whether the load is perishable (`isLoadPerishable` null or
 * undefined: ask) and refuses a perishable one. `askedPerishable` says the answer is to be recorded.
 */
export function decideHook<H extends HoldLike>(
  holds: readonly H[],
  isLoadPerishable: boolean | null | undefined,
): HookDecision<H> {
  const oos = holds.filter((h) => h.severity === 'out_of_service');
  if (oos.length) return { outcome: 'refused', because: 'out_of_service', holds: oos };
  const yard = holds.filter((h) => h.severity === 'restricted' && h.restriction === 'yard_only');
  if (yard.length) return { outcome: 'refused', because: 'yard_only', holds: yard };
  const cold = holds.filter((h) => h.severity === 'restricted' && h.restriction === 'no_perishable');
  if (!cold.length) return { outcome: 'allowed', askedPerishable: false };
  if (typeof isLoadPerishable !== 'boolean') return { outcome: 'ask_perishable', holds: cold };
  if (isLoadPerishable) return { outcome: 'refused', because: 'perishable_load', holds: cold };
  return { outcome: 'allowed', askedPerishable: true };
}
