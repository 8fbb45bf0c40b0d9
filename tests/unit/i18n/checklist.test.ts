import { createTranslator } from 'next-intl';
import { describe, expect, it } from 'vitest';
import { buildChecklist, type TrailerSpec } from '@/lib/engine';
import { safetyGroups } from '@/lib/engine/safety';
import {
  hasChecklistMessage,
  itemLabel,
  itemMessage,
  localizeChecklist,
  zoneLabel,
  zoneMessage,
} from '@/lib/i18n/checklist';
import { LOCALES } from '@/lib/i18n/locales';
import { MESSAGES } from '@/lib/i18n/messages';

// every trailer shape the engine accepts (lib/engine/types/checklist.ts: kind, 4 or 5 hinges per
// door, 1 to 4 axles, dual or wide-single tires)
const SHAPES: TrailerSpec[] = (['reefer', 'dry_van'] as const).flatMap((kind) =>
  ([4, 5] as const).flatMap((hingesPerDoor) =>
    [1, 2, 3, 4].flatMap((axles) =>
      (['dual', 'wide_single'] as const).map((tireLayout) => ({ kind, hingesPerDoor, axles, tireLayout })),
    ),
  ),
);
const ALL = SHAPES.map(buildChecklist);
const ITEM_KEYS = [...new Set(ALL.flatMap((c) => c.items.map((i) => i.key)))];
const ZONE_KEYS = [...new Set(ALL.flatMap((c) => c.zones.map((z) => z.key)))];

describe('the checklist in the reader’s language', () => {
  it('has a message for every item key and zone key of every trailer shape, in both languages', () => {
    expect(SHAPES).toHaveLength(32);
    // 4 axles of dual tires (16 tires) and 5 hinges a door are the largest shapes
    expect(ITEM_KEYS).toContain('tires.axle4.right_outer');
    expect(ITEM_KEYS).toContain('rear.door_right.hinge_5');
    const missing: string[] = [];
    for (const locale of LOCALES) {
      for (const key of ITEM_KEYS) {
        const m = itemMessage(key);
        if (!m || !hasChecklistMessage(locale, m.key)) missing.push(`${locale} item ${key}`);
      }
      for (const key of ZONE_KEYS) {
        const m = zoneMessage(key);
        if (!m || !hasChecklistMessage(locale, m.key)) missing.push(`${locale} zone ${key}`);
      }
    }
    // a missing entry would fall back to the engine's English label on a Spanish screen
    expect(missing).toEqual([]);
  });

  it('says in English exactly what the engine records, so stored labels and screens agree', () => {
    for (const checklist of ALL) {
      for (const z of checklist.zones) {
        expect(zoneLabel('en', z.key, '')).toBe(z.label);
        for (const i of z.items) expect(itemLabel('en', i.key, '')).toBe(i.label);
      }
    }
  });

  it('says every item and zone in Spanish with its own words and every value in place', () => {
    const es = (key: string) => itemLabel('es', key, '');
    expect(es('undercarriage.tandem_pin.left_rear')).toBe('Perno del tándem, izquierdo trasero');
    expect(es('undercarriage.spare_tire')).toBe('Llanta de refacción');
    expect(es('rear.door_right.hinge_3')).toBe('Bisagra 3 de la puerta derecha (desde arriba)');
    expect(es('tires.axle2.left_inner')).toBe('Eje 2, llanta y rin interior izquierdo');
    expect(es('left_side.skin')).toBe('Lámina del lado izquierdo');
    expect(zoneLabel('es', 'undercarriage', '')).toBe('Parte de abajo');
    const english = new Set(ITEM_KEYS.map((k) => itemLabel('en', k, '')));
    for (const key of ITEM_KEYS) {
      const words = es(key);
      expect(words, key).not.toMatch(/[{}]/);
      expect(english.has(words), `${key} still in English: ${words}`).toBe(false);
    }
  });

  it('falls back to the recorded label for a key the engine never makes', () => {
    expect(itemLabel('es', 'nose.no_such_part', 'Recorded label')).toBe('Recorded label');
    // a group of messages is not a label
    expect(itemLabel('es', 'undercarriage.landing_gear', 'Landing gear')).toBe('Landing gear');
    expect(itemLabel('es', 'Not a key!', 'As recorded')).toBe('As recorded');
    expect(zoneLabel('es', 'roof_top', 'Roof')).toBe('Roof');
  });

  it('localizes a whole checklist for a screen and keeps every key', () => {
    const spec: TrailerSpec = { kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' };
    const checklist = buildChecklist(spec);
    const es = localizeChecklist(checklist, 'es');
    expect(es.zones.map((z) => z.key)).toEqual(checklist.zones.map((z) => z.key));
    expect(es.zones.flatMap((z) => z.items.map((i) => i.key))).toEqual(checklist.items.map((i) => i.key));
    expect(es.zones[0].label).toBe('Frente de la caja');
    // the engine's own checklist is left as it was (English, for the record)
    expect(checklist.zones[0].label).toBe('Nose');
  });
});

describe('the safety statements of the gate form', () => {
  const t = (locale: 'en' | 'es') =>
    createTranslator({ locale, messages: MESSAGES[locale], namespace: 'Handoff.safety' });
  const count = (key: string, n: number) => (key === 'rear_doors' ? n - 2 : n);

  it('say in English what the engine’s statement says, for every trailer shape', () => {
    const en = t('en');
    for (const checklist of ALL) {
      for (const g of safetyGroups(checklist)) {
        expect(en(`groups.${g.key}`)).toBe(g.label);
        expect(en(`statements.${g.key}`, { count: count(g.key, g.itemKeys.length) })).toBe(g.statement);
      }
    }
  });

  it('say the number in Spanish words', () => {
    const es = t('es');
    expect(es('statements.tandem_pins', { count: 4 })).toBe(
      'Los cuatro pernos del tándem salidos y trabados: revisé cada uno',
    );
    expect(es('statements.tires', { count: 8 })).toMatch(/^Las ocho llantas tienen aire/);
    expect(es('statements.rear_doors', { count: 10 })).toMatch(/^Las diez bisagras/);
  });
});
