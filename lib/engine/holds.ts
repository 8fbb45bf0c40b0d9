// Turns one inspection into holds: per item (tires, pins, spare, doors, landing gear, reefer) and,
// for a reefer's full handoff, the pre-trip. The caution each hold carries comes from hold-parts.ts.
import type { Checklist, EnginePolicy, Hold, InspectionEvent, ItemObservation } from './types';
import { reason } from './codes';
import { hold, UNDER_TRAILER_CAUTION } from './hold-parts';

export interface HoldInput {
  checklist: Checklist;
  /** The inspection the holds are evaluated on (a drop, hook or yard walk). */
  event: InspectionEvent;
  now: Date;
  policy: EnginePolicy;
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
        reason('hold.pin_not_engaged', { item: key, label }),
        'out_of_service',
        null,
        '49 CFR 393.207(b); common practice: any one pin not engaged counts',
      ),
    );
  }
  if (kind === 'spare') {
    const problem =
      o.condition === 'missing'
        ? 'missing'
        : o.isMounted === false
          ? 'off_wheel'
          : o.isHoldingAir === false
            ? 'flat'
            : null;
    if (problem) {
      const sev = policy.spareHoldSeverity;
      out.push(
        hold(
          'spare_unusable',
          key,
          reason('hold.spare_unusable', { item: key, label, problem }),
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
          reason('hold.tire_tread_low', {
            item: key,
            label,
            tread: o.treadThirtySeconds,
            min: policy.minTreadThirtySeconds,
          }),
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
          reason('hold.tire_not_holding_air', { item: key, label }),
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
        reason('hold.insulation_showing', { item: key, label }),
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
        reason('hold.hinge_not_locking', { item: key, label }),
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
        reason('hold.fuel_leak', { item: key, label }),
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
        reason('hold.item_unsafe', { item: key, label }),
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
      hold(
        'pre_trip_missing',
        null,
        reason('hold.pre_trip_missing', {}),
        'restricted',
        'no_perishable',
        source,
      ),
    ];
  }
  if (preTrip.result === 'failed') {
    return [
      hold(
        'pre_trip_failed',
        null,
        reason('hold.pre_trip_failed', {}),
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
        reason('hold.pre_trip_stale', {
          ageHours: Math.floor(ageHours),
          maxHours: policy.preTripMaxAgeHours,
        }),
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
