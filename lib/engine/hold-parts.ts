// The parts every hold is made of: the cautions shown with it, and one constructor that attaches
// the right caution to each severity and restriction. Cautions are codes; their words (English and
// Spanish) are in lib/i18n/messages/*/Reasons.json.
import { reason } from './codes';
import type { Hold, HoldSeverity, Reason, Restriction } from './types';

/** Shown with every out-of-service hold: no road until repaired, chock and brake, 49 CFR 396.11/396.13. */
export const OUT_OF_SERVICE_CAUTION: Reason = reason('caution.out_of_service', {});

/** Shown with a "yard moves only" hold: couple with the usual checks, move slowly. */
export const YARD_ONLY_CAUTION: Reason = reason('caution.yard_only', {});

/** Shown with a "no perishable loads" hold: the box may not hold its temperature. */
export const NO_PERISHABLE_CAUTION: Reason = reason('caution.no_perishable', {});

/** Shown with holds that send someone under the trailer: chock, brake, never under an uncoupled one. */
export const UNDER_TRAILER_CAUTION: Reason = reason('caution.under_trailer', {});

export function hold(
  ruleKey: string,
  itemKey: string | null,
  why: Reason,
  severity: HoldSeverity,
  restriction: Restriction | null,
  source: string,
  caution: Reason | null = null,
): Hold {
  return {
    ruleKey,
    itemKey,
    reason: why,
    severity,
    restriction,
    source,
    caution:
      severity === 'out_of_service'
        ? OUT_OF_SERVICE_CAUTION
        : (caution ?? (restriction === 'yard_only' ? YARD_ONLY_CAUTION : NO_PERISHABLE_CAUTION)),
  };
}
