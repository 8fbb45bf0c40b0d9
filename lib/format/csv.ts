// CSV for spreadsheets: RFC 4180 quoting and CRLF line ends by csv-stringify, plus a guard against
// formula injection (a text cell starting with = + - @, tab or CR would run as a formula when
// opened in a spreadsheet; OWASP "CSV injection" advises prefixing such cells with a quote).
import { stringify } from 'csv-stringify/sync';

export type CsvCell = string | number | null | undefined;

const FORMULA_START = /^[=+\-@\t\r]/;

/** A text cell made safe to open in a spreadsheet; numbers stay numbers. */
export function neutralizeFormula(cell: CsvCell): string {
  if (cell === null || cell === undefined) return '';
  if (typeof cell === 'number') return String(cell);
  return FORMULA_START.test(cell) ? `'${cell}` : cell;
}

/** A header row and data rows as CSV text with CRLF line ends (RFC 4180 section 2). */
export function toCsv(header: readonly string[], rows: readonly (readonly CsvCell[])[]): string {
  return stringify([[...header], ...rows.map((r) => r.map(neutralizeFormula))], {
    record_delimiter: '\r\n',
    quoted_match: /[",\r\n]/,
  });
}
