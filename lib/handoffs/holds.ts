// Which holds a record places: a rule already holding the trailer for the same item is not
// placed twice. Pure.
import type { Hold, HoldSeverity } from '@/lib/engine';

type Keyed = { ruleKey: string; itemKey: string | null };

const keyOf = (h: Keyed) => `${h.ruleKey}|${h.itemKey ?? ''}`;

/** The holds of `found` whose rule and item are not among the trailer's `open` holds. */
export function holdsNotYetOpen(found: readonly Hold[], open: readonly Keyed[]): Hold[] {
  const already = new Set(open.map(keyOf));
  return found.filter((h) => !already.has(keyOf(h)));
}

/** What a refused hook tells the driver about each hold: its reason and how severe it is. */
export type HoldReason = { reason: string; severity: HoldSeverity };

export const holdReasons = (holds: readonly { reason: string; severity: HoldSeverity }[]): HoldReason[] =>
  holds.map((h) => ({ reason: h.reason, severity: h.severity }));
