import 'server-only';
import { and, asc, eq, isNull } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { trailers, yardSpots, yardTasks } from '@/db/schema';

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

/** Clears an open task of this terminal; the id, or null when there is no such open task. */
export async function clearOpenTask(
  tx: Tx,
  terminalId: string,
  id: string,
  clearedById: string,
  clearedAt: Date,
): Promise<string | null> {
  const [task] = await tx
    .update(yardTasks)
    .set({ clearedAt, clearedById })
    .where(and(eq(yardTasks.id, id), eq(yardTasks.terminalId, terminalId), isNull(yardTasks.clearedAt)))
    .returning({ id: yardTasks.id });
  return task?.id ?? null;
}
