import { formatTime } from '@/lib/format/time';
import { dwellMinutes, formatDwell } from './board';
import type { BoardTrailer, TableRow } from './types';

export const SORT_KEYS = ['unit', 'slot', 'load', 'reefer', 'fuel', 'holds', 'dwell', 'lastSeen'] as const;
export type SortKey = (typeof SORT_KEYS)[number];
export const SORT_DIRS = ['asc', 'desc'] as const;
export type SortDir = (typeof SORT_DIRS)[number];

/** Table columns in order; the CSV export uses the same headers and cells. */
export const COLUMNS: readonly { key: SortKey | 'gateIn'; header: string }[] = [
  { key: 'unit', header: 'Unit' },
  { key: 'slot', header: 'Slot' },
  { key: 'load', header: 'Loaded/empty' },
  { key: 'reefer', header: 'Reefer' },
  { key: 'fuel', header: 'Fuel' },
  { key: 'holds', header: 'Holds' },
  { key: 'dwell', header: 'Dwell' },
  { key: 'gateIn', header: 'Gate in' },
  { key: 'lastSeen', header: 'Last seen' },
];

const localTime = (at: string | null, timeZone: string, locale: string) =>
  at === null ? '—' : formatTime(at, timeZone, 'dateTime', locale);

/** The words of the table's cells; the CSV export keeps English, the screen passes the reader's. */
export type CellWords = {
  loaded: string;
  empty: string;
  noUnit: string;
  notRead: string;
  off: string;
  on: string;
  onAt: (setpoint: string) => string;
  none: string;
  outOfService: string;
  restricted: string;
  /** the reader's locale for the gate-in and last-seen times */
  locale: string;
};

export const ENGLISH_CELLS: CellWords = {
  loaded: 'Loaded',
  empty: 'Empty',
  noUnit: 'No unit',
  notRead: 'Not read',
  off: 'Off',
  on: 'On',
  onAt: (setpoint) => `On, ${setpoint} °F`,
  none: 'None',
  outOfService: 'Out of service',
  restricted: 'Restricted',
  locale: 'en-US',
};

export function reeferText(t: BoardTrailer, w: CellWords = ENGLISH_CELLS): string {
  if (t.kind !== 'reefer') return w.noUnit;
  if (t.isReeferOn === null) return w.notRead;
  if (!t.isReeferOn) return w.off;
  return t.setpointTenthsF === null ? w.on : w.onAt((t.setpointTenthsF / 10).toFixed(1));
}

export function fuelText(t: BoardTrailer, w: CellWords = ENGLISH_CELLS): string {
  if (t.kind !== 'reefer') return '—';
  return t.fuelEighths === null ? w.notRead : `${t.fuelEighths}/8`;
}

export function holdsText(t: BoardTrailer, w: CellWords = ENGLISH_CELLS): string {
  if (t.holds.length === 0) return w.none;
  return t.holds
    .map((h) => `${h.severity === 'out_of_service' ? w.outOfService : w.restricted}: ${h.reason}`)
    .join('; ');
}

/** The cells of one table row as text, in COLUMNS order. */
export function rowCells(row: TableRow, timeZone: string, now: Date, w: CellWords = ENGLISH_CELLS): string[] {
  const t = row.trailer;
  return [
    t.unitNumber,
    row.spotLabel,
    t.isLoaded ? w.loaded : w.empty,
    reeferText(t, w),
    fuelText(t, w),
    holdsText(t, w),
    formatDwell(dwellMinutes(t.gateInAt, now)),
    localTime(t.gateInAt, timeZone, w.locale),
    localTime(t.lastSeenAt, timeZone, w.locale),
  ];
}

function holdRank(t: BoardTrailer): number {
  if (t.holds.some((h) => h.severity === 'out_of_service')) return 2;
  return t.holds.length ? 1 : 0;
}

function sortValue(row: TableRow, key: SortKey, now: Date): number | string | null {
  const t = row.trailer;
  switch (key) {
    case 'unit':
      return t.unitNumber;
    case 'slot':
      return row.spotOrder;
    case 'load':
      return t.isLoaded ? 1 : 0;
    case 'reefer':
      return t.kind !== 'reefer' || t.isReeferOn === null ? null : t.isReeferOn ? 1 : 0;
    case 'fuel':
      return t.kind === 'reefer' ? t.fuelEighths : null;
    case 'holds':
      return holdRank(t);
    case 'dwell':
      return dwellMinutes(t.gateInAt, now);
    case 'lastSeen':
      return t.lastSeenAt === null ? null : Date.parse(t.lastSeenAt);
  }
}

/** Sorted copy; unknown values (null) always last; ties keep map order. */
export function sortRows(rows: TableRow[], key: SortKey, dir: SortDir, now: Date): TableRow[] {
  const sign = dir === 'asc' ? 1 : -1;
  return rows
    .map((row) => ({ row, v: sortValue(row, key, now) }))
    .sort((a, b) => {
      if (a.v === null || b.v === null) {
        if (a.v === b.v) return a.row.spotOrder - b.row.spotOrder;
        return a.v === null ? 1 : -1;
      }
      const c =
        typeof a.v === 'string'
          ? a.v.localeCompare(b.v as string, 'en', { numeric: true })
          : a.v - (b.v as number);
      return c !== 0 ? sign * c : a.row.spotOrder - b.row.spotOrder;
    })
    .map((x) => x.row);
}
