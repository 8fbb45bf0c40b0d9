import { describe, expect, it } from 'vitest';
import { reconcileWalk } from '@/lib/engine';
import type { BoardSlot } from '@/lib/engine';

const board: BoardSlot[] = [
  { slotId: 'A-01', rowId: 'A', expectedTrailerId: 't1' },
  { slotId: 'A-02', rowId: 'A', expectedTrailerId: 't2' },
  { slotId: 'A-03', rowId: 'A', expectedTrailerId: null },
  { slotId: 'A-04', rowId: 'A', expectedTrailerId: 't4' },
  { slotId: 'B-01', rowId: 'B', expectedTrailerId: 't5' },
  { slotId: 'B-02', rowId: 'B', expectedTrailerId: 't6' },
];
const scan = (slotId: string, trailerId: string | null, code = trailerId ?? 'UNREAD') => ({
  slotId,
  trailerId,
  code,
});

describe('reconcileWalk', () => {
  it('classifies every walked slot and every trailer', () => {
    const r = reconcileWalk({
      board,
      rowIds: ['A'],
      scans: [
        scan('A-01', 't1'), // matched
        scan('A-02', 't5'), // t5 belongs in B-01 (row not walked): wrong slot
        scan('A-03', null, 'HM 9999'), // unknown unit in an empty slot
        // A-04 scanned empty: t4 missing
      ],
    });
    const slot = (id: string) => r.slots.find((s) => s.slotId === id)!;
    const trailer = (id: string) => r.trailers.find((t) => t.trailerId === id)!;
    expect(slot('A-01').status).toBe('matched');
    expect(slot('A-02')).toMatchObject({ status: 'wrong_trailer', found: ['t5'], expectedTrailerId: 't2' });
    expect(slot('A-03')).toMatchObject({ status: 'unexpected', found: ['HM 9999'] });
    expect(slot('A-04').status).toBe('missing');
    expect(r.slots.some((s) => s.rowId === 'B')).toBe(false);
    expect(trailer('t1').status).toBe('matched');
    expect(trailer('t5')).toMatchObject({
      status: 'wrong_slot',
      expectedSlotId: 'B-01',
      foundSlotIds: ['A-02'],
    });
    expect(trailer('HM 9999')).toMatchObject({ status: 'unknown', isKnownTrailer: false });
    expect(trailer('t2')).toMatchObject({ status: 'missing', expectedSlotId: 'A-02' });
    expect(trailer('t4').status).toBe('missing');
    expect(r.trailers.some((t) => t.trailerId === 't6')).toBe(false); // row B not walked
    expect(r.summary).toEqual({
      slots: { matched: 1, empty: 0, missing: 1, wrong_trailer: 1, unexpected: 1 },
      trailers: { matched: 1, wrong_slot: 1, missing: 2, unknown: 1, duplicate: 0 },
      scans: 3,
      repeatScans: 0,
    });
  });

  it('an empty slot seen empty is empty; a known trailer not on the board is unknown', () => {
    const r = reconcileWalk({ board, rowIds: ['A'], scans: [scan('A-03', 't99')] });
    expect(r.slots.find((s) => s.slotId === 'A-03')!.status).toBe('unexpected');
    expect(r.trailers.find((t) => t.trailerId === 't99')).toMatchObject({
      status: 'unknown',
      isKnownTrailer: true,
    });
    const clean = reconcileWalk({
      board,
      rowIds: ['A'],
      scans: [scan('A-01', 't1'), scan('A-02', 't2'), scan('A-04', 't4')],
    });
    expect(clean.summary.slots).toEqual({
      matched: 3,
      empty: 1,
      missing: 0,
      wrong_trailer: 0,
      unexpected: 0,
    });
    expect(clean.summary.trailers.missing).toBe(0);
  });

  it('a trailer scanned in two slots is a duplicate; the same slot twice is a counted repeat', () => {
    const r = reconcileWalk({
      board,
      rowIds: ['A'],
      scans: [scan('A-01', 't1'), scan('A-01', 't1'), scan('A-02', 't2'), scan('A-04', 't2')],
    });
    expect(r.summary.repeatScans).toBe(1);
    expect(r.trailers.find((t) => t.trailerId === 't1')!.status).toBe('matched');
    expect(r.trailers.find((t) => t.trailerId === 't2')).toMatchObject({
      status: 'duplicate',
      foundSlotIds: ['A-02', 'A-04'],
    });
    expect(r.slots.find((s) => s.slotId === 'A-04')!.status).toBe('wrong_trailer');
    expect(r.summary.scans).toBe(4);
  });

  it('reports scans in slots off the board', () => {
    const r = reconcileWalk({ board, rowIds: ['A'], scans: [scan('Z-09', 't1')] });
    expect(r.slots.find((s) => s.slotId === 'Z-09')).toMatchObject({ rowId: null, status: 'unexpected' });
    expect(r.trailers.find((t) => t.trailerId === 't1')).toMatchObject({
      status: 'wrong_slot',
      expectedSlotId: 'A-01',
    });
    expect(r.slots.find((s) => s.slotId === 'A-01')!.status).toBe('missing');
  });

  it('an empty walk finds every expected trailer of the walked rows missing', () => {
    const r = reconcileWalk({ board, rowIds: ['A', 'B'], scans: [] });
    expect(r.summary.trailers.missing).toBe(5);
    expect(r.summary.slots).toMatchObject({ missing: 5, empty: 1 });
  });
});
