import 'server-only';
import { and, eq, isNull } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { holds, trailers, yardMoves, yardSpots } from '@/db/schema';
import { refuse, type Refusal } from '@/lib/yard/result';
import { recordAudit } from './audit';

export type MoveResult =
  | {
      ok: true;
      moveId: string;
      unitNumber: string;
      fromLabel: string | null;
      toLabel: string;
      isOutOfService: boolean;
    }
  | Refusal;

/**
 * Moves a trailer of this terminal's yard into a slot or door, inside the caller's transaction.
 * Locks the trailer, the target spot and any occupant; refuses an occupied target naming the
 * occupant. Custody stays with the terminal: a yard move, not a handoff.
 */
export async function moveTrailerInTx(
  tx: Tx,
  {
    terminalId,
    actorId,
    trailerId,
    toSpotId,
    reason,
  }: { terminalId: string; actorId: string; trailerId: string; toSpotId: string; reason: string },
): Promise<MoveResult> {
  const [trailer] = await tx
    .select({
      id: trailers.id,
      unitNumber: trailers.unitNumber,
      status: trailers.status,
      terminalId: trailers.currentTerminalId,
      spotId: trailers.currentSpotId,
    })
    .from(trailers)
    .where(eq(trailers.id, trailerId))
    .for('update');
  if (!trailer || trailer.terminalId !== terminalId || trailer.status !== 'in_yard') {
    return refuse(
      'not_found',
      `${trailer?.unitNumber ?? 'That trailer'} is not in this terminal's yard.`,
      'unit',
    );
  }
  const [target] = await tx
    .select({ id: yardSpots.id, label: yardSpots.label, retiredAt: yardSpots.retiredAt })
    .from(yardSpots)
    .where(and(eq(yardSpots.id, toSpotId), eq(yardSpots.terminalId, terminalId)))
    .for('update');
  if (!target || target.retiredAt) return refuse('not_found', 'No such slot or door in this yard.', 'target');
  if (trailer.spotId === target.id)
    return refuse('invalid', `${trailer.unitNumber} is already in ${target.label}.`, 'target');
  const [occupant] = await tx
    .select({ unitNumber: trailers.unitNumber })
    .from(trailers)
    .where(eq(trailers.currentSpotId, target.id))
    .for('update');
  if (occupant) {
    return refuse(
      'conflict',
      `${target.label} is occupied by ${occupant.unitNumber}. Move ${occupant.unitNumber} out first or choose another spot.`,
      'target',
    );
  }
  const [from] = trailer.spotId
    ? await tx.select({ label: yardSpots.label }).from(yardSpots).where(eq(yardSpots.id, trailer.spotId))
    : [];
  const [move] = await tx
    .insert(yardMoves)
    .values({ trailerId, terminalId, fromSpotId: trailer.spotId, toSpotId: target.id, movedById: actorId })
    .returning({ id: yardMoves.id });
  await tx
    .update(trailers)
    .set({ currentSpotId: target.id, lastSeenAt: new Date() })
    .where(eq(trailers.id, trailerId));
  const oos = await tx
    .select({ id: holds.id })
    .from(holds)
    .where(
      and(eq(holds.trailerId, trailerId), isNull(holds.releasedAt), eq(holds.severity, 'out_of_service')),
    )
    .limit(1);
  await recordAudit(
    {
      actorId,
      action: 'yard.move',
      entityType: 'trailer',
      entityId: trailerId,
      detail: { moveId: move.id, from: from?.label ?? null, to: target.label, reason },
    },
    tx,
  );
  return {
    ok: true,
    moveId: move.id,
    unitNumber: trailer.unitNumber,
    fromLabel: from?.label ?? null,
    toLabel: target.label,
    isOutOfService: oos.length > 0,
  };
}

export async function moveTrailer(input: {
  terminalId: string;
  actorId: string;
  trailerId: string;
  toSpotId: string;
}): Promise<MoveResult> {
  return db.transaction((tx) => moveTrailerInTx(tx, { ...input, reason: 'jockey move' }));
}

/** A live slot or door of this terminal by its label (case-insensitive), or null. */
export async function findSpotByLabel(terminalId: string, label: string) {
  const rows = await db
    .select({ id: yardSpots.id, label: yardSpots.label })
    .from(yardSpots)
    .where(and(eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)));
  const wanted = label.trim().toUpperCase();
  return rows.find((r) => r.label.toUpperCase() === wanted) ?? null;
}
