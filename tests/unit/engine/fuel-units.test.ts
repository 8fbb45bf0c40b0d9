import { describe, expect, it } from 'vitest';
import {
  assessFuel,
  celsiusToFahrenheit,
  defaultPolicy,
  defaultPolicySources,
  eighthsToGallons,
  eighthsToLitres,
  expectedBurnGallons,
  fahrenheitToCelsius,
  gallonsToLitres,
  LITRES_PER_US_GALLON,
  litresToGallons,
  makePolicy,
  roundTo,
  thirtySecondsToMillimetres,
} from '@/lib/engine';
import type { TrailerSpec } from '@/lib/engine';
import { drop, hook, move, northwind, bluefield, walk } from './fixtures';
import { formatStamp } from '@/lib/format/time';

const spec: TrailerSpec = {
  kind: 'reefer',
  hingesPerDoor: 4,
  axles: 2,
  tireLayout: 'dual',
  fuelTankGallons: 50,
};

describe('units', () => {
  it('US gallon = 3.785411784 L exactly (NIST Handbook 44, Appendix C)', () => {
    expect(LITRES_PER_US_GALLON).toBe(3.785411784);
    expect(gallonsToLitres(1)).toBe(3.785411784);
    expect(gallonsToLitres(50)).toBeCloseTo(189.2705892, 9);
    expect(litresToGallons(gallonsToLitres(12.5))).toBeCloseTo(12.5, 12);
  });

  it('°F to °C per NIST SP 811 Appendix B: 32 → 0, −40 → −40, 0 → −17.78', () => {
    expect(fahrenheitToCelsius(32)).toBe(0);
    expect(fahrenheitToCelsius(-40)).toBe(-40);
    expect(roundTo(fahrenheitToCelsius(0), 2)).toBe(-17.78);
    expect(celsiusToFahrenheit(-40)).toBe(-40);
    expect(celsiusToFahrenheit(100)).toBe(212);
  });

  it('2/32 in of tread = 1.5875 mm (49 CFR 393.75(c); 1 in = 25.4 mm, NIST SP 811)', () => {
    expect(thirtySecondsToMillimetres(2)).toBe(1.5875);
    // 393.75(b): 4/32 in = 3.175 mm.
    expect(thirtySecondsToMillimetres(4)).toBe(3.175);
  });

  it('formats in the caller time zone across the DST change (IANA tz database)', () => {
    // 1 Nov 2026 is the first Sunday of November: America/Chicago goes from UTC−5 to UTC−6.
    expect(formatStamp(new Date('2026-10-31T15:00:00Z'), 'America/Chicago')).toBe('31 Oct 2026 10:00');
    expect(formatStamp(new Date('2026-11-02T15:00:00Z'), 'America/Chicago')).toBe('2 Nov 2026 09:00');
    expect(formatStamp(new Date('2026-11-02T15:00:00Z'), 'UTC')).toBe('2 Nov 2026 15:00');
  });
});

describe('fuel', () => {
  it('converts eighths for the trailer tank size', () => {
    expect(eighthsToGallons(8, 50)).toBe(50);
    expect(eighthsToGallons(3, 50)).toBe(18.75);
    expect(eighthsToGallons(4, 120)).toBe(60);
    expect(eighthsToLitres(8, 50)).toBeCloseTo(50 * 3.785411784, 9); // NIST Handbook 44
    expect(() => eighthsToGallons(9, 50)).toThrow(RangeError);
    expect(() => eighthsToGallons(Number.NaN, 50)).toThrow(RangeError);
  });

  it('labels the default figures with their sources', () => {
    // secondary source (docs/sources.md): 0.4–1.1 gal/h; tanks about 50 gal.
    expect(defaultPolicy.reeferBurnGallonsPerHour).toBe(0.8);
    expect(defaultPolicySources.reeferBurnGallonsPerHour).toContain('secondary source');
    expect(defaultPolicySources.defaultTankGallons).toContain('secondary source');
    expect(defaultPolicySources.minTreadThirtySeconds).toContain('393.75(c)');
    // Secondary-source worked example: 11 h at 0.5 gal/h uses 5.5 gal; at 1 gal/h, 11 gal.
    expect(expectedBurnGallons(11, makePolicy({ reeferBurnGallonsPerHour: 0.5 }))).toBe(5.5);
    expect(expectedBurnGallons(11, makePolicy({ reeferBurnGallonsPerHour: 1 }))).toBe(11);
  });

  it('shortfall against the required eighths at a drop (common practice: full at every drop and hook)', () => {
    const d = drop('2026-11-05T14:00:00Z', northwind, {}, { fuelEighths: 5 });
    const f = assessFuel({ trailer: spec, history: [], current: d, policy: defaultPolicy })!;
    expect(f).toMatchObject({
      gallons: 31.25,
      requiredEighths: 8,
      shortfallEighths: 3,
      shortfallGallons: 18.75,
      isShort: true,
    });
    expect(f.litres).toBeCloseTo(31.25 * 3.785411784, 9);
    expect(f.previousEventId).toBeNull();
    expect(f.isPossibleLeakOrTheft).toBe(false);
  });

  it('uses the policy for hooks and no requirement on walks; default tank when the spec has none', () => {
    const policy = makePolicy({ requiredFuelEighthsAtHook: 6 });
    const h = hook('2026-11-05T14:00:00Z', bluefield, {}, { fuelEighths: 6 });
    expect(assessFuel({ trailer: spec, history: [], current: h, policy })).toMatchObject({
      isShort: false,
      shortfallEighths: 0,
    });
    const w = walk('2026-11-05T14:00:00Z', {}, { fuelEighths: 2 });
    const noTank: TrailerSpec = { ...spec, fuelTankGallons: undefined };
    expect(assessFuel({ trailer: noTank, history: [], current: w, policy })).toMatchObject({
      requiredEighths: null,
      isShort: false,
      tankGallons: 50,
      gallons: 12.5,
    });
    expect(
      assessFuel({ trailer: spec, history: [], current: drop('2026-11-05T14:00:00Z', northwind), policy }),
    ).toBeNull();
  });

  it('flags fuel that fell more than engine hours explain; exactly at tolerance is not flagged', () => {
    // 50 gal tank: 8/8 → 4/8 is 25 gal gone. 10 engine hours × 0.8 gal/h = 8 gal burn.
    // Tolerance 2.72 eighths of 50 gal = 2.72 / 8 × 50 = 17 gal.
    const policy = makePolicy({ fuelDropToleranceEighths: 2.72 });
    const before = drop(
      '2026-11-04T14:00:00Z',
      northwind,
      {},
      { fuelEighths: 8, reefer: { engineHours: 1200 } },
    );
    const after = (eighths: number, hours: number) =>
      hook('2026-11-05T14:00:00Z', bluefield, {}, { fuelEighths: eighths, reefer: { engineHours: hours } });
    const at = assessFuel({
      trailer: spec,
      history: [before, move('2026-11-04T15:00:00Z')],
      current: after(4, 1210),
      policy,
    })!;
    expect(at).toMatchObject({
      dropGallons: 25,
      engineHoursRun: 10,
      expectedBurnGallons: 8,
      unexplainedGallons: 17,
    });
    expect(at.isPossibleLeakOrTheft).toBe(false);
    const over = assessFuel({ trailer: spec, history: [before], current: after(4, 1209.5), policy })!;
    expect(over.unexplainedGallons).toBeCloseTo(17.4, 9);
    expect(over.isPossibleLeakOrTheft).toBe(true);
  });

  it('does not flag without engine hours, when hours run backwards, or when fuel rose', () => {
    const before = drop(
      '2026-11-04T14:00:00Z',
      northwind,
      {},
      { fuelEighths: 8, reefer: { engineHours: 1200 } },
    );
    const noHours = hook('2026-11-05T14:00:00Z', bluefield, {}, { fuelEighths: 0 });
    expect(
      assessFuel({ trailer: spec, history: [before], current: noHours, policy: defaultPolicy }),
    ).toMatchObject({ dropGallons: 50, expectedBurnGallons: null, isPossibleLeakOrTheft: false });
    const backwards = hook(
      '2026-11-05T14:00:00Z',
      bluefield,
      {},
      { fuelEighths: 0, reefer: { engineHours: 10 } },
    );
    expect(
      assessFuel({ trailer: spec, history: [before], current: backwards, policy: defaultPolicy })!
        .engineHoursRun,
    ).toBeNull();
    const low = drop(
      '2026-11-04T14:00:00Z',
      northwind,
      {},
      { fuelEighths: 2, reefer: { engineHours: 1200 } },
    );
    const refuelled = hook(
      '2026-11-05T14:00:00Z',
      bluefield,
      {},
      { fuelEighths: 8, reefer: { engineHours: 1220 } },
    );
    expect(
      assessFuel({ trailer: spec, history: [low], current: refuelled, policy: defaultPolicy }),
    ).toMatchObject({ dropGallons: 0, isPossibleLeakOrTheft: false });
  });

  it('takes the baseline from the latest earlier reading, a yard walk included', () => {
    const d = drop('2026-11-04T14:00:00Z', northwind, {}, { fuelEighths: 8, reefer: { engineHours: 100 } });
    const w = walk('2026-11-05T02:00:00Z', {}, { fuelEighths: 7, reefer: { engineHours: 105 } });
    const h = hook('2026-11-05T14:00:00Z', bluefield, {}, { fuelEighths: 6, reefer: { engineHours: 110 } });
    const f = assessFuel({ trailer: spec, history: [d, w], current: h, policy: defaultPolicy })!;
    expect(f.previousEventId).toBe(w.id);
    expect(f.dropGallons).toBe(6.25);
    expect(f.expectedBurnGallons).toBe(4);
  });
});

describe('fuel tolerance scales with the tank (terminal policy: one gauge eighth of this tank)', () => {
  // No engine hours run between the readings (1200 h both times), so no burn explains any drop.
  const tank = (gallons: number): TrailerSpec => ({ ...spec, fuelTankGallons: gallons });
  const reading = (eighths: number, hours = 1200) => ({
    fuelEighths: eighths,
    reefer: { engineHours: hours },
  });
  const fall = (gallons: number, from: number, to: number, hoursAfter = 1200) =>
    assessFuel({
      trailer: tank(gallons),
      history: [drop('2026-11-04T14:00:00Z', northwind, {}, reading(from))],
      current: hook('2026-11-05T14:00:00Z', bluefield, {}, reading(to, hoursAfter)),
      policy: defaultPolicy,
    })!;

  it('50 gal tank: one eighth is 50 / 8 = 6.25 gal, exactly the tolerance: not flagged; two eighths are', () => {
    const one = fall(50, 8, 7);
    expect(one.toleranceGallons).toBe(6.25); // 1/8 × 50 = 6.25 gal
    expect(one.dropGallons).toBe(6.25);
    expect(one.isPossibleLeakOrTheft).toBe(false);
    const two = fall(50, 8, 6); // 2/8 × 50 = 12.5 gal gone, 12.5 − 0 burn = 12.5 > 6.25
    expect(two.unexplainedGallons).toBe(12.5);
    expect(two.isPossibleLeakOrTheft).toBe(true);
  });

  it('55 gal tank: one eighth is 55 / 8 = 6.875 gal, within its own tolerance (a fixed 6.25 gal flagged it)', () => {
    const one = fall(55, 8, 7);
    expect(one.toleranceGallons).toBe(6.875); // 1/8 × 55 = 6.875 gal
    expect(one.dropGallons).toBe(6.875);
    expect(one.isPossibleLeakOrTheft).toBe(false);
    // 8/8 → 6/8 of 55 gal: 2 × 6.875 = 13.75 gal unexplained > 6.875
    expect(fall(55, 8, 6)).toMatchObject({ unexplainedGallons: 13.75, isPossibleLeakOrTheft: true });
  });

  it('120 gal tank: one eighth is 120 / 8 = 15 gal: not flagged; a quarter with 5 h run is', () => {
    const one = fall(120, 8, 7);
    expect(one.toleranceGallons).toBe(15); // 1/8 × 120 = 15 gal
    expect(one.dropGallons).toBe(15);
    expect(one.isPossibleLeakOrTheft).toBe(false);
    // NIST HB 44 (Appendix C): 1 US gal = 3.785 411 784 L; 7/8 × 120 = 105 gal = 397.468 237 32 L
    expect(one.litres).toBeCloseTo(397.46823732, 8);
    // 8/8 → 6/8 = 30 gal gone; 5 h × 0.8 gal/h = 4 gal burn; 30 − 4 = 26 gal unexplained > 15
    const quarter = fall(120, 8, 6, 1205);
    expect(quarter).toMatchObject({ dropGallons: 30, engineHoursRun: 5, isPossibleLeakOrTheft: true });
    expect(quarter.expectedBurnGallons).toBeCloseTo(4, 9);
    expect(quarter.unexplainedGallons).toBeCloseTo(26, 9);
  });

  it('the tolerance follows the policy’s eighths: two eighths of 120 gal are 30 gal', () => {
    const r = assessFuel({
      trailer: tank(120),
      history: [drop('2026-11-04T14:00:00Z', northwind, {}, reading(8))],
      current: hook('2026-11-05T14:00:00Z', bluefield, {}, reading(6, 1205)),
      policy: makePolicy({ fuelDropToleranceEighths: 2 }),
    })!;
    expect(r.toleranceGallons).toBe(30); // 2/8 × 120 = 30 gal; 26 gal unexplained is within it
    expect(r.isPossibleLeakOrTheft).toBe(false);
  });
});
