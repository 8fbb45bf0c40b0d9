import { COLUMNS, rowCells } from './table';
import type { TableRow } from './types';

/** RFC 4180 field: quoted when it holds a comma, quote, CR or LF; quotes doubled. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replace(/"/g, '""')}"` : value;
}

/** Header plus one line per table row, CRLF line ends (RFC 4180 section 2). */
export function boardCsv(rows: TableRow[], timeZone: string, now: Date): string {
  const lines = [COLUMNS.map((c) => c.header), ...rows.map((r) => rowCells(r, timeZone, now))];
  return lines.map((cells) => cells.map(csvField).join(',')).join('\r\n') + '\r\n';
}
