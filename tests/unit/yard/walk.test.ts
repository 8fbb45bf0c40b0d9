import { describe, expect, it } from 'vitest';
import { classifyScanText } from '@/lib/yard/scan-text';
import { terminalPolicyOf } from '@/lib/terminal/policy';
import { DEFAULT_YARD_POLICY } from '@/lib/yard/policy';
import { suggestNextSpot, tasksForScan, tasksForWalk, walkScanEvent } from '@/lib/yard/walk';

const spots = [
  { id: 's1', label: 'A01', rowId: 'a' },
  { id: 's2', label: 'A02', rowId: 'a' },
  { id: 's3', label: 'B01', rowId: 'b' },
];
const checks = {
  isUnitRunning: true,
  setpointTenthsF: 340,
  fuelEighths: 6,
  areDoorsClosed: true,
  isSealPresent: true,
};

describe('next slot suggestion', () => {
  it('starts at the first slot, follows row order and ends after the last', () => {
    expect(suggestNextSpot(spots, null)?.label).toBe('A01');
    expect(suggestNextSpot(spots, 's1')?.label).toBe('A02');
    expect(suggestNextSpot(spots, 's2')?.label).toBe('B01');
    expect(suggestNextSpot(spots, 's3')).toBeNull();
    expect(suggestNextSpot([], null)).toBeNull();
  });
});

describe('tasks from a scan', () => {
  const loadedReefer = { kind: 'reefer' as const, isLoaded: true };
  it('asks for nothing when all is well', () => {
    expect(tasksForScan(checks, loadedReefer, DEFAULT_YARD_POLICY)).toEqual([]);
  });
  it('flags low fuel at the policy eighths, a unit off on a loaded reefer, open doors and a missing seal', () => {
    const kinds = tasksForScan(
      { ...checks, fuelEighths: 4, isUnitRunning: false, areDoorsClosed: false, isSealPresent: false },
      loadedReefer,
      DEFAULT_YARD_POLICY,
    ).map((t) => t.kind);
    expect(kinds).toEqual(['low_fuel', 'unit_off', 'doors_open', 'seal_missing']);
  });
  it('does not ask to fuel or start an empty dry van, nor a seal on an empty trailer (common practice)', () => {
    const kinds = tasksForScan(
      { ...checks, fuelEighths: 0, isUnitRunning: false, isSealPresent: false },
      { kind: 'dry_van', isLoaded: false },
      DEFAULT_YARD_POLICY,
    );
    expect(kinds).toEqual([]);
  });
});

describe('tasks from a whole walk', () => {
  const reefer = { kind: 'reefer' as const, isLoaded: true };
  it('lets the latest scan of a trailer decide and adds no task that is already open', () => {
    const scans = [
      { ...checks, ...reefer, trailerId: 't1', fuelEighths: 2, areDoorsClosed: false }, // first look
      { ...checks, ...reefer, trailerId: 't1', fuelEighths: 7 }, // looked again: fuelled, doors shut
      { ...checks, ...reefer, trailerId: 't2', fuelEighths: 1, isSealPresent: false },
      { ...checks, trailerId: null, kind: null, isLoaded: null, fuelEighths: 0 }, // unknown text
    ];
    const open = [{ trailerId: 't2', kind: 'low_fuel' as const }];
    expect(tasksForWalk(scans, open, DEFAULT_YARD_POLICY)).toEqual([
      { trailerId: 't2', kind: 'seal_missing', note: 'Loaded trailer found without a seal.' },
    ]);
  });
});

describe('walk scan as an engine timeline event', () => {
  it('carries the readings in the engine units and marks no checklist item inspected', () => {
    const at = new Date('2026-03-09T18:00:00Z');
    const e = walkScanEvent({ id: 'w1', scannedAt: at, ...checks, setpointTenthsF: -105 }, 'Yard jockey');
    expect(e).toEqual({
      type: 'walk',
      id: 'w1',
      at,
      jockeyName: 'Yard jockey',
      items: {},
      fuelEighths: 6,
      reefer: { isUnitOn: true, setpointF: -10.5 },
    });
  });
});

describe('scanned text', () => {
  it('tells a label link, a VIN and a unit number apart', () => {
    const token = 'AQ_-abcdefghijklmnopqrstuvwxyz0123456789';
    expect(classifyScanText(`http://localhost:3000/l/${token}`)).toEqual({ kind: 'label', token });
    // a link that is not a label link is just text: it will match no unit and show as unknown
    expect(classifyScanText('https://elsewhere.example/x')).toEqual({
      kind: 'unit',
      unitNumber: 'HTTPS://ELSEWHERE.EXAMPLE/X',
    });
    // 1G4AH59H45G118341: the VIN example of 49 CFR 565.15 (17 characters, no I, O or Q)
    expect(classifyScanText(' 1g4ah59h45g118341 ')).toEqual({ kind: 'vin', vin: '1G4AH59H45G118341' });
    expect(classifyScanText('r53001')).toEqual({ kind: 'unit', unitNumber: 'R53001' });
  });
});

describe('yard policy', () => {
  const yardPolicyOf = (data: unknown) => terminalPolicyOf(data).yard;
  it('reads the figures from the stored document and falls back per field', () => {
    expect(yardPolicyOf({ freeTimeHours: 72, lowFuelEighths: 3, other: 1 })).toEqual({
      freeTimeHours: 72,
      lowFuelEighths: 3,
    });
    expect(yardPolicyOf({ freeTimeHours: 'x', lowFuelEighths: 12 })).toEqual(DEFAULT_YARD_POLICY);
    expect(yardPolicyOf({ freeTimeHours: 24, lowFuelEighths: 12 })).toEqual({
      freeTimeHours: 24,
      lowFuelEighths: 4,
    });
    expect(yardPolicyOf(null)).toEqual(DEFAULT_YARD_POLICY);
  });
});
