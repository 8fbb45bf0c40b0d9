import { describe, expect, it } from 'vitest';
import { firstLoadBoard, firstRows } from '@/lib/yard/row-window';
import type { Board, BoardSpot } from '@/lib/yard/types';

// `common practice` for long lists on a phone: draw what fits the first screens, open the rest
// on demand; the numbers below are this module's own rule (rows in order up to a slot count).
const spot = (rowId: string | null, i: number, kind: 'slot' | 'door' = 'slot'): BoardSpot => ({
  id: `${rowId ?? 'door'}-${i}`,
  label: `${rowId ?? 'D'}-${i}`,
  kind,
  rowId,
  order: i,
  trailer: null,
});
const board = (rows: number, perRow: number, doors = 0): Board => ({
  terminal: { name: 'Riverbend terminal', timeZone: 'America/Chicago' },
  policy: { freeTimeHours: 48, lowFuelEighths: 2 },
  rows: Array.from({ length: rows }, (_, r) => ({ id: `r${r}`, name: `Row ${r}` })),
  spots: [
    ...Array.from({ length: rows * perRow }, (_, i) => spot(`r${Math.floor(i / perRow)}`, i)),
    ...Array.from({ length: doors }, (_, i) => spot(null, i, 'door')),
  ],
  generatedAt: '2026-12-02T12:00:00.000Z',
});

describe('the rows a big yard draws first', () => {
  it('draws rows in order up to the slot count, and always at least one', () => {
    expect([...firstRows(board(80, 25), 300)]).toEqual(Array.from({ length: 12 }, (_, r) => `r${r}`));
    expect([...firstRows(board(3, 500), 300)]).toEqual(['r0']);
  });

  it('hands a 2,000-slot yard to the browser as its first rows and every door, marked partial', () => {
    const first = firstLoadBoard(board(80, 25, 12), 300);
    expect(first.isPartial).toBe(true);
    expect(first.spots.filter((s) => s.kind === 'slot')).toHaveLength(300);
    expect(first.spots.filter((s) => s.kind === 'door')).toHaveLength(12);
    expect(first.rows).toHaveLength(80);
  });

  it('hands a small yard over whole', () => {
    const small = board(4, 25, 6);
    const first = firstLoadBoard(small, 300);
    expect(first.isPartial).toBe(false);
    expect(first.spots).toHaveLength(small.spots.length);
  });
});
