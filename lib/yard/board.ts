import { differenceInMinutes } from 'date-fns';
import type { Board, BoardTrailer, TableRow, YardPolicy } from './types';

export const BOARD_FILTERS = ['held', 'low_fuel', 'reefer_off', 'over_free_time'] as const;
export type BoardFilter = (typeof BOARD_FILTERS)[number];
export const FILTER_LABELS: Record<BoardFilter, string> = {
  held: 'On hold',
  low_fuel: 'Low fuel',
  reefer_off: 'Reefer off',
  over_free_time: 'Over free time',
};

/**
 * Minutes since gate in: an elapsed duration between two instants, so a daylight-saving change
 * in the terminal's zone never adds or removes an hour. Null when the gate-in time is unknown.
 */
export function dwellMinutes(gateInAt: string | Date | null, now: Date): number | null {
  if (gateInAt === null) return null;
  return Math.max(0, differenceInMinutes(now, new Date(gateInAt)));
}

/** "2 d 5 h", "5 h 07 min", "12 min". */
export function formatDwell(minutes: number | null): string {
  if (minutes === null) return '—';
  const days = Math.floor(minutes / 1440);
  const hours = Math.floor((minutes % 1440) / 60);
  const mins = minutes % 60;
  if (days > 0) return `${days} d ${hours} h`;
  if (hours > 0) return `${hours} h ${String(mins).padStart(2, '0')} min`;
  return `${mins} min`;
}

/** Low fuel: a reefer whose gauge reads at or below the policy's eighths. A dry van has no reefer tank. */
export function isLowFuel(t: BoardTrailer, policy: YardPolicy): boolean {
  return t.kind === 'reefer' && t.fuelEighths !== null && t.fuelEighths <= policy.lowFuelEighths;
}

export function isReeferOff(t: BoardTrailer): boolean {
  return t.kind === 'reefer' && t.isReeferOn === false;
}

export function isOverFreeTime(t: BoardTrailer, policy: YardPolicy, now: Date): boolean {
  const m = dwellMinutes(t.gateInAt, now);
  return m !== null && m > policy.freeTimeHours * 60;
}

export function matchesFilter(t: BoardTrailer, filter: BoardFilter, policy: YardPolicy, now: Date): boolean {
  switch (filter) {
    case 'held':
      return t.holds.length > 0;
    case 'low_fuel':
      return isLowFuel(t, policy);
    case 'reefer_off':
      return isReeferOff(t);
    case 'over_free_time':
      return isOverFreeTime(t, policy, now);
  }
}

/** Occupied spots as table rows, in map order. */
export function tableRows(board: Board): TableRow[] {
  return board.spots
    .filter((s) => s.trailer !== null)
    .sort((a, b) => a.order - b.order)
    .map((s) => ({ trailer: s.trailer!, spotLabel: s.label, spotOrder: s.order }));
}

/** Rows passing every chosen filter (no filter: all rows). */
export function filterRows(
  rows: TableRow[],
  filters: readonly BoardFilter[],
  policy: YardPolicy,
  now: Date,
): TableRow[] {
  if (filters.length === 0) return rows;
  return rows.filter((r) => filters.every((f) => matchesFilter(r.trailer, f, policy, now)));
}
