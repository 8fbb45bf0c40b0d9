import 'server-only';
// Sends what the outbox holds. Every e-mail is written to the outbox first (db/queries/outbox.ts,
// in the same transaction as the record it is about), then delivered here and retried with
// back-off until the SMTP server takes it, so none is lost while the mail server is down.
import nodemailer, { type Transporter } from 'nodemailer';
import { db } from '@/db';
import { claimDueEmails, markEmailFailed, markEmailSent } from '@/db/queries/outbox';
import { nextAttemptAt } from '@/lib/mail/retry';
import { env } from './env';

let transporter: Transporter | null = null;

function getTransporter(): Transporter {
  const settings = env();
  transporter ??= nodemailer.createTransport({
    host: settings.SMTP_HOST,
    port: settings.SMTP_PORT,
    secure: settings.SMTP_SECURE,
    auth: settings.SMTP_USER ? { user: settings.SMTP_USER, pass: settings.SMTP_PASSWORD ?? '' } : undefined,
    // the local fake speaks plain SMTP on loopback; a real server is expected to offer TLS
    ignoreTLS: settings.SMTP_HOST === '127.0.0.1',
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
          from: env().MAIL_FROM,
          to: email.toAddress,
          ...(email.ccAddress ? { cc: email.ccAddress } : {}),
          subject: email.subject,
          text: email.textBody,
          html: email.htmlBody ?? undefined,
        });
        await markEmailSent(tx, email.id, now);
        sent++;
      } catch (error) {
        const attempts = email.attempts + 1;
        await markEmailFailed(tx, {
          id: email.id,
          attempts,
          error: error instanceof Error ? error.message : String(error),
          nextAttemptAt: nextAttemptAt(attempts, now),
        });
        failed++;
      }
    }
  });
  return { sent, failed };
}

/** For tests: forget the cached transport (e.g. after changing SMTP_PORT and calling reloadEnv()). */
export function resetMailTransport() {
  transporter?.close();
  transporter = null;
}
