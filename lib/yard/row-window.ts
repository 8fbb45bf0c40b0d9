// Which rows of a big yard are drawn on first load. A 2,000-slot yard drawn whole is about a
// megabyte of HTML; the map draws rows in order until about `maxSpots` slots and lists the rest
// as rows to open. The dock doors are always drawn. Pure: the page (server) and the map share it.
import type { Board, BoardSpot } from './types';

export const FIRST_LOAD_SPOTS = 300;

/** The ids of the rows drawn at first, in board order, up to about `maxSpots` slots (at least one row). */
export function firstRows(board: Pick<Board, 'rows' | 'spots'>, maxSpots = FIRST_LOAD_SPOTS): Set<string> {
  const perRow = new Map<string, number>();
  for (const s of board.spots)
    if (s.kind !== 'door' && s.rowId) perRow.set(s.rowId, (perRow.get(s.rowId) ?? 0) + 1);
  const open = new Set<string>();
  let drawn = 0;
  for (const r of board.rows) {
    const n = perRow.get(r.id) ?? 0;
    if (open.size && drawn + n > maxSpots) break;
    open.add(r.id);
    drawn += n;
  }
  return open;
}

/** Whether a spot belongs to the rows drawn at first (doors always do). */
export function isInRows(spot: BoardSpot, rows: Set<string>): boolean {
  return spot.kind === 'door' || !spot.rowId || rows.has(spot.rowId);
}

/**
 * The board the page hands to the browser on first load: the spots of the first rows only (the
 * rest arrives with the first refresh of the board JSON). `isPartial` tells the screen so.
 */
export function firstLoadBoard(board: Board, maxSpots = FIRST_LOAD_SPOTS): Board & { isPartial: boolean } {
  const rows = firstRows(board, maxSpots);
  const spots = board.spots.filter((s) => isInRows(s, rows));
  return { ...board, spots, isPartial: spots.length < board.spots.length };
}
