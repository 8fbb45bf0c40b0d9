import { describe, expect, it } from 'vitest';
import { filterRows, tableRows } from '@/lib/yard/board';
import { boardCsv } from '@/lib/yard/csv';
import { COLUMNS, rowCells, sortRows } from '@/lib/yard/table';
import { board, spot, trailer } from './fixtures';

/** An RFC 4180 reader written here on its own, so the export is checked by something other than itself. */
function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      row.push(field);
      field = '';
    } else if (c === '\r' && text[i + 1] === '\n') {
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
      i++;
    } else field += c;
  }
  return rows;
}

describe('CSV export of the board', () => {
  const now = new Date('2026-03-09T18:00:00Z');
  const b = board([
    spot(
      'A01',
      1,
      trailer({
        id: 'r1',
        unitNumber: 'R1',
        holds: [
          { severity: 'out_of_service', reason: 'Tire "axle 1", flat, not holding air' },
          { severity: 'restricted', reason: 'No perishable loads' },
        ],
      }),
    ),
    spot('A02', 2, null),
    spot(
      'Door 1',
      3,
      trailer({ id: 'v1', unitNumber: 'OS7109', kind: 'dry_van', fuelEighths: null, isReeferOn: null }),
      null,
    ),
  ]);

  it('quotes fields with commas, quotes and line breaks (RFC 4180 section 2, rules 6 and 7)', () => {
    const odd = board([
      spot(
        'A01',
        1,
        trailer({
          id: 'q1',
          unitNumber: 'Q1',
          holds: [{ severity: 'restricted', reason: 'say "hi"\ntwo lines' }],
        }),
      ),
    ]);
    const text = boardCsv(tableRows(odd), odd.terminal.timeZone, now);
    const line = text.split('\r\n')[1];
    // plain fields bare; the comma inside "On, 34.0 °F" and the quote and line break of the hold quoted
    expect(line.startsWith('Q1,A01,Empty,"On, 34.0 °F",6/8,')).toBe(true);
    expect(text).toContain('"Restricted: say ""hi""\ntwo lines"');
    expect(parseCsv(text)[1][5]).toBe('Restricted: say "hi"\ntwo lines');
  });

  it('cannot smuggle a spreadsheet formula in through a unit number or a slot label', () => {
    // OWASP "CSV Injection": a cell starting with = + - @ (or tab, CR) runs as a formula when the
    // file is opened in a spreadsheet; such a cell is written with a leading apostrophe.
    const risky = board([
      spot('=HYPERLINK("http://x.example")', 1, trailer({ id: 'f1', unitNumber: '@SUM(A1:A9)' })),
      spot('+A02', 2, trailer({ id: 'f2', unitNumber: '-2+3' })),
    ]);
    const parsed = parseCsv(boardCsv(tableRows(risky), risky.terminal.timeZone, now));
    expect(parsed.slice(1).map((r) => [r[0], r[1]])).toEqual([
      ["'@SUM(A1:A9)", '\'=HYPERLINK("http://x.example")'],
      ["'-2+3", "'+A02"],
    ]);
  });

  it('has the table header and exactly the table cells, row for row', () => {
    const rows = sortRows(filterRows(tableRows(b), [], b.policy, now), 'unit', 'desc', now);
    const parsed = parseCsv(boardCsv(rows, b.terminal.timeZone, now));
    expect(parsed[0]).toEqual(COLUMNS.map((c) => c.header));
    expect(parsed.slice(1)).toEqual(rows.map((r) => rowCells(r, b.terminal.timeZone, now)));
    expect(parsed.slice(1).map((r) => r[0])).toEqual(['R1', 'OS7109']);
    expect(parsed[1][5]).toBe(
      'Out of service: Tire "axle 1", flat, not holding air; Restricted: No perishable loads',
    );
  });

  it('ends every line with CRLF (RFC 4180 section 2, rule 1)', () => {
    const text = boardCsv(tableRows(b), b.terminal.timeZone, now);
    expect(text.endsWith('\r\n')).toBe(true);
    expect(text.split('\r\n')).toHaveLength(4); // header, two rows, empty after the last CRLF
  });
});
