import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { clearOpenTask } from '@/db/queries/yard-tasks';
import { done, refuse, type Result } from '@/lib/result';
import { NO_TERMINAL, type YardActor } from './actor';

/** Clears an open task of the actor's yard, audited. */
export async function clearTask(actor: YardActor, input: { id: string }): Promise<Result> {
  const terminalId = actor.terminalId;
  if (!terminalId) return NO_TERMINAL;
  return db.transaction(async (tx) => {
    const id = await clearOpenTask(tx, terminalId, input.id, actor.id, new Date());
    if (!id) return refuse('not_found', 'No open task with that id in this yard.');
    await recordAudit(
      { actorId: actor.id, action: 'yard.task_cleared', entityType: 'yard_task', entityId: id },
      tx,
    );
    return done(undefined);
  });
}
