import { describe, expect, it } from 'vitest';
import {
  buildChecklist,
  classifyChange,
  compareInspection,
  compareSeverity,
  damageFindings,
  isCondition,
  severityOf,
  worstCondition,
} from '@/lib/engine';
import { bluefield, drop, hook, move, northwind, walk } from './fixtures';

const checklist = buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
const HINGE = 'rear.door_left.hinge_3';
const find = (fs: ReturnType<typeof compareInspection>, key: string) => fs.find((f) => f.itemKey === key)!;

describe('conditions', () => {
  it('orders severity ok < minor < damaged < unsafe < missing (condition scale, common practice)', () => {
    expect(compareSeverity('ok', 'minor')).toBeLessThan(0);
    expect(compareSeverity('damaged', 'minor')).toBeGreaterThan(0);
    expect(compareSeverity('missing', 'unsafe')).toBeGreaterThan(0);
    expect(severityOf('not_checked')).toBeNull();
    expect(() => compareSeverity('not_checked', 'ok')).toThrow(RangeError);
  });

  it('takes the worst inspected condition and ignores not_checked', () => {
    expect(worstCondition(['ok', 'not_checked', 'damaged', 'minor'])).toBe('damaged');
    expect(worstCondition(['not_checked'])).toBe('not_checked');
    expect(isCondition('unsafe')).toBe(true);
    expect(isCondition('fine')).toBe(false);
  });
});

describe('classifyChange', () => {
  it.each([
    ['damaged', 'ok', 'new'],
    ['minor', 'ok', 'new'],
    ['damaged', 'minor', 'worse'],
    ['unsafe', 'damaged', 'worse'],
    ['ok', 'damaged', 'repaired'],
    ['minor', 'damaged', 'repaired'],
    ['damaged', 'damaged', 'unchanged'],
    ['ok', null, 'first_record'],
    ['not_checked', 'ok', 'not_checked'],
  ] as const)('%s after %s is %s', (cur, prev, expected) => {
    expect(classifyChange(cur, prev)).toBe(expected);
  });
});

describe('compareInspection', () => {
  it('first handoff ever: every inspected item is a first record, the rest not checked', () => {
    const first = drop('2026-11-03T20:05:00Z', northwind, { [HINGE]: { condition: 'damaged' } });
    const fs = compareInspection({ checklist, history: [], current: first });
    expect(fs).toHaveLength(checklist.items.filter((i) => i.kind !== 'reading').length);
    expect(find(fs, HINGE)).toMatchObject({ finding: 'first_record', previous: null, previousEventId: null });
    expect(find(fs, 'rear.header')).toMatchObject({ finding: 'not_checked', current: 'not_checked' });
    expect(damageFindings(fs)).toEqual([]);
  });

  it('skips a handoff where the item was not checked and compares with the one before', () => {
    const a = drop('2026-11-01T10:00:00Z', northwind, { [HINGE]: { condition: 'ok' } });
    const b = hook('2026-11-02T10:00:00Z', bluefield, { [HINGE]: { condition: 'not_checked' } });
    const c = drop('2026-11-03T10:00:00Z', bluefield, {});
    const d = hook('2026-11-04T10:00:00Z', northwind, { [HINGE]: { condition: 'damaged' } });
    const f = find(compareInspection({ checklist, history: [a, b, c], current: d }), HINGE);
    expect(f).toMatchObject({ finding: 'new', previous: 'ok', previousEventId: a.id, previousIndex: 0 });
  });

  it('never treats not_checked now as ok: a damaged item not checked stays not_checked', () => {
    const a = drop('2026-11-01T10:00:00Z', northwind, { [HINGE]: { condition: 'damaged' } });
    const b = hook('2026-11-02T10:00:00Z', bluefield, {});
    const f = find(compareInspection({ checklist, history: [a], current: b }), HINGE);
    expect(f.finding).toBe('not_checked');
    expect(f.current).toBe('not_checked');
    expect(f.previous).toBe('damaged');
  });

  it('reports a repaired item and worse damage', () => {
    const a = drop('2026-11-01T10:00:00Z', northwind, {
      [HINGE]: { condition: 'damaged' },
      'left_side.skin': { condition: 'minor' },
    });
    const b = hook('2026-11-02T10:00:00Z', bluefield, {
      [HINGE]: { condition: 'ok' },
      'left_side.skin': { condition: 'damaged' },
    });
    const fs = compareInspection({ checklist, history: [a], current: b });
    expect(find(fs, HINGE).finding).toBe('repaired');
    expect(find(fs, 'left_side.skin').finding).toBe('worse');
    expect(damageFindings(fs).map((f) => f.itemKey)).toEqual(['left_side.skin']);
  });

  it('uses a yard walk quick check as the latest inspection of the items it covers', () => {
    const a = drop('2026-11-01T10:00:00Z', northwind, {
      [HINGE]: { condition: 'ok' },
      'rear.header': { condition: 'ok' },
    });
    const w = walk('2026-11-02T10:00:00Z', { 'rear.header': { condition: 'minor' } });
    const m = move('2026-11-02T12:00:00Z');
    const b = hook('2026-11-03T10:00:00Z', bluefield, {
      [HINGE]: { condition: 'ok' },
      'rear.header': { condition: 'minor' },
    });
    const fs = compareInspection({ checklist, history: [a, w, m], current: b });
    expect(find(fs, 'rear.header')).toMatchObject({
      finding: 'unchanged',
      previousEventId: w.id,
      previousInspection: 'quick',
    });
    expect(find(fs, HINGE)).toMatchObject({
      finding: 'unchanged',
      previousEventId: a.id,
      previousInspection: 'full',
    });
  });

  it('ignores keys that are not on this trailer checklist', () => {
    const a = drop('2026-11-01T10:00:00Z', northwind, { 'rear.door_left.hinge_5': { condition: 'ok' } });
    const fs = compareInspection({ checklist, history: [], current: a });
    expect(fs.some((f) => f.itemKey === 'rear.door_left.hinge_5')).toBe(false);
  });
});
