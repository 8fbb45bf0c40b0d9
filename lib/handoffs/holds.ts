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

export { HOOK_WORDS } from './hook-words';
