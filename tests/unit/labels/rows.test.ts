import { describe, expect, it } from 'vitest';
import { rowsByTerminal, type LabelRow } from '@/lib/labels/rows';

const row = (id: string, name: string, terminalId: string, terminalName: string): LabelRow => ({
  id,
  name,
  terminalId,
  terminalName,
  trailerCount: 3,
});

// As the query lists them: terminals by name, rows by their order. Both terminals have a "Row A".
const listed = [
  row('n-a', 'Row A', 'north', 'Cedar Flats terminal'),
  row('n-b', 'Row B', 'north', 'Cedar Flats terminal'),
  row('s-a', 'Row A', 'south', 'Willow Bend terminal'),
  row('s-b', 'Row B', 'south', 'Willow Bend terminal'),
];

describe('the label sheet’s row chooser', () => {
  it('puts the user’s own terminal first, so its first row link is one of the user’s own rows', () => {
    const groups = rowsByTerminal(listed, 'south');
    expect(groups.map((g) => g.terminalName)).toEqual(['Willow Bend terminal', 'Cedar Flats terminal']);
    expect(groups[0].rows.map((r) => r.id)).toEqual(['s-a', 's-b']);
    expect(groups[1].rows.map((r) => r.id)).toEqual(['n-a', 'n-b']);
  });
  it('keeps the listed order for a user without a home terminal', () => {
    expect(rowsByTerminal(listed, null).flatMap((g) => g.rows.map((r) => r.id))).toEqual([
      'n-a',
      'n-b',
      's-a',
      's-b',
    ]);
  });
});
