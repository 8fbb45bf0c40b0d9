import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { db } from '@/db';
import { trailers, walkOutcomes, yardSpots, yardWalks } from '@/db/schema';
import { refuse, type Refusal } from '@/lib/yard/result';
import { recordAudit } from './audit';
import { moveTrailerInTx } from './yard-moves';

const expected = alias(yardSpots, 'expected_spot');

/** The stored reconciliation of a walk of this terminal, with unit numbers and slot labels. */
export async function listWalkOutcomes(walkId: string, terminalId: string) {
  return db
    .select({
      id: walkOutcomes.id,
      outcome: walkOutcomes.outcome,
      resolution: walkOutcomes.resolution,
      scannedText: walkOutcomes.scannedText,
      unitNumber: trailers.unitNumber,
      foundLabel: yardSpots.label,
      expectedLabel: expected.label,
    })
    .from(walkOutcomes)
    .innerJoin(yardWalks, eq(yardWalks.id, walkOutcomes.walkId))
    .leftJoin(trailers, eq(trailers.id, walkOutcomes.trailerId))
    .leftJoin(yardSpots, eq(yardSpots.id, walkOutcomes.spotId))
    .leftJoin(expected, eq(expected.id, walkOutcomes.expectedSpotId))
    .where(and(eq(walkOutcomes.walkId, walkId), eq(yardWalks.terminalId, terminalId)))
    .orderBy(asc(walkOutcomes.outcome), asc(trailers.unitNumber));
}

type Resolution = 'accepted' | 'marked_gone' | 'investigating';

/**
 * What the clerk or jockey does about one outcome. `accepted` (wrong slot only) moves the trailer
 * to where it was seen, as a yard move; `marked_gone` (missing only) sets it gone and frees the
 * slot; `investigating` flags any outcome but a match. Each is written once and audited.
 */
export async function resolveWalkOutcome({
  outcomeId,
  terminalId,
  actorId,
  resolution,
}: {
  outcomeId: string;
  terminalId: string;
  actorId: string;
  resolution: Resolution;
}): Promise<{ ok: true } | Refusal> {
  return db.transaction(async (tx) => {
    const [o] = await tx
      .select({
        id: walkOutcomes.id,
        outcome: walkOutcomes.outcome,
        resolution: walkOutcomes.resolution,
        trailerId: walkOutcomes.trailerId,
        spotId: walkOutcomes.spotId,
        walkId: walkOutcomes.walkId,
      })
      .from(walkOutcomes)
      .innerJoin(yardWalks, eq(yardWalks.id, walkOutcomes.walkId))
      .where(and(eq(walkOutcomes.id, outcomeId), eq(yardWalks.terminalId, terminalId)))
      .for('update', { of: walkOutcomes });
    if (!o) return refuse('not_found', 'No such walk outcome in this yard.');
    if (o.resolution) return refuse('conflict', 'This outcome is already resolved.');
    if (o.outcome === 'matched') return refuse('invalid', 'A matched trailer needs nothing done.');
    if (resolution === 'accepted') {
      if (o.outcome !== 'wrong_slot' || !o.trailerId || !o.spotId)
        return refuse('invalid', 'Only a trailer seen in the wrong slot can be corrected on the board.');
      const moved = await moveTrailerInTx(tx, {
        terminalId,
        actorId,
        trailerId: o.trailerId,
        toSpotId: o.spotId,
        reason: 'walk correction',
      });
      if (!moved.ok) return moved;
    } else if (resolution === 'marked_gone') {
      if (o.outcome !== 'missing' || !o.trailerId)
        return refuse('invalid', 'Only a missing trailer can be marked gone.');
      await tx
        .update(trailers)
        .set({ status: 'gone', currentSpotId: null })
        .where(and(eq(trailers.id, o.trailerId), eq(trailers.currentTerminalId, terminalId)));
    }
    await tx
      .update(walkOutcomes)
      .set({ resolution, resolvedById: actorId, resolvedAt: new Date() })
      .where(eq(walkOutcomes.id, o.id));
    await recordAudit(
      {
        actorId,
        action: `yard.walk_outcome_${resolution}`,
        entityType: 'walk_outcome',
        entityId: o.id,
        detail: { walkId: o.walkId, outcome: o.outcome, trailerId: o.trailerId },
      },
      tx,
    );
    return { ok: true as const };
  });
}
