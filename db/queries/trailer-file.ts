import 'server-only';
import { aliasedTable, and, desc, eq, gte, lt, or, sql, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import {
  carriers,
  cases,
  findings,
  handoffs,
  holds,
  photos,
  terminals,
  trailers,
  users,
  walkScans,
  yardMoves,
  yardSpots,
  yardWalks,
} from '@/db/schema';
import type { FileCursor, FilePage } from '@/lib/desk/trailer-file';

/** Handoffs per page of the trailer file (with everything recorded between them). */
export const FILE_PAGE_SIZE = 50;

export async function getTrailerHeader(id: string) {
  const [row] = await db
    .select({
      id: trailers.id,
      unitNumber: trailers.unitNumber,
      vin: trailers.vin,
      kind: trailers.kind,
      status: trailers.status,
      ownerScac: carriers.scac,
      terminalName: terminals.name,
      timeZone: terminals.timeZone,
      spotLabel: yardSpots.label,
    })
    .from(trailers)
    .innerJoin(carriers, eq(carriers.id, trailers.ownerCarrierId))
    .leftJoin(terminals, eq(terminals.id, trailers.currentTerminalId))
    .leftJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
    .where(eq(trailers.id, id))
    .limit(1);
  return row ?? null;
}

const fromSpots = aliasedTable(yardSpots, 'from_spots');
const people = aliasedTable(users, 'people');

const handoffFields = {
  id: handoffs.id,
  kind: handoffs.kind,
  occurredAt: handoffs.occurredAt,
  driverName: handoffs.driverName,
  carrierScac: carriers.scac,
  level: handoffs.level,
  verificationCode: handoffs.verificationCode,
  correctsHandoffId: handoffs.correctsHandoffId,
  correctionReason: handoffs.correctionReason,
};

/**
 * One page of the trailer file (staff only: the page checks the role), newest first: the `size`
 * handoffs before `before` (keyset on occurred_at, id) and every other record dated between the
 * oldest of them and `before`. The last page reaches back to the first record.
 */
export async function getTrailerFileRows(
  trailerId: string,
  before: FileCursor | null = null,
  size = FILE_PAGE_SIZE,
): Promise<FilePage> {
  const page = await db
    .select(handoffFields)
    .from(handoffs)
    .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
    .where(
      and(
        eq(handoffs.trailerId, trailerId),
        before
          ? sql`(${handoffs.occurredAt}, ${handoffs.id}) < (${before.at.toISOString()}::timestamptz, ${before.id}::uuid)`
          : undefined,
      ),
    )
    .orderBy(desc(handoffs.occurredAt), desc(handoffs.id))
    .limit(size + 1);
  const hs = page.slice(0, size);
  const last = page.length > size ? hs[hs.length - 1] : null;
  const window = { from: last?.occurredAt ?? null, before: before?.at ?? null };
  const within = (column: typeof yardMoves.movedAt | typeof walkScans.scannedAt): SQL | undefined =>
    and(
      window.from ? gte(column, window.from) : undefined,
      window.before ? lt(column, window.before) : undefined,
    );
  // corrections on this page and the records they correct, wherever those are filed
  const correcting = hs.map((h) => h.correctsHandoffId).filter((id): id is string => Boolean(id));
  const related = db
    .select(handoffFields)
    .from(handoffs)
    .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
    .where(
      or(
        and(eq(handoffs.trailerId, trailerId), sql`${handoffs.correctsHandoffId} is not null`),
        correcting.length ? sql`${handoffs.id} = any(${`{${correcting.join(',')}}`}::uuid[])` : undefined,
      ),
    );
  const [rel, moves, walks, fs, hls, cs, ps] = await Promise.all([
    related,
    db
      .select({
        id: yardMoves.id,
        movedAt: yardMoves.movedAt,
        fromSpot: fromSpots.label,
        toSpot: yardSpots.label,
        jockeyName: people.name,
      })
      .from(yardMoves)
      .innerJoin(yardSpots, eq(yardSpots.id, yardMoves.toSpotId))
      .leftJoin(fromSpots, eq(fromSpots.id, yardMoves.fromSpotId))
      .leftJoin(people, eq(people.id, yardMoves.movedById))
      .where(and(eq(yardMoves.trailerId, trailerId), within(yardMoves.movedAt))),
    db
      .select({
        id: walkScans.id,
        scannedAt: walkScans.scannedAt,
        spot: yardSpots.label,
        jockeyName: people.name,
      })
      .from(walkScans)
      .innerJoin(yardWalks, eq(yardWalks.id, walkScans.walkId))
      .leftJoin(yardSpots, eq(yardSpots.id, walkScans.spotId))
      .leftJoin(people, eq(people.id, yardWalks.startedById))
      .where(and(eq(walkScans.trailerId, trailerId), within(walkScans.scannedAt))),
    // findings and photos are dated by the handoff they belong to (their own rows are written at submit)
    db
      .select({
        id: findings.id,
        // one primary-key lookup per row, never a join over every handoff
        createdAt:
          sql<Date>`coalesce((select ${handoffs.occurredAt} from ${handoffs} where ${handoffs.id} = ${findings.handoffId}), ${findings.createdAt})`.mapWith(
            findings.createdAt,
          ),
        itemKey: findings.itemKey,
        kind: findings.kind,
        condition: findings.condition,
        reason: findings.reason,
        reasonCode: findings.reasonCode,
        reasonParams: findings.reasonParams,
      })
      .from(findings)
      .where(eq(findings.trailerId, trailerId)),
    db
      .select({
        id: holds.id,
        placedAt: holds.placedAt,
        severity: holds.severity,
        reason: holds.reason,
        reasonCode: holds.reasonCode,
        reasonParams: holds.reasonParams,
        releasedAt: holds.releasedAt,
        repairedBy: holds.repairedBy,
        repairNote: holds.repairNote,
        releasedByName: people.name,
      })
      .from(holds)
      .leftJoin(people, eq(people.id, holds.releasedById))
      .where(eq(holds.trailerId, trailerId)),
    db
      .select({
        id: cases.id,
        openedAt: cases.openedAt,
        state: cases.state,
        amountCents: sql<number>`coalesce(${cases.overrideCents}, ${cases.estimateCents})`,
        carrierScac: carriers.scac,
      })
      .from(cases)
      .leftJoin(carriers, eq(carriers.id, cases.proposedCarrierId))
      .where(eq(cases.trailerId, trailerId)),
    db
      .select({
        id: photos.id,
        createdAt:
          sql<Date>`coalesce((select ${handoffs.occurredAt} from ${handoffs} where ${handoffs.id} = ${photos.handoffId}), ${photos.createdAt})`.mapWith(
            photos.createdAt,
          ),
        itemKey: photos.itemKey,
        handoffId: photos.handoffId,
        capturedAt: photos.capturedAt,
        uploadedAt: photos.createdAt,
      })
      .from(photos)
      .where(eq(photos.trailerId, trailerId))
      .orderBy(desc(photos.createdAt)),
  ]);
  return {
    rows: { handoffs: hs, related: rel, moves, walks, findings: fs, holds: hls, cases: cs, photos: ps },
    window,
    next: last ? { at: last.occurredAt, id: last.id } : null,
  };
}
