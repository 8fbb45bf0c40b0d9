import { describe, expect, it } from 'vitest';
import {
  attributeFindings,
  buildChecklist,
  buildCustodyLegs,
  compareInspection,
  currentCustodian,
} from '@/lib/engine';
import type { InspectionEvent, TimelineEvent } from '@/lib/engine';
import { renderReason } from '@/lib/i18n/reasons';
import { bluefield, corvid, drop, hook, move, northwind, TZ, walk } from './fixtures';

const checklist = buildChecklist({ kind: 'reefer', hingesPerDoor: 4, axles: 2, tireLayout: 'dual' });
const HINGE = 'rear.door_left.hinge_3';

function attribute(history: TimelineEvent[], current: InspectionEvent, terminalName?: string) {
  const findings = compareInspection({ checklist, history, current });
  // the engine answers in codes; the English the clerk reads comes from the renderer (lib/i18n/reasons.ts)
  return attributeFindings({ history, current, findings, terminalName }).map((a) => {
    const errors: string[] = [];
    const reason = renderReason(a.reason.code, a.reason.params, 'en', TZ, { onError: (m) => errors.push(m) });
    expect(errors).toEqual([]);
    return { ...a, coded: a.reason, reason };
  });
}

describe('custody legs', () => {
  it('drop hands custody to the terminal, hook to the driver carrier, moves keep it (common practice)', () => {
    const t = [
      drop('2026-11-01T10:00:00Z', northwind),
      move('2026-11-01T11:00:00Z'),
      hook('2026-11-02T10:00:00Z', bluefield),
    ];
    const legs = buildCustodyLegs(t);
    // drop → move → hook is one terminal leg, not two.
    expect(legs.map((l) => (l.custodian.type === 'terminal' ? 'terminal' : l.custodian.carrierId))).toEqual([
      'c-nw',
      'terminal',
      'c-bf',
    ]);
    expect(legs[0]).toMatchObject({ from: null, toEventId: t[0].id });
    expect(legs[1]).toMatchObject({ fromEventId: t[0].id, toEventId: t[2].id, to: t[2].at });
    expect(legs[2]).toMatchObject({ fromEventId: t[2].id, to: null });
    expect(legs.every((l) => !l.isUnrecordedChange)).toBe(true);
    expect(currentCustodian(t)).toMatchObject({ type: 'carrier', carrierId: 'c-bf' });
    expect(currentCustodian([])).toBeNull();
  });

  it('flags custody passed on without a handoff (hooked by one carrier, dropped by another)', () => {
    const legs = buildCustodyLegs([
      hook('2026-11-01T10:00:00Z', northwind),
      drop('2026-11-02T10:00:00Z', bluefield),
    ]);
    const between = legs.filter((l) => l.from !== null && l.to !== null);
    expect(between).toHaveLength(2);
    expect(between.every((l) => l.isUnrecordedChange)).toBe(true);
  });
});

describe('custody legs, open ends', () => {
  it('keeps the current terminal leg open after a drop and later walks', () => {
    const d = drop('2026-11-01T10:00:00Z', northwind);
    const legs = buildCustodyLegs([d, walk('2026-11-02T10:00:00Z'), move('2026-11-02T11:00:00Z')]);
    expect(legs).toHaveLength(2);
    expect(legs[1]).toMatchObject({
      custodian: { type: 'terminal' },
      fromEventId: d.id,
      toEventId: null,
      to: null,
    });
  });

  it('starts a fresh leg after an unrecorded change instead of merging across it', () => {
    const t = [
      hook('2026-11-01T10:00:00Z', northwind),
      drop('2026-11-02T10:00:00Z', bluefield),
      hook('2026-11-03T10:00:00Z', corvid),
    ];
    const legs = buildCustodyLegs(t);
    expect(
      legs.map((l) => [
        l.custodian.type === 'terminal' ? 'terminal' : l.custodian.carrierId,
        l.isUnrecordedChange,
      ]),
    ).toEqual([
      ['terminal', false],
      ['c-nw', true],
      ['c-bf', true],
      ['terminal', false],
      ['c-cv', false],
    ]);
  });
});

describe('attributeFindings', () => {
  it('damage found at a hook is the terminal leg: the pickup report protects the hooking driver', () => {
    const k = drop('2026-11-03T20:05:00Z', northwind, { [HINGE]: { condition: 'ok' } });
    const n = hook('2026-11-05T15:10:00Z', bluefield, { [HINGE]: { condition: 'damaged' } });
    const [a] = attribute([k, move('2026-11-04T09:00:00Z')], n, 'the Eastgate terminal');
    expect(a).toMatchObject({
      status: 'single',
      responsible: { type: 'terminal' },
      confidence: 'high',
      finding: 'new',
    });
    expect(a.candidates.some((c) => c.type === 'carrier' && c.carrierId === 'c-bf')).toBe(false);
    expect(a.legs).toHaveLength(1);
    expect(a.legs[0]).toMatchObject({ fromEventId: k.id, toEventId: n.id });
    // 20:05Z is 14:05 in America/Chicago (CST, UTC−6 after the November change; IANA tz database).
    expect(a.reason).toBe(
      'Left door hinge 3 (from top): inspected ok at the drop on 3 Nov 2026 14:05 by driver D. Example ' +
        '(Carrier Northwind); found damaged at the hook on 5 Nov 2026 09:10 by driver E. Sample ' +
        '(Carrier Bluefield); only the Eastgate terminal held the trailer between. A hook is the ' +
        "driver's pickup report, so this is not charged to the hooking driver.",
    );
  });

  it('damage found at a drop after one carrier trip goes to that carrier, high confidence', () => {
    const k = hook('2026-11-01T10:00:00Z', bluefield, { [HINGE]: { condition: 'ok' } });
    const n = drop('2026-11-02T10:00:00Z', bluefield, { [HINGE]: { condition: 'damaged' } });
    const [a] = attribute([k], n);
    expect(a).toMatchObject({
      status: 'single',
      confidence: 'high',
      responsible: { type: 'carrier', carrierId: 'c-bf' },
    });
    expect(a.reason).toContain('only Carrier Bluefield held the trailer between.');
    expect(a.reason).not.toContain('pickup report');
  });

  it('several custodians between the inspections: no single party, candidates listed', () => {
    const k = drop('2026-11-01T10:00:00Z', northwind, { [HINGE]: { condition: 'ok' } });
    const h = hook('2026-11-02T10:00:00Z', bluefield, {}); // hinge not checked at this hook
    const n = drop('2026-11-03T10:00:00Z', bluefield, { [HINGE]: { condition: 'damaged' } });
    const [a] = attribute([k, h], n);
    expect(a.status).toBe('several');
    expect(a.responsible).toBeNull();
    expect(a.confidence).toBeNull();
    expect(a.candidates.map((c) => (c.type === 'terminal' ? 'terminal' : c.carrierId))).toEqual([
      'terminal',
      'c-bf',
    ]);
    expect(a.reason).toContain(
      'the terminal and Carrier Bluefield held the trailer between, so no single party',
    );
  });

  it('a relay without a handoff lists both carriers and says custody changed unrecorded', () => {
    const k = hook('2026-11-01T10:00:00Z', northwind, { [HINGE]: { condition: 'ok' } });
    const n = drop('2026-11-02T10:00:00Z', corvid, { [HINGE]: { condition: 'unsafe' } });
    const [a] = attribute([k], n);
    expect(a.status).toBe('several');
    expect(a.candidates.map((c) => (c.type === 'carrier' ? c.carrierId : 'terminal'))).toEqual([
      'c-nw',
      'c-cv',
    ]);
    expect(a.reason).toContain('without a Hitchmark handoff');
  });

  it('a yard walk quick check narrows the interval but gives medium confidence', () => {
    const k = drop('2026-11-01T10:00:00Z', northwind, { [HINGE]: { condition: 'ok' } });
    const w = walk('2026-11-02T10:00:00Z', { [HINGE]: { condition: 'ok' } });
    const h = hook('2026-11-03T10:00:00Z', bluefield, { [HINGE]: { condition: 'ok' } });
    const n = drop('2026-11-04T10:00:00Z', bluefield, { [HINGE]: { condition: 'damaged' } });
    const [viaHook] = attribute([k, w, h], n);
    expect(viaHook).toMatchObject({ status: 'single', confidence: 'high', previousEventId: h.id });
    const n2 = hook('2026-11-03T10:00:00Z', bluefield, { [HINGE]: { condition: 'damaged' } });
    const [viaWalk] = attribute([k, w], n2);
    expect(viaWalk).toMatchObject({
      status: 'single',
      confidence: 'medium',
      responsible: { type: 'terminal' },
    });
    expect(viaWalk.reason).toContain(
      'the yard walk on 2 Nov 2026 04:00 by yard jockey G. Jockey (quick check)',
    );
  });

  it('no earlier inspection of the item: no attribution, and says so', () => {
    const n = drop('2026-11-01T10:00:00Z', northwind, { [HINGE]: { condition: 'damaged' } });
    const [a] = attribute([], n);
    expect(a).toMatchObject({ status: 'none', finding: 'first_record', responsible: null, candidates: [] });
    expect(a.reason).toContain('no earlier inspection of this item is on record');
  });

  it('attributes nothing for repaired, unchanged, not checked or a clean first record', () => {
    const k = drop('2026-11-01T10:00:00Z', northwind, {
      [HINGE]: { condition: 'damaged' },
      'rear.header': { condition: 'minor' },
    });
    const n = hook('2026-11-02T10:00:00Z', bluefield, {
      [HINGE]: { condition: 'ok' },
      'rear.header': { condition: 'minor' },
      'rear.lights': { condition: 'ok' },
    });
    expect(attribute([k], n)).toEqual([]);
  });

  it('worse damage is attributed like new damage', () => {
    const k = hook('2026-11-01T10:00:00Z', bluefield, { 'left_side.skin': { condition: 'minor' } });
    const n = drop('2026-11-02T10:00:00Z', bluefield, { 'left_side.skin': { condition: 'damaged' } });
    const [a] = attribute([k], n);
    expect(a).toMatchObject({ finding: 'worse', status: 'single' });
    expect(a.reason).toContain('inspected with minor marks at the hook');
  });

  it('damage first seen on a yard walk after a drop lands on the terminal, medium confidence', () => {
    const k = drop('2026-11-01T10:00:00Z', northwind, { 'undercarriage.mud_flap.left': { condition: 'ok' } });
    const w = walk('2026-11-02T10:00:00Z', { 'undercarriage.mud_flap.left': { condition: 'missing' } });
    const [a] = attribute([k, move('2026-11-01T12:00:00Z')], w);
    expect(a).toMatchObject({
      status: 'single',
      confidence: 'medium',
      responsible: { type: 'terminal' },
      finding: 'new',
    });
    expect(a.reason).toContain('found missing at the yard walk');
  });

  it('over a long history finds the one old inspection and every custodian since', () => {
    const history: TimelineEvent[] = [
      drop('2026-01-01T00:00:00Z', northwind, { [HINGE]: { condition: 'ok' } }),
    ];
    const parties = [bluefield, corvid];
    for (let i = 1; i <= 200; i++) {
      const at = new Date(Date.UTC(2026, 0, 1, i)).toISOString();
      const p = parties[Math.floor(i / 2) % 2];
      history.push(i % 2 === 1 ? hook(at, p) : drop(at, parties[Math.floor((i - 1) / 2) % 2]));
    }
    const n = hook('2026-02-01T00:00:00Z', corvid, { [HINGE]: { condition: 'damaged' } });
    const [a] = attribute(history, n);
    expect(a.previousEventId).toBe(history[0].id);
    expect(a.status).toBe('several');
    expect(a.candidates.map((c) => (c.type === 'terminal' ? 'terminal' : c.carrierId)).sort()).toEqual([
      'c-bf',
      'c-cv',
      'terminal',
    ]);
    // Legs alternate: 100 terminal legs ending at the 100 earlier hooks, 100 carrier trips, and
    // the terminal leg ending at this hook.
    expect(a.legs).toHaveLength(201);
  });
});
