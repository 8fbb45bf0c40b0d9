import 'server-only';
import { and, asc, eq, isNull } from 'drizzle-orm';
import { db } from '@/db';
import { policies, trailers, walkOutcomes, walkScans, yardSpots, yardTasks, yardWalks } from '@/db/schema';
import { reconcileWalk } from '@/lib/engine';
import { yardPolicyOf } from '@/lib/yard/policy';
import { refuse, type Refusal } from '@/lib/yard/result';
import { tasksForScan } from '@/lib/yard/walk';
import { recordAudit } from './audit';

// Doors belong to no row; the engine wants a row id for every board place.
const DOORS = 'doors';

/**
 * Finishes a walk: reconciles the board (whole terminal, so a trailer found in the wrong row is
 * `wrong_slot`, not `unknown`) against the scans in order, stores one outcome per trailer,
 * the counts as the summary, and yard tasks from the quick checks. A second call is a no-op.
 */
export async function finishWalk(
  walkId: string,
  terminalId: string,
  actorId: string,
): Promise<{ ok: true; summary: Record<string, number> } | Refusal> {
  return db.transaction(async (tx) => {
    const [walk] = await tx
      .select({ status: yardWalks.status, rowIds: yardWalks.rowIds, summary: yardWalks.summary })
      .from(yardWalks)
      .where(and(eq(yardWalks.id, walkId), eq(yardWalks.terminalId, terminalId)))
      .for('update');
    if (!walk) return refuse('not_found', 'No such walk in this yard.');
    if (walk.status === 'finished') return { ok: true as const, summary: walk.summary ?? {} };

    const board = await tx
      .select({ slotId: yardSpots.id, rowId: yardSpots.rowId, expectedTrailerId: trailers.id })
      .from(yardSpots)
      .leftJoin(trailers, and(eq(trailers.currentSpotId, yardSpots.id), eq(trailers.status, 'in_yard')))
      .where(and(eq(yardSpots.terminalId, terminalId), isNull(yardSpots.retiredAt)));
    const scans = await tx
      .select({
        id: walkScans.id,
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

    const result = reconcileWalk({
      board: board.map((b) => ({
        slotId: b.slotId,
        rowId: b.rowId ?? DOORS,
        expectedTrailerId: b.expectedTrailerId,
      })),
      rowIds: walk.rowIds,
      scans: scans.map((s) => ({ slotId: s.spotId!, trailerId: s.trailerId, code: s.code })),
    });
    const outcomes = result.trailers.map((t) => ({
      walkId,
      outcome: t.status,
      spotId: t.foundSlotIds[0] ?? null,
      expectedSpotId: t.expectedSlotId,
      trailerId: t.isKnownTrailer ? t.trailerId : null,
      scannedText: t.isKnownTrailer
        ? (scans.find((s) => s.trailerId === t.trailerId)?.code ?? null)
        : t.trailerId,
    }));
    if (outcomes.length) await tx.insert(walkOutcomes).values(outcomes);
    const summary = {
      ...result.summary.trailers,
      scans: result.summary.scans,
      repeatScans: result.summary.repeatScans,
    };

    const [policy] = await tx
      .select({ data: policies.data })
      .from(policies)
      .where(eq(policies.terminalId, terminalId));
    const yardPolicy = yardPolicyOf(policy?.data);
    const open = await tx
      .select({ trailerId: yardTasks.trailerId, kind: yardTasks.kind })
      .from(yardTasks)
      .where(and(eq(yardTasks.terminalId, terminalId), isNull(yardTasks.clearedAt)));
    const seen = new Set(open.map((o) => `${o.trailerId}:${o.kind}`));
    const tasks = [];
    // the latest scan of each trailer decides (a later look overrides an earlier one)
    const latest = new Map(scans.filter((s) => s.trailerId && s.kind).map((s) => [s.trailerId!, s]));
    for (const s of latest.values()) {
      for (const task of tasksForScan(s, { kind: s.kind!, isLoaded: s.isLoaded! }, yardPolicy)) {
        const key = `${s.trailerId}:${task.kind}`;
        if (seen.has(key)) continue;
        seen.add(key);
        tasks.push({ terminalId, trailerId: s.trailerId!, walkId, kind: task.kind, note: task.note });
      }
    }
    if (tasks.length) await tx.insert(yardTasks).values(tasks);
    await tx
      .update(yardWalks)
      .set({ status: 'finished', finishedAt: new Date(), summary })
      .where(eq(yardWalks.id, walkId));
    await recordAudit(
      {
        actorId,
        action: 'yard.walk_finished',
        entityType: 'yard_walk',
        entityId: walkId,
        detail: { summary, tasks: tasks.length },
      },
      tx,
    );
    return { ok: true as const, summary };
  });
}
