import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { db, type Tx } from '@/db';
import { trailers, walkOutcomes, yardSpots, yardWalks } from '@/db/schema';
import type { WalkResolution } from '@/lib/yard/walk';

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

/** One walk outcome of this terminal, row-locked for the caller's transaction; null when not found here. */
export async function lockOutcome(tx: Tx, outcomeId: string, terminalId: string) {
  const [outcome] = await tx
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
  return outcome ?? null;
}

/** The trailer has left this terminal without a gate record: gone, and its slot freed. */
export async function markTrailerGone(tx: Tx, trailerId: string, terminalId: string) {
  await tx
    .update(trailers)
    .set({ status: 'gone', currentSpotId: null })
    .where(and(eq(trailers.id, trailerId), eq(trailers.currentTerminalId, terminalId)));
}

export async function setOutcomeResolution(
  tx: Tx,
  outcomeId: string,
  resolution: WalkResolution,
  resolvedById: string,
  resolvedAt: Date,
) {
  await tx
    .update(walkOutcomes)
    .set({ resolution, resolvedById, resolvedAt })
    .where(eq(walkOutcomes.id, outcomeId));
}
