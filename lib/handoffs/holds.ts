// Which holds a record places: a rule already holding the trailer for the same item is not
// placed twice. Pure.
import type { Hold, HoldSeverity } from '@/lib/engine';
import { englishReason } from '@/lib/i18n/reasons';

type Keyed = { ruleKey: string; itemKey: string | null };

const keyOf = (h: Keyed) => `${h.ruleKey}|${h.itemKey ?? ''}`;

/** The holds of `found` whose rule and item are not among the trailer's `open` holds. */
export function holdsNotYetOpen(found: readonly Hold[], open: readonly Keyed[]): Hold[] {
  const already = new Set(open.map(keyOf));
  return found.filter((h) => !already.has(keyOf(h)));
}

/** A reason as a code with parameters (lib/engine/types/codes.ts), rendered by lib/i18n/reasons.ts. */
export type CodedText = { code: string; params: unknown };

/**
 * What a refused hook tells the driver about each hold: its reason and caution in English (as
 * stored) and as codes for the reader's language, how severe it is.
 */
export type HoldReason = {
  reason: string;
  reasonCoded: CodedText | null;
  severity: HoldSeverity;
  restriction: string | null;
  caution: string | null;
  cautionCoded: CodedText | null;
};

/** A hold found now (the engine's, coded) or an open one read back (English, with its codes when stored). */
type HoldShape = {
  reason: string | CodedText;
  severity: HoldSeverity;
  restriction: string | null;
  caution?: string | CodedText | null;
  reasonCode?: string | null;
  reasonParams?: unknown;
  cautionCode?: string | null;
  cautionParams?: unknown;
};

function both(
  text: string | CodedText | null | undefined,
  code: string | null | undefined,
  params: unknown,
  timeZone: string,
): [string | null, CodedText | null] {
  if (text === null || text === undefined) return [null, null];
  if (typeof text !== 'string') return [englishReason(text, timeZone), text];
  return [text, code ? { code, params: params ?? {} } : null];
}

export const holdReasons = (holds: readonly HoldShape[], timeZone: string): HoldReason[] =>
  holds.map((h) => {
    const [reason, reasonCoded] = both(h.reason, h.reasonCode, h.reasonParams, timeZone);
    const [caution, cautionCoded] = both(h.caution, h.cautionCode, h.cautionParams, timeZone);
    return {
      reason: reason ?? '',
      reasonCoded,
      severity: h.severity,
      restriction: h.restriction,
      caution,
      cautionCoded,
    };
  });

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
