import 'server-only';
import { and, asc, eq, isNull } from 'drizzle-orm';
import { db } from '@/db';
import { trailers, yardSpots, yardTasks } from '@/db/schema';
import { refuse, type Refusal } from '@/lib/yard/result';
import { recordAudit } from './audit';

/** Open yard tasks of one terminal, oldest first, with the trailer and where it stands. */
export async function listOpenTasks(terminalId: string) {
  return db
    .select({
      id: yardTasks.id,
      kind: yardTasks.kind,
      note: yardTasks.note,
      createdAt: yardTasks.createdAt,
      unitNumber: trailers.unitNumber,
      spotLabel: yardSpots.label,
    })
    .from(yardTasks)
    .innerJoin(trailers, eq(trailers.id, yardTasks.trailerId))
    .leftJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
    .where(and(eq(yardTasks.terminalId, terminalId), isNull(yardTasks.clearedAt)))
    .orderBy(asc(yardTasks.createdAt), asc(trailers.unitNumber));
}

export async function clearTask(
  terminalId: string,
  actorId: string,
  id: string,
): Promise<{ ok: true } | Refusal> {
  const [task] = await db
    .update(yardTasks)
    .set({ clearedAt: new Date(), clearedById: actorId })
    .where(and(eq(yardTasks.id, id), eq(yardTasks.terminalId, terminalId), isNull(yardTasks.clearedAt)))
    .returning({ id: yardTasks.id });
  if (!task) return refuse('not_found', 'No open task with that id in this yard.');
  await recordAudit({ actorId, action: 'yard.task_cleared', entityType: 'yard_task', entityId: id });
  return { ok: true };
}
