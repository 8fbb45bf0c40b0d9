import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import {
  boardPlaces,
  insertWalkOutcomes,
  insertYardTasks,
  markWalkFinished,
  openTasksOf,
  policyDataOf,
  scansOfWalk,
} from '@/db/queries/yard-walk-finish';
import { lockWalk } from '@/db/queries/yard-walks';
import { reconcileWalk } from '@/lib/engine';
import { done, refuse, type Result } from '@/lib/result';
import { terminalPolicyOf } from '@/lib/terminal/policy';
import { tasksForWalk } from '@/lib/yard/walk';
import { NO_TERMINAL, type YardActor } from './actor';

// Doors belong to no row; the engine wants a row id for every board place.
const DOORS = 'doors';

export type WalkSummary = Record<string, number>;

/**
 * Finishes a walk: reconciles the board (whole terminal, so a trailer found in the wrong row is
 * `wrong_slot`, not `unknown`) against the scans in order, stores one outcome per trailer, the
 * counts as the summary, and yard tasks from the quick checks. A second call changes nothing and
 * answers the stored summary.
 */
export async function finishWalk(
  actor: YardActor,
  input: { walkId: string },
): Promise<Result<{ summary: WalkSummary }>> {
  const terminalId = actor.terminalId;
  if (!terminalId) return NO_TERMINAL;
  const { walkId } = input;
  return db.transaction(async (tx) => {
    const walk = await lockWalk(tx, walkId, terminalId);
    if (!walk) return refuse('not_found', 'No such walk in this yard.');
    if (walk.status === 'finished') return done({ summary: walk.summary ?? {} });

    const board = await boardPlaces(tx, terminalId);
    const scans = await scansOfWalk(tx, walkId);
    const result = reconcileWalk({
      board: board.map((b) => ({ ...b, rowId: b.rowId ?? DOORS })),
      rowIds: walk.rowIds,
      scans: scans.map((s) => ({ slotId: s.spotId!, trailerId: s.trailerId, code: s.code })),
    });
    await insertWalkOutcomes(
      tx,
      result.trailers.map((t) => ({
        walkId,
        outcome: t.status,
        spotId: t.foundSlotIds[0] ?? null,
        expectedSpotId: t.expectedSlotId,
        trailerId: t.isKnownTrailer ? t.trailerId : null,
        // an unknown text is its own key in the engine's answer
        scannedText: t.isKnownTrailer
          ? (scans.find((s) => s.trailerId === t.trailerId)?.code ?? null)
          : t.trailerId,
      })),
    );
    const summary: WalkSummary = {
      ...result.summary.trailers,
      scans: result.summary.scans,
      repeatScans: result.summary.repeatScans,
    };

    const policy = terminalPolicyOf(await policyDataOf(tx, terminalId)).yard;
    const tasks = tasksForWalk(scans, await openTasksOf(tx, terminalId), policy);
    await insertYardTasks(
      tx,
      tasks.map((t) => ({ ...t, terminalId, walkId })),
    );
    await markWalkFinished(tx, walkId, summary, new Date());
    await recordAudit(
      {
        actorId: actor.id,
        action: 'yard.walk_finished',
        entityType: 'yard_walk',
        entityId: walkId,
        detail: { summary, tasks: tasks.length },
      },
      tx,
    );
    return done({ summary });
  });
}
