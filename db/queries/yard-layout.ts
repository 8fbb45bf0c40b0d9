import 'server-only';
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { trailers, yardRows, yardSpots } from '@/db/schema';

/** A terminal's yard rows in layout order (the board and the layout editor both start from them). */
export function listRows(terminalId: string) {
  return db
    .select({ id: yardRows.id, name: yardRows.name })
    .from(yardRows)
    .where(eq(yardRows.terminalId, terminalId))
    .orderBy(asc(yardRows.sortOrder), asc(yardRows.name));
}

/** Rows and live or retired spots of one terminal, in layout order, with each spot's occupant. */
export async function listLayout(terminalId: string) {
  const [rows, spots] = await Promise.all([
    listRows(terminalId),
    db
      .select({
        id: yardSpots.id,
        label: yardSpots.label,
        kind: yardSpots.kind,
        rowId: yardSpots.rowId,
        retiredAt: yardSpots.retiredAt,
        occupant: trailers.unitNumber,
      })
      .from(yardSpots)
      .leftJoin(trailers, eq(trailers.currentSpotId, yardSpots.id))
      .where(eq(yardSpots.terminalId, terminalId))
      .orderBy(asc(yardSpots.sortOrder), asc(yardSpots.label)),
  ]);
  return { rows, spots };
}

/** Adds a row after the terminal's last one. */
export async function insertRow(tx: Tx, terminalId: string, name: string): Promise<string> {
  const [max] = await tx
    .select({ n: sql<number>`coalesce(max(${yardRows.sortOrder}), -1)::int` })
    .from(yardRows)
    .where(eq(yardRows.terminalId, terminalId));
  const [row] = await tx
    .insert(yardRows)
    .values({ terminalId, name, sortOrder: max.n + 1 })
    .returning({ id: yardRows.id });
  return row.id;
}

/** Renames a row of this terminal; false when there is no such row. */
export async function updateRowName(tx: Tx, terminalId: string, id: string, name: string): Promise<boolean> {
  const rows = await tx
    .update(yardRows)
    .set({ name })
    .where(and(eq(yardRows.id, id), eq(yardRows.terminalId, terminalId)))
    .returning({ id: yardRows.id });
  return rows.length > 0;
}

export async function isRowOf(tx: Tx, terminalId: string, rowId: string): Promise<boolean> {
  const [row] = await tx
    .select({ id: yardRows.id })
    .from(yardRows)
    .where(and(eq(yardRows.id, rowId), eq(yardRows.terminalId, terminalId)));
  return row !== undefined;
}

/** Adds a slot after the last of its row, or a door (no row) after the terminal's last door. */
export async function insertSpot(
  tx: Tx,
  spot: { terminalId: string; rowId: string | null; kind: 'slot' | 'door'; label: string },
): Promise<string> {
  const scope = spot.rowId
    ? eq(yardSpots.rowId, spot.rowId)
    : and(eq(yardSpots.terminalId, spot.terminalId), isNull(yardSpots.rowId));
  const [max] = await tx
    .select({ n: sql<number>`coalesce(max(${yardSpots.sortOrder}), -1)::int` })
    .from(yardSpots)
    .where(scope);
  const [row] = await tx
    .insert(yardSpots)
    .values({ ...spot, sortOrder: max.n + 1 })
    .returning({ id: yardSpots.id });
  return row.id;
}

/** Relabels a slot or door of this terminal; false when there is no such spot. */
export async function updateSpotLabel(
  tx: Tx,
  terminalId: string,
  id: string,
  label: string,
): Promise<boolean> {
  const rows = await tx
    .update(yardSpots)
    .set({ label })
    .where(and(eq(yardSpots.id, id), eq(yardSpots.terminalId, terminalId)))
    .returning({ id: yardSpots.id });
  return rows.length > 0;
}

export async function setSpotRetired(tx: Tx, id: string, at: Date) {
  await tx.update(yardSpots).set({ retiredAt: at }).where(eq(yardSpots.id, id));
}
