import 'server-only';
import { and, asc, desc, eq, inArray, isNull, or, lte, sql } from 'drizzle-orm';
import { db } from '@/db';
import { trailers, users, walkScans, yardRows, yardSpots, yardWalks } from '@/db/schema';
import type { WalkScanInput } from '@/lib/validation/yard';
import { refuse, type Refusal } from '@/lib/yard/result';
import { recordAudit } from './audit';
import { findTrailerIdByScan } from './yard-identify';

export async function startWalk(
  terminalId: string,
  actorId: string,
  rowIds: string[],
): Promise<{ ok: true; id: string } | Refusal> {
  const rows = await db
    .select({ id: yardRows.id })
    .from(yardRows)
    .where(and(eq(yardRows.terminalId, terminalId), inArray(yardRows.id, rowIds)));
  if (rows.length !== new Set(rowIds).size) return refuse('invalid', 'Choose rows of this yard.', 'rowIds');
  const [walk] = await db
    .insert(yardWalks)
    .values({ terminalId, startedById: actorId, rowIds: [...new Set(rowIds)] })
    .returning({ id: yardWalks.id });
  await recordAudit({
    actorId,
    action: 'yard.walk_started',
    entityType: 'yard_walk',
    entityId: walk.id,
    detail: { rowIds },
  });
  return { ok: true, id: walk.id };
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

export type AddScanResult = { ok: true; seq: number; isRepeat: boolean; unitNumber: string | null } | Refusal;

/**
 * Stores one walk scan, idempotent by `clientKey`: a re-send of a stored scan returns it again.
 * Known trailers take the scan's readings and last-seen time unless a later sighting is stored.
 */
export async function addWalkScan(
  walkId: string,
  terminalId: string,
  input: WalkScanInput,
): Promise<AddScanResult> {
  return db.transaction(async (tx) => {
    const [walk] = await tx
      .select({ status: yardWalks.status })
      .from(yardWalks)
      .where(and(eq(yardWalks.id, walkId), eq(yardWalks.terminalId, terminalId)))
      .for('update');
    if (!walk) return refuse('not_found', 'No such walk in this yard.');
    const [existing] = await tx
      .select({ walkId: walkScans.walkId, seq: walkScans.seq, trailerId: walkScans.trailerId })
      .from(walkScans)
      .where(eq(walkScans.clientKey, input.clientKey));
    if (existing) {
      if (existing.walkId !== walkId)
        return refuse('conflict', 'This scan key belongs to another walk.', 'clientKey');
      const [t] = existing.trailerId
        ? await tx
            .select({ unitNumber: trailers.unitNumber })
            .from(trailers)
            .where(eq(trailers.id, existing.trailerId))
        : [];
      return { ok: true, seq: existing.seq, isRepeat: true, unitNumber: t?.unitNumber ?? null };
    }
    if (walk.status !== 'in_progress')
      return refuse('conflict', 'This walk is finished; the scan was not added.');
    const [spot] = await tx
      .select({ id: yardSpots.id })
      .from(yardSpots)
      .where(
        and(
          eq(yardSpots.id, input.spotId),
          eq(yardSpots.terminalId, terminalId),
          isNull(yardSpots.retiredAt),
        ),
      );
    if (!spot) return refuse('invalid', 'That slot is not in this yard.', 'spotId');
    const trailerId = await findTrailerIdByScan(input.scannedText, tx);
    const [max] = await tx
      .select({ n: sql<number>`coalesce(max(${walkScans.seq}), 0)::int` })
      .from(walkScans)
      .where(eq(walkScans.walkId, walkId));
    const scannedAt = new Date(input.scannedAt);
    await tx.insert(walkScans).values({ ...input, walkId, seq: max.n + 1, trailerId, scannedAt });
    let unitNumber: string | null = null;
    if (trailerId) {
      const [t] = await tx
        .select({ unitNumber: trailers.unitNumber, kind: trailers.kind })
        .from(trailers)
        .where(eq(trailers.id, trailerId));
      unitNumber = t.unitNumber;
      const reefer =
        t.kind === 'reefer'
          ? {
              ...(input.fuelEighths !== null ? { fuelEighths: input.fuelEighths } : {}),
              ...(input.isUnitRunning !== null ? { isReeferOn: input.isUnitRunning } : {}),
              ...(input.setpointTenthsF !== null ? { setpointTenthsF: input.setpointTenthsF } : {}),
            }
          : {};
      await tx
        .update(trailers)
        .set({ lastSeenAt: scannedAt, ...reefer })
        .where(
          and(
            eq(trailers.id, trailerId),
            or(isNull(trailers.lastSeenAt), lte(trailers.lastSeenAt, scannedAt)),
          ),
        );
    }
    return { ok: true, seq: max.n + 1, isRepeat: false, unitNumber };
  });
}
