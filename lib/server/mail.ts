import 'server-only';
// Sends one e-mail of the outbox. Every e-mail is written to the outbox first, with its sending
// job, in the same transaction as the record it is about (db/queries/outbox.ts). The job queue
// (lib/server/jobs) runs the `send_email` task, which comes here: the send happens outside any
// database transaction, each attempt is written down, and the last allowed attempt marks the
// e-mail failed for the desk to resend.
import nodemailer, { type Transporter } from 'nodemailer';
import { getEmail, markEmailAttemptFailed, markEmailSent } from '@/db/queries/outbox';
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

export type SendOutcome = 'sent' | 'already_sent' | 'unknown';

/**
 * One attempt at one outbox e-mail. `attempt` and `maxAttempts` are the job's: on a failed last
 * attempt the e-mail is marked failed. A failure is rethrown so the queue schedules the next try.
 */
export async function sendOutboxEmail(
  emailId: string,
  attempt: { attempt: number; maxAttempts: number },
): Promise<SendOutcome> {
  const email = await getEmail(emailId);
  if (!email) return 'unknown';
  if (email.status === 'sent') return 'already_sent';
  try {
    await getTransporter().sendMail({
      from: env().MAIL_FROM,
      to: email.toAddress,
      ...(email.ccAddress ? { cc: email.ccAddress } : {}),
      subject: email.subject,
      // one Message-ID per outbox row, the same on every attempt: a repeat is recognisable as one
      messageId: outboxMessageId(email.id, env().MAIL_FROM),
      text: email.textBody,
      html: email.htmlBody ?? undefined,
    });
  } catch (error) {
    await markEmailAttemptFailed(email.id, {
      error: error instanceof Error ? error.message : String(error),
      final: attempt.attempt >= attempt.maxAttempts,
    });
    throw error;
  }
  await markEmailSent(email.id);
  return 'sent';
}

/** The Message-ID (RFC 5322 §3.6.4) of an outbox e-mail: its row id at the sender's domain. */
export function outboxMessageId(emailId: string, mailFrom: string): string {
  const domain = /@([A-Za-z0-9.-]+)/.exec(mailFrom)?.[1] ?? 'hitchmark.invalid';
  return `<${emailId}@${domain}>`;
}

/** For tests: forget the cached transport (e.g. after changing SMTP_PORT and calling reloadEnv()). */
export function resetMailTransport() {
  transporter?.close();
  transporter = null;
}
