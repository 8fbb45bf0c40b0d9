import 'server-only';
import { and, asc, eq, lte, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { emailOutbox } from '@/db/schema';

export type OutgoingEmail = {
  to: string;
  cc?: string | null;
  subject: string;
  text: string;
  html?: string;
  relatedType?: string;
  relatedId?: string;
};

/** Writes an e-mail to the outbox (inside the caller's transaction when `tx` is given). Returns its id. */
export async function enqueueEmail(email: OutgoingEmail, tx?: Tx): Promise<string> {
  const [row] = await (tx ?? db)
    .insert(emailOutbox)
    .values({
      toAddress: email.to,
      ccAddress: email.cc ?? null,
      subject: email.subject,
      textBody: email.text,
      htmlBody: email.html ?? null,
      relatedType: email.relatedType ?? null,
      relatedId: email.relatedId ?? null,
    })
    .returning({ id: emailOutbox.id });
  return row.id;
}

/** Claims up to `limit` due e-mails; SKIP LOCKED lets several app servers share the work. */
export async function claimDueEmails(tx: Tx, now: Date, limit = 20) {
  return tx
    .select()
    .from(emailOutbox)
    .where(and(eq(emailOutbox.status, 'pending'), lte(emailOutbox.nextAttemptAt, now)))
    .orderBy(asc(emailOutbox.createdAt))
    .limit(limit)
    .for('update', { skipLocked: true });
}

export async function markEmailSent(tx: Tx, id: string, now: Date) {
  await tx
    .update(emailOutbox)
    .set({ status: 'sent', sentAt: now, attempts: sql`${emailOutbox.attempts} + 1`, lastError: null })
    .where(eq(emailOutbox.id, id));
}

/** Records a failed send: the attempt count, the error (cut to 500 characters) and when to try again. */
export async function markEmailFailed(
  tx: Tx,
  failure: { id: string; attempts: number; error: string; nextAttemptAt: Date },
) {
  await tx
    .update(emailOutbox)
    .set({
      attempts: failure.attempts,
      lastError: failure.error.slice(0, 500),
      nextAttemptAt: failure.nextAttemptAt,
    })
    .where(eq(emailOutbox.id, failure.id));
}

export async function listEmailsFor(relatedType: string, relatedId: string) {
  return db
    .select({
      id: emailOutbox.id,
      to: emailOutbox.toAddress,
      subject: emailOutbox.subject,
      status: emailOutbox.status,
      attempts: emailOutbox.attempts,
      sentAt: emailOutbox.sentAt,
    })
    .from(emailOutbox)
    .where(and(eq(emailOutbox.relatedType, relatedType), eq(emailOutbox.relatedId, relatedId)))
    .orderBy(asc(emailOutbox.createdAt));
}
