// Sends what the outbox holds. Every e-mail is written to the outbox first (db/queries/outbox.ts,
// in the same transaction as the record it is about), then delivered here and retried with
// back-off until the SMTP server takes it, so none is lost while the mail server is down.
import nodemailer, { type Transporter } from 'nodemailer';
import { db } from '@/db';
import { claimDueEmails, markEmailFailed, markEmailSent } from '@/db/queries/outbox';

let transporter: Transporter | null = null;

function getTransporter(): Transporter {
  transporter ??= nodemailer.createTransport({
    host: process.env.SMTP_HOST ?? '127.0.0.1',
    port: Number(process.env.SMTP_PORT ?? 2525),
    secure: process.env.SMTP_SECURE === '1',
    auth: process.env.SMTP_USER
      ? { user: process.env.SMTP_USER, pass: process.env.SMTP_PASSWORD ?? '' }
      : undefined,
    // the local fake speaks plain SMTP on loopback; a real server is expected to offer TLS
    ignoreTLS: process.env.SMTP_HOST === undefined || process.env.SMTP_HOST === '127.0.0.1',
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
  });
  return transporter;
}

/** Tries every due e-mail once. Returns how many were sent and how many failed this round. */
export async function deliverDueEmails(now = new Date()): Promise<{ sent: number; failed: number }> {
  let sent = 0;
  let failed = 0;
  await db.transaction(async (tx) => {
    const due = await claimDueEmails(tx, now);
    for (const email of due) {
      try {
        await getTransporter().sendMail({
          from: process.env.MAIL_FROM ?? 'Hitchmark <no-reply@hitchmark.example>',
          to: email.toAddress,
          subject: email.subject,
          text: email.textBody,
          html: email.htmlBody ?? undefined,
        });
        await markEmailSent(tx, email.id, now);
        sent++;
      } catch (error) {
        await markEmailFailed(
          tx,
          email.id,
          email.attempts,
          error instanceof Error ? error.message : String(error),
          now,
        );
        failed++;
      }
    }
  });
  return { sent, failed };
}

/** For tests: forget the cached transport (e.g. after changing SMTP_PORT). */
export function resetMailTransport() {
  transporter?.close();
  transporter = null;
}
