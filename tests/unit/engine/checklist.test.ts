import { describe, expect, it } from 'vitest';
import { buildChecklist, inspectableItems, OBSERVATION_FIELDS } from '@/lib/engine';

const reefer = buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
const keys = (c: ReturnType<typeof buildChecklist>) => c.items.map((i) => i.key);

describe('buildChecklist', () => {
  it('gives a reefer the unit, fuel tank, insulation walls, bulkhead, air chute and readings', () => {
    const k = keys(reefer);
    expect(k).toContain('reefer_unit.housing');
    expect(k).toContain('undercarriage.fuel_tank.leaks');
    expect(k).toContain('interior.air_chute');
    expect(k).toContain('interior.bulkhead');
    expect(reefer.items.find((i) => i.key === 'interior.left_wall')?.kind).toBe('skin');
    expect(reefer.items.filter((i) => i.kind === 'reading').map((i) => i.reading)).toEqual([
      'fuelEighths',
      'isUnitOn',
      'setpointF',
      'returnAirF',
      'engineHours',
      'preTrip',
    ]);
  });

  it('leaves reefer-only items off a dry van', () => {
    const van = buildChecklist({ kind: 'dry_van', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
    const k = keys(van);
    expect(k.some((x) => x.startsWith('reefer_unit.') || x.startsWith('readings.'))).toBe(false);
    expect(k.some((x) => x.startsWith('undercarriage.fuel_tank'))).toBe(false);
    expect(van.items.find((i) => i.key === 'interior.left_wall')?.kind).toBe('condition');
    expect(van.zones.map((z) => z.key)).not.toContain('reefer_unit');
  });

  it('has the four tandem locking pins by position (common practice: two per side)', () => {
    const pins = reefer.items.filter((i) => i.kind === 'pin').map((i) => i.key);
    expect(pins).toEqual([
      'undercarriage.tandem_pin.left_front',
      'undercarriage.tandem_pin.left_rear',
      'undercarriage.tandem_pin.right_front',
      'undercarriage.tandem_pin.right_rear',
    ]);
  });

  it('follows the trailer hinge count (common practice: four or five per door)', () => {
    const five = buildChecklist({ kind: 'reefer', hingesPerDoor: 5, axles: 2, tireLayout: 'dual' });
    expect(reefer.items.filter((i) => i.kind === 'hinge')).toHaveLength(8);
    expect(five.items.filter((i) => i.kind === 'hinge')).toHaveLength(10);
    expect(keys(five)).toContain('rear.door_right.hinge_5');
    expect(keys(reefer)).not.toContain('rear.door_right.hinge_5');
  });

  it('follows the tire layout: duals give four per axle, wide singles two', () => {
    const single = buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'wide_single' });
    expect(reefer.items.filter((i) => i.kind === 'tire').map((i) => i.key)).toEqual([
      'tires.axle1.left_outer',
      'tires.axle1.left_inner',
      'tires.axle1.right_inner',
      'tires.axle1.right_outer',
      'tires.axle2.left_outer',
      'tires.axle2.left_inner',
      'tires.axle2.right_inner',
      'tires.axle2.right_outer',
    ]);
    expect(single.items.filter((i) => i.kind === 'tire').map((i) => i.key)).toEqual([
      'tires.axle1.left',
      'tires.axle1.right',
      'tires.axle2.left',
      'tires.axle2.right',
    ]);
  });

  it('keeps keys unique and the flat list equal to the zones in order', () => {
    const k = keys(reefer);
    expect(new Set(k).size).toBe(k.length);
    expect(reefer.zones.flatMap((z) => z.items)).toEqual(reefer.items);
    for (const item of reefer.items) expect(item.key.startsWith(`${item.zone}.`)).toBe(true);
  });

  it('is stable: the same spec gives the same keys, and common keys survive a spec change', () => {
    const again = buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
    expect(keys(again)).toEqual(keys(reefer));
    const five = buildChecklist({ kind: 'reefer', hingesPerDoor: 5, axles: 2, tireLayout: 'dual' });
    for (const k of keys(reefer)) expect(keys(five)).toContain(k);
  });

  it('rejects a nonsense axle count', () => {
    expect(() => buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 0, tireLayout: 'dual' })).toThrow(
      RangeError,
    );
  });

  it('lists form fields per kind and excludes readings from comparison', () => {
    expect(OBSERVATION_FIELDS.tire).toEqual(['treadThirtySeconds', 'isHoldingAir']);
    expect(OBSERVATION_FIELDS.spare).toEqual(['isMounted', 'isHoldingAir']);
    expect(inspectableItems(reefer).some((i) => i.kind === 'reading')).toBe(false);
    expect(inspectableItems(reefer)).toHaveLength(reefer.items.length - 6);
  });
});
