import 'server-only';
import { and, asc, eq, isNull } from 'drizzle-orm';
import type { Tx } from '@/db';
import { policies, trailers, walkOutcomes, walkScans, yardSpots, yardTasks, yardWalks } from '@/db/schema';

/** Every live slot and door of the terminal with the trailer the board puts there. */
export async function boardPlaces(tx: Tx, terminalId: string) {
  return tx
    .select({ slotId: yardSpots.id, rowId: yardSpots.rowId, expectedTrailerId: trailers.id })
    .from(yardSpots)
    .leftJoin(trailers, and(eq(trailers.currentSpotId, yardSpots.id), eq(trailers.status, 'in_yard')))
    .where(and(eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)));
}

/** The scans of a walk in walking order, with the kind and load of the trailer each one named. */
export async function scansOfWalk(tx: Tx, walkId: string) {
  return tx
    .select({
      spotId: walkScans.spotId,
      trailerId: walkScans.trailerId,
      code: walkScans.scannedText,
      fuelEighths: walkScans.fuelEighths,
      isUnitRunning: walkScans.isUnitRunning,
      setpointTenthsF: walkScans.setpointTenthsF,
      areDoorsClosed: walkScans.areDoorsClosed,
      isSealPresent: walkScans.isSealPresent,
      kind: trailers.kind,
      isLoaded: trailers.isLoaded,
    })
    .from(walkScans)
    .leftJoin(trailers, eq(trailers.id, walkScans.trailerId))
    .where(eq(walkScans.walkId, walkId))
    .orderBy(asc(walkScans.seq));
}

/** The terminal's stored policy document, or null when it has none. */
export async function policyDataOf(tx: Tx, terminalId: string): Promise<unknown> {
  const [policy] = await tx
    .select({ data: policies.data })
    .from(policies)
    .where(eq(policies.terminalId, terminalId));
  return policy?.data ?? null;
}

export async function openTasksOf(tx: Tx, terminalId: string) {
  return tx
    .select({ trailerId: yardTasks.trailerId, kind: yardTasks.kind })
    .from(yardTasks)
    .where(and(eq(yardTasks.terminalId, terminalId), isNull(yardTasks.clearedAt)));
}

export async function insertWalkOutcomes(tx: Tx, rows: (typeof walkOutcomes.$inferInsert)[]) {
  if (rows.length) await tx.insert(walkOutcomes).values(rows);
}

export async function insertYardTasks(tx: Tx, rows: (typeof yardTasks.$inferInsert)[]) {
  if (rows.length) await tx.insert(yardTasks).values(rows);
}

export async function markWalkFinished(tx: Tx, walkId: string, summary: Record<string, number>, at: Date) {
  await tx
    .update(yardWalks)
    .set({ status: 'finished', finishedAt: at, summary })
    .where(eq(yardWalks.id, walkId));
}
