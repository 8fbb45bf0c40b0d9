import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { lockHold, markHoldReleased } from '@/db/queries/holds';
import { REPAIR_TIME_WORDS, repairTimeProblem } from '@/lib/desk/hold-release';
import { abort, done, refuse, refuseField, settle, type Result } from '@/lib/result';

export type HoldRelease = {
  holdId: string;
  trailerId: string;
  repairedBy: string;
  repairNote: string;
  repairedAt: Date;
};

/**
 * Releases an open hold by recording the repair, in one transaction with its audit entry. The
 * hold's releasedAt is the repair time the clerk entered; the audit log keeps when the release was
 * recorded and by whom.
 */
export async function releaseHold(
  actor: { id: string },
  r: HoldRelease,
  now = new Date(),
): Promise<Result<{ holdId: string }>> {
  return settle(() =>
    db.transaction(async (tx) => {
      const hold = await lockHold(tx, r.holdId, r.trailerId);
      if (!hold) return abort(refuse('not_found', 'This hold does not exist on this trailer.'));
      if (hold.releasedAt) return abort(refuse('conflict', 'This hold was already released.'));
      const problem = repairTimeProblem(r.repairedAt, hold.placedAt, now);
      if (problem) return abort(refuseField('invalid', 'repairedAt', REPAIR_TIME_WORDS[problem]));
      await markHoldReleased(tx, { ...r, releasedById: actor.id });
      await recordAudit(
        {
          actorId: actor.id,
          action: 'hold_released',
          entityType: 'hold',
          entityId: r.holdId,
          detail: {
            repairedBy: r.repairedBy,
            repairedAt: r.repairedAt.toISOString(),
            recordedAt: now.toISOString(),
          },
        },
        tx,
      );
      return done({ holdId: r.holdId });
    }),
  );
}
