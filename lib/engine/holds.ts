import type {
  Checklist,
  EnginePolicy,
  Hold,
  HoldSeverity,
  InspectionEvent,
  ItemObservation,
  Restriction,
} from './types';

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

const UNDER_TRAILER_CAUTION =
  'Chock the wheels and set the brakes before going under the trailer; never crawl under one ' +
  'that is not coupled or on its landing gear on firm ground.';

export interface HoldInput {
  checklist: Checklist;
  /** The inspection the holds are evaluated on (a drop, hook or yard walk). */
  event: InspectionEvent;
  now: Date;
  policy: EnginePolicy;
}

function hold(
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

function itemHolds(
  key: string,
  label: string,
  kind: string,
  o: ItemObservation,
  policy: EnginePolicy,
): Hold[] {
  const out: Hold[] = [];
  if (kind === 'pin' && (o.isEngaged === false || o.condition === 'missing')) {
    out.push(
      hold(
        'pin_not_engaged',
        key,
        `${label} is not engaged.`,
        'out_of_service',
        null,
        '49 CFR 393.207(b); common practice: any one pin not engaged counts',
      ),
    );
  }
  if (kind === 'spare') {
    const problem =
      o.condition === 'missing'
        ? 'is missing'
        : o.isMounted === false
          ? 'is not on its wheel'
          : o.isHoldingAir === false
            ? 'is not holding air'
            : null;
    if (problem) {
      const sev = policy.spareHoldSeverity;
      out.push(
        hold(
          'spare_unusable',
          key,
          `${label} ${problem}.`,
          sev,
          sev === 'restricted' ? 'yard_only' : null,
          'common practice: a spare counts only when present, mounted and holding air',
          UNDER_TRAILER_CAUTION,
        ),
      );
    }
  }
  if (kind === 'tire') {
    if (o.treadThirtySeconds !== undefined && o.treadThirtySeconds < policy.minTreadThirtySeconds) {
      out.push(
        hold(
          'tire_tread_low',
          key,
          `${label} has ${o.treadThirtySeconds}/32 in tread, under ${policy.minTreadThirtySeconds}/32 in.`,
          'out_of_service',
          null,
          '49 CFR 393.75(c): at least 2/32 inch on trailer tires',
        ),
      );
    }
    if (o.isHoldingAir === false) {
      out.push(
        hold(
          'tire_not_holding_air',
          key,
          `${label} is not holding air.`,
          'out_of_service',
          null,
          '49 CFR 393.75(a): no tire flat or with an audible leak',
        ),
      );
    }
  }
  if (kind === 'skin' && o.isInsulationShowing === true) {
    out.push(
      hold(
        'insulation_showing',
        key,
        `${label}: insulation is showing.`,
        'restricted',
        'no_perishable',
        'common practice: no perishable load until the damage is sealed watertight',
      ),
    );
  }
  if (kind === 'hinge' && o.isLocking === false) {
    out.push(
      hold(
        'hinge_not_locking',
        key,
        `${label} does not lock.`,
        'restricted',
        'no_perishable',
        'common practice: a hinge that does not lock leaves an air gap at the door',
      ),
    );
  }
  if (kind === 'leak' && o.isLeaking === true) {
    out.push(
      hold(
        'fuel_leak',
        key,
        `${label}: fuel is leaking.`,
        'out_of_service',
        null,
        '49 CFR 396.7: not operated in a condition likely to cause an accident or breakdown; common practice',
      ),
    );
  }
  if (o.condition === 'unsafe' && !out.some((h) => h.severity === 'out_of_service')) {
    out.push(
      hold(
        'item_unsafe',
        key,
        `${label} was recorded unsafe.`,
        'out_of_service',
        null,
        '49 CFR 396.7: not operated in a condition likely to cause an accident or breakdown',
      ),
    );
  }
  return out;
}

function preTripHolds(event: InspectionEvent, now: Date, policy: EnginePolicy): Hold[] {
  const preTrip = event.reefer?.preTrip ?? null;
  const source = 'common practice: a reefer load needs a passed pre-trip; maximum age is terminal policy';
  if (!preTrip) {
    return [
      hold('pre_trip_missing', null, 'No reefer pre-trip on record.', 'restricted', 'no_perishable', source),
    ];
  }
  if (preTrip.result === 'failed') {
    return [
      hold(
        'pre_trip_failed',
        null,
        'The last reefer pre-trip failed.',
        'restricted',
        'no_perishable',
        source,
      ),
    ];
  }
  const ageHours = (now.getTime() - preTrip.at.getTime()) / 3_600_000;
  if (ageHours > policy.preTripMaxAgeHours) {
    return [
      hold(
        'pre_trip_stale',
        null,
        `The last passed pre-trip is ${Math.floor(ageHours)} h old; policy allows ${policy.preTripMaxAgeHours} h.`,
        'restricted',
        'no_perishable',
        source,
      ),
    ];
  }
  return [];
}

/**
 * Turns one inspection's observations and readings into holds. Only items the event actually
 * inspected are judged; a `not_checked` item places no hold (and clears none).
 * Pre-trip rules apply to reefers on full handoffs only (yard walks do not read the pre-trip).
 */
export function evaluateHolds({ checklist, event, now, policy }: HoldInput): Hold[] {
  const holds: Hold[] = [];
  for (const item of checklist.items) {
    if (item.kind === 'reading') continue;
    const o = event.items[item.key];
    if (!o || o.condition === 'not_checked') continue;
    holds.push(...itemHolds(item.key, item.label, item.kind, o, policy));
  }
  if (checklist.spec.kind === 'reefer' && event.type !== 'walk')
    holds.push(...preTripHolds(event, now, policy));
  return holds;
}

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
