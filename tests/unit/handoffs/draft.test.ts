import { describe, expect, it } from 'vitest';
import { buildChecklist, type TimelineEvent } from '@/lib/engine';
import {
  draftToInput,
  itemChange,
  needsEvidence,
  newDraft,
  sameAsLast,
  sameAsLastForZone,
} from '@/lib/handoffs/draft';
import { lastKnownCondition } from '@/lib/handoffs/last-condition';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';

const checklist = buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
const party = { carrierId: 'c1', carrierName: 'Osterlind Freightways', driverName: 'Lev Marchetti' };
const t = (h: number) => new Date(Date.UTC(2026, 10, 2, h));

describe('gate form draft', () => {
  it('leaves untouched items out of the submit: not checked, never silently ok (common practice)', () => {
    const d = newDraft({
      idempotencyKey: 'k'.repeat(20),
      trailerId: '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1c',
      kind: 'drop',
      carrierId: '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1d',
      driverName: 'Dana O.',
    });
    d.items['left_side.skin'] = { condition: 'ok', isInsulationShowing: false };
    d.items['interior.floor'] = { condition: 'not_checked' };
    const body = draftToInput(d, true) as { items: Record<string, unknown> };
    expect(Object.keys(body.items)).toEqual(['left_side.skin']);
  });

  it('sends photos as ids and readings as numbers the shared schema accepts', () => {
    const d = newDraft({
      idempotencyKey: 'k'.repeat(20),
      trailerId: '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1c',
      kind: 'drop',
      carrierId: '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1d',
      driverName: 'Dana O.',
    });
    Object.assign(d, { tractorNumber: 't-1', isLoaded: false, fuelEighths: 7 });
    d.reefer = {
      isUnitOn: true,
      setpointF: '-10',
      returnAirF: '-8.5',
      engineHours: '1200.5',
      preTripResult: 'pass',
      preTripAt: '2026-11-02T10:00',
    };
    d.items['rear.door_left.panel'] = {
      condition: 'damaged',
      note: 'Dent',
      photos: [{ id: '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1e' }],
    };
    const parsed = handoffSubmitSchema.parse(draftToInput(d, true));
    expect(parsed.reefer).toMatchObject({ setpointF: -10, returnAirF: -8.5, engineHours: 1200.5 });
    expect(parsed.items['rear.door_left.panel'].photoIds).toEqual(['3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1e']);
  });

  it('flags new and worse damage for evidence, not unchanged or repaired items', () => {
    const last = (condition: 'ok' | 'minor' | 'damaged') => ({
      observation: { condition },
      at: t(1).toISOString(),
      eventType: 'drop' as const,
      by: 'drop by X',
    });
    expect(needsEvidence(itemChange({ condition: 'damaged' }, last('ok')), { condition: 'damaged' })).toBe(
      true,
    );
    expect(needsEvidence(itemChange({ condition: 'damaged' }, last('minor')), { condition: 'damaged' })).toBe(
      true,
    );
    expect(
      needsEvidence(itemChange({ condition: 'damaged' }, last('damaged')), { condition: 'damaged' }),
    ).toBe(false);
    expect(needsEvidence(itemChange({ condition: 'ok' }, last('damaged')), { condition: 'ok' })).toBe(false);
    // no earlier record: a first record, not "new" (nothing to compare with)
    expect(itemChange({ condition: 'damaged' }, undefined)).toBe('first_record');
  });
});

describe('last known condition', () => {
  it('takes each item from the latest event that inspected it, skipping not_checked and moves', () => {
    const timeline: TimelineEvent[] = [
      {
        type: 'drop',
        id: 'h1',
        at: t(1),
        party,
        items: {
          'left_side.skin': { condition: 'ok' },
          'interior.floor': { condition: 'minor', note: 'scratch' },
        },
      },
      {
        type: 'hook',
        id: 'h2',
        at: t(5),
        party,
        items: { 'left_side.skin': { condition: 'damaged' }, 'interior.floor': { condition: 'not_checked' } },
      },
      { type: 'move', id: 'm1', at: t(6) },
    ];
    const last = lastKnownCondition(checklist, timeline, false);
    expect(last['left_side.skin']).toMatchObject({
      observation: { condition: 'damaged' },
      eventType: 'hook',
      by: 'hook by Osterlind Freightways',
    });
    expect(last['interior.floor']).toMatchObject({ observation: { condition: 'minor' }, eventType: 'drop' });
    expect(last['interior.floor'].observation.note).toBeUndefined();
    expect(last['rear.header']).toBeUndefined();
    expect(lastKnownCondition(checklist, timeline, true)['left_side.skin'].by).toBe(
      'hook by Lev Marchetti, Osterlind Freightways',
    );
  });
});

describe('which changes need a photo and a note', () => {
  // `minor` is cosmetic and acceptable (condition scale); common practice: small scratches are acceptable
  it('a new cosmetic mark (ok → minor) needs no evidence; ok → damaged and minor → unsafe do', () => {
    expect(needsEvidence('new', { condition: 'minor' })).toBe(false);
    expect(needsEvidence('new', { condition: 'damaged' })).toBe(true);
    expect(needsEvidence('worse', { condition: 'unsafe' })).toBe(true);
    expect(needsEvidence('unchanged', { condition: 'damaged' })).toBe(false);
  });
});

describe('"Same as last" never copies a safety item', () => {
  const seen = (observation: Record<string, unknown>) => ({
    observation: observation as { condition: 'ok' },
    at: t(1).toISOString(),
    eventType: 'drop' as const,
    by: 'drop by Osterlind Freightways',
  });
  const undercarriage = checklist.zones.find((z) => z.key === 'undercarriage')!.items;
  const last = {
    'undercarriage.cross_members': seen({ condition: 'ok' }),
    'undercarriage.air_lines': seen({ condition: 'minor' }),
    'undercarriage.tandem_pin.left_front': seen({ condition: 'ok', isEngaged: true }),
    'undercarriage.spare_tire': seen({ condition: 'ok', isMounted: true, isHoldingAir: true }),
    'undercarriage.landing_gear.cross_shaft': seen({ condition: 'ok' }),
    'undercarriage.fuel_tank.leaks': seen({ condition: 'ok', isLeaking: false }),
  };
  const draft = () =>
    newDraft({
      idempotencyKey: 'k'.repeat(20),
      trailerId: '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1c',
      kind: 'hook',
      carrierId: '3f1c2b7e-8a4d-4c1e-9b2a-6d5e4f3a2b1d',
      driverName: 'Dana O.',
    });

  it('copies the zone’s other items and leaves pins, spare, landing gear and fuel leak unanswered', () => {
    const copied = sameAsLastForZone(undercarriage, draft(), last);
    expect(Object.keys(copied).sort()).toEqual(['undercarriage.air_lines', 'undercarriage.cross_members']);
    expect(copied['undercarriage.air_lines']).toEqual({ condition: 'minor' });
  });

  it('keeps what the driver already answered', () => {
    const d = draft();
    d.items['undercarriage.cross_members'] = { condition: 'damaged' };
    expect(Object.keys(sameAsLastForZone(undercarriage, d, last))).toEqual(['undercarriage.air_lines']);
  });

  it('the one-item "Same as last" refuses a safety item too', () => {
    const pin = undercarriage.find((i) => i.key === 'undercarriage.tandem_pin.left_front')!;
    expect(sameAsLast(pin, last['undercarriage.tandem_pin.left_front'])).toBeNull();
    const floor = undercarriage.find((i) => i.key === 'undercarriage.cross_members')!;
    expect(sameAsLast(floor, last['undercarriage.cross_members'])).toEqual({ condition: 'ok' });
  });
});
