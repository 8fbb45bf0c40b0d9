import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { insertLabel, lockTrailers, revokeOpenLabels } from '@/db/queries/labels';
import { done, refuse, type Result } from '@/lib/result';
import type { SessionUser } from '../auth';

type Reissued = { label: { id: string; trailerId: string; issuedAt: Date }; revokedLabelIds: string[] };

/**
 * Re-issues a trailer's label: revokes every unrevoked label of the trailer and issues a new one,
 * in one transaction under a row lock on the trailer (two re-issues cannot interleave), audit-logged.
 * The old label stops working at once.
 */
export async function reissueLabel(
  actor: Pick<SessionUser, 'id'>,
  input: { trailerId: string },
): Promise<Result<Reissued>> {
  return db.transaction(async (tx) => {
    const [found] = await lockTrailers([input.trailerId], tx);
    if (!found) return refuse('not_found', 'That trailer is not known to Hitchmark. Reload the page.');
    const revokedLabelIds = await revokeOpenLabels(input.trailerId, new Date(), tx);
    const label = await insertLabel(input.trailerId, actor.id, tx);
    await recordAudit(
      {
        actorId: actor.id,
        action: 'label.reissue',
        entityType: 'trailer',
        entityId: input.trailerId,
        detail: { labelId: label.id, revokedLabelIds },
      },
      tx,
    );
    return done({ label, revokedLabelIds });
  });
}
