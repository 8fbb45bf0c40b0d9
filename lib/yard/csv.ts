import { toCsv } from '@/lib/format/csv';
import { COLUMNS, rowCells } from './table';
import type { TableRow } from './types';

/** The board table as CSV: the table's headers and cells, row for row. */
export function boardCsv(rows: TableRow[], timeZone: string, now: Date): string {
  return toCsv(
    COLUMNS.map((c) => c.header),
    rows.map((r) => rowCells(r, timeZone, now)),
  );
}
