import { describe, expect, it } from 'vitest';
import {
  blocksHook,
  buildChecklist,
  decideHook,
  defaultPolicy,
  evaluateHolds,
  makePolicy,
  NO_PERISHABLE_CAUTION,
  OUT_OF_SERVICE_CAUTION,
  YARD_ONLY_CAUTION,
} from '@/lib/engine';
import type { HandoffEvent, ItemObservations, ReeferReadings } from '@/lib/engine';
import { renderCoded } from '@/lib/i18n/reasons';
import { drop, northwind, walk } from './fixtures';

// cautions are codes; their English comes from the renderer (lib/i18n/reasons.ts)
const english = (r: Parameters<typeof renderCoded>[0]) => renderCoded(r, 'en', 'UTC');

const reefer = buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
const van = buildChecklist({ kind: 'dry_van', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
const NOW = new Date('2026-11-05T15:00:00Z');
const freshPreTrip: ReeferReadings = { preTrip: { result: 'passed', at: new Date('2026-11-05T12:00:00Z') } };

function holdsFor(
  items: ItemObservations,
  extra: Partial<HandoffEvent> = {},
  checklist = reefer,
  policy = defaultPolicy,
) {
  const event = drop('2026-11-05T14:00:00Z', northwind, items, { reefer: freshPreTrip, ...extra });
  return evaluateHolds({ checklist, event, now: NOW, policy });
}
const rules = (hs: ReturnType<typeof holdsFor>) => hs.map((h) => h.ruleKey);

describe('evaluateHolds', () => {
  it('places no hold on a clean trailer with a fresh passed pre-trip', () => {
    const items: ItemObservations = {};
    for (const i of reefer.items) if (i.kind !== 'reading') items[i.key] = { condition: 'ok' };
    expect(holdsFor(items)).toEqual([]);
  });

  it('any one locking pin not engaged → out of service (49 CFR 393.207(b); common practice: any pin)', () => {
    const hs = holdsFor({
      'undercarriage.tandem_pin.left_front': { condition: 'ok', isEngaged: true },
      'undercarriage.tandem_pin.right_rear': { condition: 'ok', isEngaged: false },
    });
    expect(hs).toHaveLength(1);
    expect(hs[0]).toMatchObject({
      ruleKey: 'pin_not_engaged',
      itemKey: 'undercarriage.tandem_pin.right_rear',
      severity: 'out_of_service',
    });
    expect(hs[0].source).toContain('393.207(b)');
    expect(hs[0].caution).toBe(OUT_OF_SERVICE_CAUTION);
    expect(english(hs[0].caution)).toContain('396.11');
    expect(blocksHook(hs)).toBe(true);
  });

  it('tread under 2/32 in is out of service; exactly 2/32 is not (49 CFR 393.75(c))', () => {
    const low = holdsFor({
      'tires.axle2.left_inner': { condition: 'ok', treadThirtySeconds: 1, isHoldingAir: true },
    });
    expect(low.map((h) => [h.ruleKey, h.severity])).toEqual([['tire_tread_low', 'out_of_service']]);
    expect(low[0].source).toContain('393.75(c)');
    const atLimit = holdsFor({
      'tires.axle2.left_inner': { condition: 'ok', treadThirtySeconds: 2, isHoldingAir: true },
    });
    expect(atLimit).toEqual([]);
  });

  it('a tire not holding air is out of service (49 CFR 393.75(a))', () => {
    const hs = holdsFor({
      'tires.axle1.right_outer': { condition: 'damaged', treadThirtySeconds: 10, isHoldingAir: false },
    });
    expect(hs.map((h) => h.ruleKey)).toEqual(['tire_not_holding_air']);
    expect(hs[0].source).toContain('393.75(a)');
  });

  it('spare missing, off its wheel or flat → restricted yard only by default (common practice)', () => {
    for (const o of [
      { condition: 'missing' as const },
      { condition: 'ok' as const, isMounted: false, isHoldingAir: true },
      { condition: 'ok' as const, isMounted: true, isHoldingAir: false },
    ]) {
      const hs = holdsFor({ 'undercarriage.spare_tire': o });
      expect(hs).toHaveLength(1);
      expect(hs[0]).toMatchObject({
        ruleKey: 'spare_unusable',
        severity: 'restricted',
        restriction: 'yard_only',
      });
      expect(english(hs[0].caution)).toContain('Chock the wheels');
    }
    expect(
      holdsFor({ 'undercarriage.spare_tire': { condition: 'ok', isMounted: true, isHoldingAir: true } }),
    ).toEqual([]);
  });

  it('spare severity is policy data: a terminal may make it out of service', () => {
    const hs = holdsFor(
      { 'undercarriage.spare_tire': { condition: 'missing' } },
      {},
      reefer,
      makePolicy({ spareHoldSeverity: 'out_of_service' }),
    );
    expect(hs[0]).toMatchObject({
      severity: 'out_of_service',
      restriction: null,
      caution: OUT_OF_SERVICE_CAUTION,
    });
  });

  it('insulation showing and a hinge not locking → restricted, no perishable (common practice)', () => {
    const hs = holdsFor({
      'interior.left_wall': { condition: 'damaged', isInsulationShowing: true },
      'rear.door_right.hinge_1': { condition: 'damaged', isLocking: false },
    });
    // Holds come in checklist order: rear before interior.
    expect(hs.map((h) => [h.ruleKey, h.severity, h.restriction])).toEqual([
      ['hinge_not_locking', 'restricted', 'no_perishable'],
      ['insulation_showing', 'restricted', 'no_perishable'],
    ]);
    expect(blocksHook(hs)).toBe(false);
  });

  it('a fuel leak is out of service', () => {
    const hs = holdsFor({ 'undercarriage.fuel_tank.leaks': { condition: 'damaged', isLeaking: true } });
    expect(hs.map((h) => [h.ruleKey, h.severity])).toEqual([['fuel_leak', 'out_of_service']]);
  });

  it('an item recorded unsafe is out of service once, even with a specific rule', () => {
    expect(rules(holdsFor({ 'undercarriage.landing_gear.cross_shaft': { condition: 'unsafe' } }))).toEqual([
      'item_unsafe',
    ]);
    expect(
      rules(holdsFor({ 'undercarriage.tandem_pin.left_rear': { condition: 'unsafe', isEngaged: false } })),
    ).toEqual(['pin_not_engaged']);
  });

  it('pre-trip failed, missing or older than the policy allows → restricted no perishable', () => {
    const failed = holdsFor(
      {},
      { reefer: { preTrip: { result: 'failed', at: new Date('2026-11-05T12:00:00Z') } } },
    );
    expect(failed.map((h) => [h.ruleKey, h.restriction])).toEqual([['pre_trip_failed', 'no_perishable']]);
    expect(rules(holdsFor({}, { reefer: null }))).toEqual(['pre_trip_missing']);
    // policy 72 h; 73 h before NOW is stale, exactly 72 h is still allowed.
    const at = (h: number) => new Date(NOW.getTime() - h * 3_600_000);
    expect(rules(holdsFor({}, { reefer: { preTrip: { result: 'passed', at: at(73) } } }))).toEqual([
      'pre_trip_stale',
    ]);
    expect(holdsFor({}, { reefer: { preTrip: { result: 'passed', at: at(72) } } })).toEqual([]);
    const strict = makePolicy({ preTripMaxAgeHours: 2 });
    expect(rules(holdsFor({}, {}, reefer, strict))).toEqual(['pre_trip_stale']);
  });

  it('no pre-trip rule for a dry van or on a yard walk', () => {
    expect(holdsFor({}, { reefer: null }, van)).toEqual([]);
    const w = walk('2026-11-05T14:00:00Z', {});
    expect(evaluateHolds({ checklist: reefer, event: w, now: NOW, policy: defaultPolicy })).toEqual([]);
  });

  it('a not_checked item places no hold, whatever else was typed', () => {
    expect(
      holdsFor({ 'undercarriage.tandem_pin.left_front': { condition: 'not_checked', isEngaged: false } }),
    ).toEqual([]);
  });

  it('a yard walk quick check can place a hold', () => {
    const w = walk('2026-11-05T14:00:00Z', {
      'tires.axle1.left_outer': { condition: 'damaged', isHoldingAir: false },
    });
    const hs = evaluateHolds({ checklist: reefer, event: w, now: NOW, policy: defaultPolicy });
    expect(rules(hs)).toEqual(['tire_not_holding_air']);
  });
});

describe('decideHook: what the gate does with a trailer’s holds', () => {
  const oos = { severity: 'out_of_service' as const, restriction: null, reason: 'pin' };
  const yard = { severity: 'restricted' as const, restriction: 'yard_only', reason: 'spare' };
  const cold = { severity: 'restricted' as const, restriction: 'no_perishable', reason: 'hinge' };

  it('no hold: allowed, nothing asked', () => {
    expect(decideHook([], null)).toEqual({ outcome: 'allowed', askedPerishable: false });
  });

  it('out of service refuses first, whatever else holds the trailer', () => {
    expect(decideHook([cold, yard, oos], false)).toEqual({
      outcome: 'refused',
      because: 'out_of_service',
      holds: [oos],
    });
  });

  it('"yard moves only" refuses a hook like out of service (common practice: no trip until fixed)', () => {
    expect(decideHook([cold, yard], false)).toEqual({
      outcome: 'refused',
      because: 'yard_only',
      holds: [yard],
    });
  });

  it('"no perishable loads" asks, refuses a perishable load and allows another, recording that it asked', () => {
    expect(decideHook([cold], undefined)).toEqual({ outcome: 'ask_perishable', holds: [cold] });
    expect(decideHook([cold], null)).toEqual({ outcome: 'ask_perishable', holds: [cold] });
    expect(decideHook([cold], true)).toEqual({
      outcome: 'refused',
      because: 'perishable_load',
      holds: [cold],
    });
    expect(decideHook([cold], false)).toEqual({ outcome: 'allowed', askedPerishable: true });
  });

  it('every restricted hold carries a caution that fits its restriction', () => {
    const hs = holdsFor({
      'rear.door_left.hinge_2': { condition: 'ok', isLocking: false },
      'undercarriage.spare_tire': { condition: 'missing' },
    });
    const hinge = hs.find((h) => h.ruleKey === 'hinge_not_locking')!;
    expect(hinge.caution).toBe(NO_PERISHABLE_CAUTION);
    const spare = hs.find((h) => h.ruleKey === 'spare_unusable')!;
    expect(english(spare.caution)).toContain('Chock the wheels');
    const yardOnly = holdsFor(
      { 'undercarriage.spare_tire': { condition: 'missing' } },
      {},
      reefer,
      makePolicy({ spareHoldSeverity: 'restricted' }),
    );
    expect(yardOnly[0].restriction).toBe('yard_only');
    expect(hs.every((h) => english(h.caution).length > 20)).toBe(true);
    expect(english(YARD_ONLY_CAUTION)).toContain('tug test');
  });
});
