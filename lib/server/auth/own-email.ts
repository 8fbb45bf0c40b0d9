import 'server-only';
import { db } from '@/db';
import { isUniqueViolation } from '@/db/errors';
import { recordAudit } from '@/db/queries/audit';
import { setUserEmail } from '@/db/queries/users';
import { done, refuse, refuseField, type Result } from '@/lib/result';
import type { OwnEmailInput } from '@/lib/validation/account';
import type { SessionUser } from '../auth';

/**
 * A driver keeps (or removes) the address their receipts go to, with the carrier's contact in
 * copy (lib/handoffs/receipt.ts). An address another account keeps is refused under the field.
 */
export async function setOwnEmail(user: SessionUser, input: OwnEmailInput): Promise<Result<string | null>> {
  if (user.role !== 'driver') return refuse('forbidden', 'Staff e-mail addresses are set by an admin.');
  try {
    await db.transaction(async (tx) => {
      await setUserEmail(tx, user.id, input.email);
      await recordAudit(
        {
          actorId: user.id,
          action: 'email_changed',
          entityType: 'user',
          entityId: user.id,
          detail: { kept: input.email !== null },
        },
        tx,
      );
    });
  } catch (e) {
    if (isUniqueViolation(e))
      return refuseField('conflict', 'email', 'Another account already uses that e-mail address.');
    throw e;
  }
  return done(input.email);
}
