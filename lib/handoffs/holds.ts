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

/** What a refused hook tells the driver about each hold: its reason, how severe it is, its caution. */
export type HoldReason = {
  reason: string;
  severity: HoldSeverity;
  restriction: string | null;
  caution: string | null;
};

type HoldShape = {
  reason: string;
  severity: HoldSeverity;
  restriction: string | null;
  caution?: string | null;
};

export const holdReasons = (holds: readonly HoldShape[]): HoldReason[] =>
  holds.map((h) => ({
    reason: h.reason,
    severity: h.severity,
    restriction: h.restriction,
    caution: h.caution ?? null,
  }));

/** Words of the gate's hook refusals and the perishable question (one place, for translation). */
export const HOOK_WORDS = {
  perishableQuestion: 'Is the load perishable?',
  perishableAsk: (unit: string) =>
    `Trailer ${unit} is restricted: no perishable loads. Say whether this load is perishable.`,
  perishableField: 'This trailer may not carry a perishable load: say whether this load is perishable.',
  refused: (unit: string, because: 'out_of_service' | 'yard_only' | 'perishable_load', foundNow: boolean) => {
    const tail = foundNow ? ' The trailer is now on hold; tell the terminal clerk.' : '';
    if (because === 'out_of_service')
      return foundNow
        ? `What you recorded puts trailer ${unit} out of service: it may not leave the gate.${tail}`
        : `Trailer ${unit} is out of service and may not leave the gate.`;
    if (because === 'yard_only')
      return foundNow
        ? `What you recorded restricts trailer ${unit} to yard moves only: it may not leave the gate.${tail}`
        : `Trailer ${unit} is restricted to yard moves only and may not leave the gate.`;
    return `Trailer ${unit} may not carry a perishable load (restricted: no perishable loads). Take another trailer for this load.${tail}`;
  },
} as const;
