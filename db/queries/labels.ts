import 'server-only';
import { and, asc, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { carriers, labels, terminals, trailers, yardRows, yardSpots } from '@/db/schema';

/** Writes one new label row. */
export async function insertLabel(trailerId: string, issuedById: string | null, tx: Tx) {
  const [row] = await tx
    .insert(labels)
    .values({ trailerId, issuedById })
    .returning({ id: labels.id, trailerId: labels.trailerId, issuedAt: labels.issuedAt });
  return row;
}

/** Marks every unrevoked label of the trailer revoked; returns their ids. */
export async function revokeOpenLabels(trailerId: string, at: Date, tx: Tx) {
  const rows = await tx
    .update(labels)
    .set({ revokedAt: at })
    .where(and(eq(labels.trailerId, trailerId), isNull(labels.revokedAt)))
    .returning({ id: labels.id });
  return rows.map((r) => r.id);
}

/** Locks the trailers' rows until the transaction ends (in id order, so two callers cannot deadlock); returns the ids found. */
export async function lockTrailers(trailerIds: string[], tx: Tx) {
  const rows = await tx
    .select({ id: trailers.id })
    .from(trailers)
    .where(inArray(trailers.id, trailerIds))
    .orderBy(asc(trailers.id))
    .for('update');
  return rows.map((r) => r.id);
}

/** The trailer's current label: the newest unrevoked one, or null. */
export async function getCurrentLabel(trailerId: string, tx?: Tx) {
  const [row] = await (tx ?? db)
    .select({ id: labels.id, trailerId: labels.trailerId, issuedAt: labels.issuedAt })
    .from(labels)
    .where(and(eq(labels.trailerId, trailerId), isNull(labels.revokedAt)))
    .orderBy(desc(labels.issuedAt), desc(labels.createdAt))
    .limit(1);
  return row ?? null;
}

export async function getLabel(labelId: string) {
  const [row] = await db
    .select({
      id: labels.id,
      trailerId: labels.trailerId,
      issuedAt: labels.issuedAt,
      revokedAt: labels.revokedAt,
    })
    .from(labels)
    .where(eq(labels.id, labelId))
    .limit(1);
  return row ?? null;
}

const sheetColumns = {
  id: trailers.id,
  unitNumber: trailers.unitNumber,
  vin: trailers.vin,
  ownerScac: carriers.scac,
};

/** The trailers a label sheet prints: a selection in unit-number order, or a row's in slot order. */
export async function listSheetTrailers(query: { trailerIds: string[] } | { rowId: string }) {
  const base = db
    .select(sheetColumns)
    .from(trailers)
    .innerJoin(carriers, eq(carriers.id, trailers.ownerCarrierId));
  return 'rowId' in query
    ? base
        .innerJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
        .where(eq(yardSpots.rowId, query.rowId))
        .orderBy(asc(yardSpots.sortOrder))
    : base.where(inArray(trailers.id, query.trailerIds)).orderBy(asc(trailers.unitNumber));
}

/** Yard rows with their terminal and how many trailers stand in each, for choosing a row to print. */
export async function listRowsForLabels() {
  return db
    .select({
      id: yardRows.id,
      name: yardRows.name,
      terminalId: terminals.id,
      terminalName: terminals.name,
      trailerCount: sql<number>`count(${trailers.id})::int`,
    })
    .from(yardRows)
    .innerJoin(terminals, eq(terminals.id, yardRows.terminalId))
    .leftJoin(yardSpots, eq(yardSpots.rowId, yardRows.id))
    .leftJoin(trailers, eq(trailers.currentSpotId, yardSpots.id))
    .groupBy(yardRows.id, terminals.id)
    .orderBy(asc(terminals.name), asc(yardRows.sortOrder));
}

export async function getRowName(rowId: string) {
  const [row] = await db
    .select({ name: yardRows.name, terminalName: terminals.name })
    .from(yardRows)
    .innerJoin(terminals, eq(terminals.id, yardRows.terminalId))
    .where(eq(yardRows.id, rowId));
  return row ?? null;
}
