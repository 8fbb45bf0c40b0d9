import { tz } from '@date-fns/tz';
import { format } from 'date-fns';
// The renderer of the engine's coded reasons: every code in English and Spanish with no missing
// parameter, checklist labels in both languages, dates in the terminal's zone.
import { describe, expect, it } from 'vitest';
import { buildChecklist, type ReasonCode, type ReasonCodes, type EventRef } from '@/lib/engine';
import { formatStamp } from '@/lib/format/time';
import { LOCALES } from '@/lib/i18n/locales';
import { readable, renderReason, storedText } from '@/lib/i18n/reasons';

const ZONE = 'America/Chicago';
const drop: EventRef = {
  type: 'drop',
  at: '2026-11-03T20:05:00Z',
  driverName: 'D. Example',
  carrierName: 'Carrier Northwind',
  jockeyName: null,
  correctedAt: null,
};
const walkRef: EventRef = {
  ...drop,
  type: 'walk',
  driverName: null,
  carrierName: null,
  jockeyName: 'G. Jockey',
};
const hinge = { item: 'rear.door_left.hinge_3', label: 'Left door hinge 3 (from top)' };

// one sample per code; the type makes the list complete (a new code without a sample fails typecheck)
const SAMPLES: { [K in ReasonCode]: ReasonCodes[K] } = {
  'attribution.none': { ...hinge, current: 'damaged', now: drop },
  'attribution.single': {
    ...hinge,
    previous: 'ok',
    current: 'damaged',
    before: walkRef,
    now: { ...drop, type: 'hook', correctedAt: '2026-11-03T21:00:00Z' },
    holder: { type: 'terminal', name: null },
    atHook: true,
    quick: true,
  },
  'attribution.several': {
    ...hinge,
    previous: 'minor',
    current: 'unsafe',
    before: drop,
    now: { ...drop, driverName: null },
    holders: [
      { type: 'terminal', name: null },
      { type: 'carrier', name: 'Carrier Bluefield' },
      { type: 'carrier', name: 'Carrier Corvid' },
    ],
    unrecorded: true,
  },
  'finding.repaired': { ...hinge, previous: 'damaged', current: 'ok' },
  'finding.other': { ...hinge, kind: 'worse' },
  'finding.fuel_short': {
    eighths: 2,
    gallons: 12.5,
    tankGallons: 50,
    requiredEighths: 4,
    eventType: 'hook',
    shortfallEighths: 2,
    shortfallGallons: 12.5,
  },
  'finding.fuel_unexplained_drop': { dropGallons: 20, engineHours: 5, expectedBurnGallons: 4.5 },
  'hold.pin_not_engaged': {
    item: 'undercarriage.tandem_pin.left_rear',
    label: 'Tandem locking pin, left rear',
  },
  'hold.spare_unusable': { item: 'undercarriage.spare_tire', label: 'Spare tire', problem: 'off_wheel' },
  'hold.tire_tread_low': {
    item: 'tires.axle2.left_inner',
    label: 'Axle 2 left inner tire and wheel',
    tread: 1,
    min: 2,
  },
  'hold.tire_not_holding_air': { item: 'tires.axle1.right', label: 'Axle 1 right tire and wheel' },
  'hold.insulation_showing': { item: 'left_side.skin', label: 'Left side skin' },
  'hold.hinge_not_locking': hinge,
  'hold.fuel_leak': { item: 'undercarriage.fuel_tank.leaks', label: 'Fuel tank leaks' },
  'hold.item_unsafe': { item: 'nose.upper_coupler', label: 'Upper coupler and king pin' },
  'hold.pre_trip_missing': {},
  'hold.pre_trip_failed': {},
  'hold.pre_trip_stale': { ageHours: 80, maxHours: 72 },
  'hold.at_refused_hook': { reason: { code: 'hold.pin_not_engaged', params: { item: 'x', label: 'Pin X' } } },
  'caution.out_of_service': {},
  'caution.yard_only': {},
  'caution.no_perishable': {},
  'caution.under_trailer': {},
  'case.not_attributed': {},
  legacy_text: { text: 'Stored words from before codes.' },
};

function strict(code: string, params: unknown, locale: string) {
  const errors: string[] = [];
  const text = renderReason(code, params, locale, ZONE, {
    fallback: '<<fallback>>',
    onError: (m) => errors.push(m),
  });
  return { text, errors };
}

describe('renderReason', () => {
  it.each(LOCALES)('renders every code in %s with every parameter filled', (locale) => {
    for (const [code, params] of Object.entries(SAMPLES)) {
      const { text, errors } = strict(code, params, locale);
      expect(errors, code).toEqual([]);
      expect(text, code).not.toBe('<<fallback>>');
      expect(text, code).not.toMatch(/[{}]|undefined|null|NaN/);
      expect(text.length, code).toBeGreaterThan(8);
    }
  });

  it('says every code differently in Spanish (only the legacy text stays as stored)', () => {
    for (const [code, params] of Object.entries(SAMPLES)) {
      const en = strict(code, params, 'en').text;
      const es = strict(code, params, 'es').text;
      if (code === 'legacy_text') expect(es).toBe(en);
      else expect(es, code).not.toBe(en);
    }
  });

  it('reads a Spanish attribution with the trade words, the date in the terminal zone', () => {
    // 20:05Z is 14:05 in America/Chicago (CST, UTC−6 in November; IANA tz database)
    expect(strict('attribution.none', SAMPLES['attribution.none'], 'es').text).toBe(
      'Bisagra 3 de la puerta izquierda (desde arriba): con daño en el drop (entrega) del 3 nov 2026 14:05 ' +
        'por el chofer D. Example (Carrier Northwind); no hay revisión anterior de esta pieza en el registro, ' +
        'así que no se le puede atribuir a nadie.',
    );
  });

  it('lists three parties as "A, B and C", names a correction and a walk', () => {
    const several = strict('attribution.several', SAMPLES['attribution.several'], 'en').text;
    expect(several).toContain(
      'the terminal, Carrier Bluefield and Carrier Corvid held the trailer between, so no single party',
    );
    expect(several).toContain('at the drop on 3 Nov 2026 14:05 by Carrier Northwind;');
    const single = strict('attribution.single', SAMPLES['attribution.single'], 'en').text;
    expect(single).toContain('the yard walk on 3 Nov 2026 14:05 by yard jockey G. Jockey (quick check)');
    expect(single).toContain('as corrected on 3 Nov 2026 15:00');
    expect(strict('hold.at_refused_hook', SAMPLES['hold.at_refused_hook'], 'en').text).toBe(
      'Pin X is not engaged. (found at a refused hook)',
    );
  });

  it('falls back to the stored words for an unknown code or a missing parameter, and says why', () => {
    const unknown = strict('hold.no_such_rule', {}, 'es');
    expect(unknown.text).toBe('<<fallback>>');
    expect(unknown.errors.join()).toContain('unknown reason code');
    const missing = strict('hold.tire_tread_low', { item: 'tires.axle1.left', label: 'x', tread: 1 }, 'en');
    expect(missing.text).toBe('<<fallback>>');
    expect(missing.errors.length).toBeGreaterThan(0);
    const badEvent = strict(
      'attribution.none',
      { ...hinge, current: 'damaged', now: { type: 'drop' } },
      'en',
    );
    expect(badEvent.text).toBe('<<fallback>>');
    expect(renderReason('no.code', {}, 'en', ZONE)).toBe('no.code');
  });
});

describe('checklist labels in reasons', () => {
  const specs = [
    { kind: 'reefer', hingesPerDoor: 5, axles: 4, tireLayout: 'dual' },
    { kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'wide_single' },
    { kind: 'dry_van', hingesPerDoor: 4, axles: 3, tireLayout: 'dual' },
  ] as const;
  const items = new Map(specs.flatMap((s) => buildChecklist(s).items.map((i) => [i.key, i.label] as const)));

  it('names every checklist item in English exactly as the checklist does', () => {
    expect(items.size).toBeGreaterThan(70);
    for (const [key, label] of items) {
      // the label parameter is a sentinel: the English must come from the catalogue, not the fallback
      expect(strict('hold.item_unsafe', { item: key, label: '§' }, 'en').text, key).toBe(
        `${label} was recorded unsafe.`,
      );
    }
  });

  it('names every checklist item in Spanish, none left in English', () => {
    const seen = new Set<string>();
    for (const [key, label] of items) {
      const { text, errors } = strict('hold.item_unsafe', { item: key, label: '§' }, 'es');
      expect(errors, key).toEqual([]);
      expect(text, key).not.toContain('§');
      expect(text, key).not.toContain(label);
      seen.add(text);
    }
    expect(seen.size).toBe(items.size); // two items never share a Spanish name
  });

  it('keeps an unknown item key readable by its recorded label', () => {
    expect(strict('hold.item_unsafe', { item: 'roof.solar_panel', label: 'Solar panel' }, 'es').text).toBe(
      'Solar panel: se registró en condición insegura.',
    );
  });
});

describe('formatStamp (dates in reasons)', () => {
  // reference: date-fns format 'd MMM yyyy HH:mm' with @date-fns/tz, an independent implementation
  const instants = [
    '2026-03-08T07:59:00Z',
    '2026-03-08T08:01:00Z',
    '2026-11-01T06:30:00Z',
    '2026-12-31T23:59:00Z',
  ];
  it.each(instants)('writes %s in English as date-fns does, in the terminal zone', (iso) => {
    for (const zone of ['America/Chicago', 'America/Los_Angeles', 'UTC'])
      expect(formatStamp(iso, zone, 'en')).toBe(format(new Date(iso), 'd MMM yyyy HH:mm', { in: tz(zone) }));
  });
  it('writes Spanish month abbreviations in lower case (CLDR es)', () => {
    expect(formatStamp('2026-11-03T20:05:00Z', 'America/Chicago', 'es')).toBe('3 nov 2026 14:05');
    // 8 Mar 2026 02:30 does not exist in Chicago: 08:30Z is 03:30 CDT (IANA tz database)
    expect(formatStamp('2026-03-08T08:30:00Z', 'America/Chicago', 'es')).toBe('8 mar 2026 03:30');
  });
});

describe('stored rows in the reader language', () => {
  const row = {
    reason: 'Spare tire is missing.',
    reasonCode: 'hold.spare_unusable',
    reasonParams: { item: 'undercarriage.spare_tire', label: 'Spare tire', problem: 'missing' },
    caution: 'stored caution words',
    cautionCode: 'caution.under_trailer',
    cautionParams: {},
  };
  it('renders code and caution in Spanish, and keeps the stored English for rows without a code', () => {
    const [es] = readable([row], 'es', ZONE);
    expect(es.reason).toBe('Llanta de refacción: falta.');
    expect(es.caution).toMatch(/^Calce las llantas/);
    const [old] = readable([{ reason: 'Old words.', reasonCode: null }], 'es', ZONE);
    expect(old.reason).toBe('Old words.');
    expect(storedText('Kept as stored.', 'hold.no_such', {}, 'es', ZONE)).toBe('Kept as stored.');
  });
});
