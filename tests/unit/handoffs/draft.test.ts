import { describe, expect, it } from 'vitest';
import { buildChecklist, type TimelineEvent } from '@/lib/engine';
import { draftToInput, itemChange, newDraft, needsEvidence } from '@/lib/handoffs/draft';
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
