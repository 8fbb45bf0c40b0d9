import 'server-only';
import { and, asc, desc, eq, inArray, isNull } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { trailers, users, walkScans, yardRows, yardSpots, yardWalks } from '@/db/schema';

/** Which of these rows belong to the terminal. */
export async function rowIdsOfTerminal(terminalId: string, rowIds: string[]): Promise<string[]> {
  const rows = await db
    .select({ id: yardRows.id })
    .from(yardRows)
    .where(and(eq(yardRows.terminalId, terminalId), inArray(yardRows.id, rowIds)));
  return rows.map((r) => r.id);
}

export async function insertWalk(tx: Tx, walk: typeof yardWalks.$inferInsert): Promise<string> {
  const [row] = await tx.insert(yardWalks).values(walk).returning({ id: yardWalks.id });
  return row.id;
}

/** A walk of this terminal, row-locked for the caller's transaction; null when not found here. */
export async function lockWalk(tx: Tx, walkId: string, terminalId: string) {
  const [walk] = await tx
    .select({ status: yardWalks.status, rowIds: yardWalks.rowIds, summary: yardWalks.summary })
    .from(yardWalks)
    .where(and(eq(yardWalks.id, walkId), eq(yardWalks.terminalId, terminalId)))
    .for('update');
  return walk ?? null;
}

export async function listRecentWalks(terminalId: string, limit = 10) {
  return db
    .select({
      id: yardWalks.id,
      status: yardWalks.status,
      startedAt: yardWalks.startedAt,
      finishedAt: yardWalks.finishedAt,
      summary: yardWalks.summary,
      startedBy: users.name,
    })
    .from(yardWalks)
    .innerJoin(users, eq(users.id, yardWalks.startedById))
    .where(eq(yardWalks.terminalId, terminalId))
    .orderBy(desc(yardWalks.startedAt))
    .limit(limit);
}

/** One walk of this terminal with the slots of its rows in walking order; null when not found here. */
export async function getWalk(walkId: string, terminalId: string) {
  const [walk] = await db
    .select({
      id: yardWalks.id,
      status: yardWalks.status,
      rowIds: yardWalks.rowIds,
      startedAt: yardWalks.startedAt,
      finishedAt: yardWalks.finishedAt,
      summary: yardWalks.summary,
    })
    .from(yardWalks)
    .where(and(eq(yardWalks.id, walkId), eq(yardWalks.terminalId, terminalId)));
  if (!walk) return null;
  const [rows, spots, scans] = await Promise.all([
    db
      .select({ id: yardRows.id, name: yardRows.name })
      .from(yardRows)
      .where(inArray(yardRows.id, walk.rowIds))
      .orderBy(asc(yardRows.sortOrder)),
    db
      .select({ id: yardSpots.id, label: yardSpots.label, rowId: yardSpots.rowId })
      .from(yardSpots)
      .innerJoin(yardRows, eq(yardRows.id, yardSpots.rowId))
      .where(and(inArray(yardSpots.rowId, walk.rowIds), isNull(yardSpots.retiredAt)))
      .orderBy(asc(yardRows.sortOrder), asc(yardSpots.sortOrder), asc(yardSpots.label)),
    db
      .select({
        seq: walkScans.seq,
        clientKey: walkScans.clientKey,
        scannedText: walkScans.scannedText,
        unitNumber: trailers.unitNumber,
        spotLabel: yardSpots.label,
      })
      .from(walkScans)
      .leftJoin(trailers, eq(trailers.id, walkScans.trailerId))
      .leftJoin(yardSpots, eq(yardSpots.id, walkScans.spotId))
      .where(eq(walkScans.walkId, walkId))
      .orderBy(asc(walkScans.seq)),
  ]);
  return { ...walk, rows, spots: spots.map((s) => ({ id: s.id, label: s.label, rowId: s.rowId! })), scans };
}
