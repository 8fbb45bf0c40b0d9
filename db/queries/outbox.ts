import 'server-only';
import { and, desc, eq, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { emailOutbox } from '@/db/schema';
import { addJob } from './jobs';

// The outbox is the record of every e-mail Hitchmark meant to send and what became of it; the
// job queue (graphile-worker, task `send_email`) drives the sending. See docs/jobs.md.

export type OutgoingEmail = {
  to: string;
  cc?: string | null;
  subject: string;
  text: string;
  html?: string;
  relatedType?: string;
  relatedId?: string;
};

/** Sending attempts before an e-mail is marked failed (graphile-worker waits e^n seconds after the n-th). */
export const MAIL_MAX_ATTEMPTS = 10;
export const SEND_EMAIL_TASK = 'send_email';
const jobKey = (emailId: string) => `email:${emailId}`;

/**
 * Writes an e-mail to the outbox and queues its sending, in the caller's transaction when `tx` is
 * given (so a rolled-back record never mails). Returns the outbox id.
 */
export async function enqueueEmail(email: OutgoingEmail, tx?: Tx): Promise<string> {
  const work = async (t: Tx) => {
    const [row] = await t
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
    await addJob(
      SEND_EMAIL_TASK,
      { emailId: row.id },
      { maxAttempts: MAIL_MAX_ATTEMPTS, jobKey: jobKey(row.id) },
      t,
    );
    return row.id;
  };
  return tx ? work(tx) : db.transaction(work);
}

export async function getEmail(id: string) {
  const [row] = await db.select().from(emailOutbox).where(eq(emailOutbox.id, id));
  return row ?? null;
}

export async function markEmailSent(id: string, now = new Date()) {
  await db
    .update(emailOutbox)
    .set({ status: 'sent', sentAt: now, attempts: sql`${emailOutbox.attempts} + 1`, lastError: null })
    .where(eq(emailOutbox.id, id));
}

/** Records one failed attempt (error cut to 500 characters); `final` marks the e-mail failed. */
export async function markEmailAttemptFailed(id: string, failure: { error: string; final: boolean }) {
  await db
    .update(emailOutbox)
    .set({
      attempts: sql`${emailOutbox.attempts} + 1`,
      lastError: failure.error.slice(0, 500),
      ...(failure.final ? { status: 'failed' as const } : {}),
    })
    .where(eq(emailOutbox.id, id));
}

/**
 * A failed e-mail back to pending with a fresh job (same key, attempts counted again), in one
 * transaction. False when there is no failed e-mail with that id.
 */
export async function requeueFailedEmail(id: string): Promise<boolean> {
  return db.transaction(async (tx) => {
    const rows = await tx
      .update(emailOutbox)
      .set({ status: 'pending', lastError: null })
      .where(and(eq(emailOutbox.id, id), eq(emailOutbox.status, 'failed')))
      .returning({ id: emailOutbox.id });
    if (!rows.length) return false;
    await addJob(
      SEND_EMAIL_TASK,
      { emailId: id },
      { maxAttempts: MAIL_MAX_ATTEMPTS, jobKey: jobKey(id) },
      tx,
    );
    return true;
  });
}

/** Failed e-mails, newest first (the desk's list with a resend button). */
export function listFailedEmails(limit = 50) {
  return db
    .select({
      id: emailOutbox.id,
      to: emailOutbox.toAddress,
      subject: emailOutbox.subject,
      attempts: emailOutbox.attempts,
      lastError: emailOutbox.lastError,
      createdAt: emailOutbox.createdAt,
    })
    .from(emailOutbox)
    .where(eq(emailOutbox.status, 'failed'))
    .orderBy(desc(emailOutbox.createdAt))
    .limit(limit);
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
    .orderBy(emailOutbox.createdAt);
}
