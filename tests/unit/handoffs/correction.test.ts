import { describe, expect, it } from 'vitest';
import { correctionRefusal, type CorrectionAsk } from '@/lib/handoffs/correction';
import { timelineOf, type StoredHandoff } from '@/lib/handoffs/timeline';
import { terminalPolicyOf } from '@/lib/terminal/policy';

const T0 = new Date('2026-11-09T13:00:00Z');
const min = (m: number) => new Date(T0.getTime() + m * 60_000);

const ask = (over: Partial<CorrectionAsk> = {}): CorrectionAsk => ({
  original: { id: 'h1', trailerId: 't1', kind: 'drop', recordedById: 'driver-a', occurredAt: T0 },
  actor: { id: 'driver-a', role: 'driver' },
  input: { trailerId: 't1', kind: 'drop', correctionReason: null },
  now: min(10),
  windowMinutes: 30,
  correctedByCode: null,
  ...over,
});

describe('who may correct a handoff', () => {
  it('the recorder within the window may, without a reason', () => {
    expect(correctionRefusal(ask())).toBeNull();
    expect(correctionRefusal(ask({ now: min(30) }))).toBeNull();
  });

  it('each refusal has its code: unknown 422, foreign 403, late 403, other trailer or kind 422, twice 409', () => {
    expect(correctionRefusal(ask({ original: null }))?.code).toBe('invalid');
    expect(correctionRefusal(ask({ actor: { id: 'driver-b', role: 'driver' } }))?.code).toBe('forbidden');
    expect(correctionRefusal(ask({ actor: { id: 'jockey', role: 'jockey' } }))?.code).toBe('forbidden');
    expect(correctionRefusal(ask({ now: min(31) }))?.code).toBe('forbidden');
    expect(correctionRefusal(ask({ input: { trailerId: 't2', kind: 'drop' } }))?.code).toBe('invalid');
    expect(correctionRefusal(ask({ input: { trailerId: 't1', kind: 'hook' } }))?.code).toBe('invalid');
    expect(correctionRefusal(ask({ correctedByCode: 'AB12CD34' }))?.code).toBe('conflict');
  });

  it('a clerk or admin may correct anyone’s record at any time, but only with a reason', () => {
    const late = { now: min(60 * 24 * 9) };
    for (const role of ['clerk', 'admin'] as const) {
      const actor = { id: 'desk', role };
      expect(correctionRefusal(ask({ ...late, actor }))?.fieldErrors).toEqual({
        correctionReason: ['Give the reason for the correction.'],
      });
      expect(
        correctionRefusal(
          ask({ ...late, actor, input: { trailerId: 't1', kind: 'drop', correctionReason: 'Wrong unit' } }),
        ),
      ).toBeNull();
    }
  });

  it('the window comes from the terminal policy, 30 minutes by default (common practice)', () => {
    expect(terminalPolicyOf(null).gate.correctionWindowMinutes).toBe(30);
    expect(terminalPolicyOf({ correctionWindowMinutes: 45 }).gate.correctionWindowMinutes).toBe(45);
    expect(terminalPolicyOf({ correctionWindowMinutes: -5 }).gate.correctionWindowMinutes).toBe(30);
  });
});

const stored = (id: string, at: Date, over: Partial<StoredHandoff> = {}): StoredHandoff => ({
  id,
  kind: 'drop',
  occurredAt: at,
  carrierId: 'c1',
  carrierName: 'Carrier One',
  driverId: null,
  driverName: 'A Driver',
  isLoaded: false,
  sealNumber: null,
  fuelEighths: 8,
  isReeferOn: null,
  setpointTenthsF: null,
  returnAirTenthsF: null,
  engineHoursTenths: null,
  pretripResult: null,
  pretripAt: null,
  correctsHandoffId: null,
  ...over,
});
const rows = (handoffs: StoredHandoff[]) => ({ handoffs, items: [], moves: [], scans: [] });

describe('the timeline with corrections', () => {
  it('a correction stands in for the record it corrects, at that record’s time; chains of corrections too', () => {
    const events = timelineOf(
      rows([
        stored('h1', T0),
        stored('h2', min(10), { correctsHandoffId: 'h1', fuelEighths: 6 }),
        stored('h3', min(20), { correctsHandoffId: 'h2', fuelEighths: 5 }),
      ]),
    );
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({ id: 'h3', at: T0, fuelEighths: 5, correctedAt: min(20) });
  });

  it('a correction naming a record not of this trailer hides nothing and counts as a plain record', () => {
    const events = timelineOf(
      rows([stored('h1', T0), stored('h2', min(10), { correctsHandoffId: 'of-another-trailer' })]),
    );
    expect(events.map((e) => [e.id, e.at])).toEqual([
      ['h1', T0],
      ['h2', min(10)],
    ]);
  });
});
