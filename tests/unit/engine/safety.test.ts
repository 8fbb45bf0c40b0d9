import { describe, expect, it } from 'vitest';
import { answerGroup, buildChecklist, safetyGaps, safetyGroups, safetyItems } from '@/lib/engine';
import type { ItemObservations } from '@/lib/engine';

const reefer = buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
const van = buildChecklist({ kind: 'dry_van', hingesPerDoor: 5, axles: 2, tireLayout: 'wide_single' });

/** Every safety item answered through its group statement, tires at 8/32 in. */
function allStated(checklist = reefer): ItemObservations {
  let items: ItemObservations = {};
  for (const g of safetyGroups(checklist)) items = { ...items, ...answerGroup(checklist, g, 8) };
  return items;
}

describe('safety items (common practice: pins, spare, tires, fuel leak, door hinges and locks, landing gear, reefer running)', () => {
  it('marks exactly the safety items of a two-axle dual-tire reefer', () => {
    const keys = safetyItems(reefer).map((i) => i.key);
    // 4 pins + 1 spare + 8 tires (2 axles × 4 duals) + 1 fuel leak + 8 hinges + 2 lock rods + 3 landing gear = 27
    expect(keys).toHaveLength(27);
    expect(keys).toContain('undercarriage.tandem_pin.right_rear');
    expect(keys).toContain('undercarriage.spare_tire');
    expect(keys).toContain('tires.axle2.right_outer');
    expect(keys).toContain('undercarriage.fuel_tank.leaks');
    expect(keys).toContain('rear.door_left.hinge_4');
    expect(keys).toContain('rear.door_right.lock_rods');
    expect(keys).toContain('undercarriage.landing_gear.cross_shaft');
    expect(keys).not.toContain('left_side.skin');
    expect(keys).not.toContain('interior.floor');
    expect(reefer.items.find((i) => i.key === 'readings.unit_on')?.isSafety).toBe(true);
    expect(reefer.items.find((i) => i.key === 'readings.setpoint')?.isSafety).toBeUndefined();
  });

  it('gives a dry van no fuel or reefer safety items, and follows its hinges and tires', () => {
    const keys = safetyItems(van).map((i) => i.key);
    // 4 pins + 1 spare + 4 tires (2 axles × 2 wide singles) + 10 hinges + 2 lock rods + 3 landing gear = 24
    expect(keys).toHaveLength(24);
    expect(keys.some((k) => k.includes('fuel_tank'))).toBe(false);
    expect(safetyGroups(van).map((g) => g.key)).toEqual([
      'landing_gear',
      'spare',
      'tandem_pins',
      'tires',
      'rear_doors',
    ]);
  });

  it('states each group in words that count the items the driver looked at', () => {
    const groups = Object.fromEntries(safetyGroups(reefer).map((g) => [g.key, g]));
    expect(groups.tandem_pins.statement).toBe('All four tandem pins out and locked: I looked at each');
    expect(groups.tandem_pins.itemKeys).toHaveLength(4);
    expect(groups.tires.statement).toContain('All eight tires');
    expect(groups.tires.asksTread).toBe(true);
    expect(groups.rear_doors.statement).toContain('All eight door hinges');
    expect(safetyGroups(van).find((g) => g.key === 'rear_doors')?.statement).toContain('All ten door hinges');
  });

  it('a group answer records the safe answer for each item; tires carry the tread given', () => {
    const pins = safetyGroups(reefer).find((g) => g.key === 'tandem_pins')!;
    expect(answerGroup(reefer, pins)['undercarriage.tandem_pin.left_rear']).toEqual({
      condition: 'ok',
      isEngaged: true,
    });
    const tires = safetyGroups(reefer).find((g) => g.key === 'tires')!;
    expect(answerGroup(reefer, tires, 6)['tires.axle1.left_inner']).toEqual({
      condition: 'ok',
      treadThirtySeconds: 6,
      isHoldingAir: true,
    });
    expect(() => answerGroup(reefer, tires)).toThrow(RangeError);
  });

  it('finds no gap once every safety item is answered, loaded reefer running', () => {
    expect(safetyGaps(reefer, { items: allStated(), isLoaded: true, isUnitOn: true })).toEqual([]);
    expect(safetyGaps(van, { items: allStated(van), isLoaded: true, isUnitOn: null })).toEqual([]);
  });

  it('names every unanswered safety item, field by field', () => {
    const items = allStated();
    delete items['undercarriage.tandem_pin.left_front'];
    items['tires.axle1.left_outer'] = { condition: 'ok', isHoldingAir: true }; // no tread
    items['rear.door_right.hinge_2'] = { condition: 'not_checked' };
    const gaps = safetyGaps(reefer, { items, isLoaded: false, isUnitOn: null });
    expect(gaps.map((g) => g.field)).toEqual([
      'items.undercarriage.tandem_pin.left_front',
      'items.tires.axle1.left_outer',
      'items.rear.door_right.hinge_2',
    ]);
    expect(gaps[0].message).toBe(
      'Tandem locking pin, left front is a safety item: look at it and answer it in this handoff.',
    );
    expect(gaps[1].message).toContain('answer every question');
  });

  it('an empty handoff leaves all 27 safety items of the reefer unanswered', () => {
    expect(safetyGaps(reefer, { items: {}, isLoaded: false, isUnitOn: null })).toHaveLength(27);
  });

  it('a missing spare is an answer (the hold rules take it from there)', () => {
    const items = allStated();
    items['undercarriage.spare_tire'] = { condition: 'missing' };
    expect(safetyGaps(reefer, { items, isLoaded: false, isUnitOn: null })).toEqual([]);
  });

  it('a loaded reefer needs the "unit running" answer; an empty one does not', () => {
    const loaded = safetyGaps(reefer, { items: allStated(), isLoaded: true, isUnitOn: null });
    expect(loaded).toEqual([
      {
        field: 'reefer.isUnitOn',
        itemKey: 'readings.unit_on',
        message: 'The trailer is loaded: say whether the reefer unit is running.',
      },
    ]);
    expect(safetyGaps(reefer, { items: allStated(), isLoaded: true, isUnitOn: false })).toEqual([]);
    expect(safetyGaps(reefer, { items: allStated(), isLoaded: false, isUnitOn: null })).toEqual([]);
  });
});
