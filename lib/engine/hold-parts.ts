// The parts every hold is made of: the cautions shown with it, and one constructor that attaches
// the right caution to each severity and restriction.
import type { Hold, HoldSeverity, Restriction } from './types';

/** Shown with every out-of-service hold. */
export const OUT_OF_SERVICE_CAUTION =
  'Do not move this trailer on a public road until a qualified technician has repaired it. ' +
  "Chock the wheels and set the brakes before going under it. Hitchmark's checks support, " +
  "and do not replace, the driver's inspection under 49 CFR 396.11 and 396.13.";

/** Shown with a "yard moves only" hold. */
export const YARD_ONLY_CAUTION =
  'Yard moves only: this trailer does not leave the gate until the fault is fixed. In the yard, ' +
  'couple with the usual checks (tug test, kingpin locked, landing gear up, air and electrical lines) ' +
  'and move it slowly. Local codes, company policy and licensed mechanics decide.';

/** Shown with a "no perishable loads" hold. */
export const NO_PERISHABLE_CAUTION =
  'No perishable load until the repair is made: the box may not hold its temperature. ' +
  'A licensed mechanic or the refrigeration shop decides when it is fixed.';

export const UNDER_TRAILER_CAUTION =
  'Chock the wheels and set the brakes before going under the trailer; never crawl under one ' +
  'that is not coupled or on its landing gear on firm ground.';

export function hold(
  ruleKey: string,
  itemKey: string | null,
  reason: string,
  severity: HoldSeverity,
  restriction: Restriction | null,
  source: string,
  caution: string | null = null,
): Hold {
  return {
    ruleKey,
    itemKey,
    reason,
    severity,
    restriction,
    source,
    caution:
      severity === 'out_of_service'
        ? OUT_OF_SERVICE_CAUTION
        : (caution ?? (restriction === 'yard_only' ? YARD_ONLY_CAUTION : NO_PERISHABLE_CAUTION)),
  };
}
