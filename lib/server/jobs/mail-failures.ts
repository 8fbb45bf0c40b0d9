// Failed mail on the desk: the list, and a resend that queues a failed e-mail again.
import 'server-only';
import { listFailedEmails, requeueFailedEmail } from '@/db/queries/outbox';
import { done, refuse, type Result } from '@/lib/result';

export { listFailedEmails };

/** Queues a failed e-mail again (a fresh set of attempts); refused when it is not (or no longer) failed. */
export async function resendEmail(input: { emailId: string }): Promise<Result<{ emailId: string }>> {
  if (!(await requeueFailedEmail(input.emailId))) {
    return refuse('conflict', 'That e-mail is not marked failed (already sent or queued again).');
  }
  return done({ emailId: input.emailId });
}
