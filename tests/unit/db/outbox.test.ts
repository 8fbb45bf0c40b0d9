import { eq } from 'drizzle-orm';
import { SMTPServer } from 'smtp-server';
import { afterAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { enqueueEmail } from '@/db/queries/outbox';
import { emailOutbox } from '@/db/schema';
import { nextAttemptAt } from '@/lib/outbox-retry';
import { deliverDueEmails, resetMailTransport } from '@/lib/server/mail';

const PORT = 2699;

function startInbox(received: string[]) {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, cb) {
      stream.resume();
      stream.on('end', () => {
        received.push(session.envelope.rcptTo.map((r) => r.address).join(','));
        cb();
      });
    },
  });
  return new Promise<SMTPServer>((resolve) => server.listen(PORT, '127.0.0.1', () => resolve(server)));
}

describe('e-mail outbox', () => {
  afterAll(async () => {
    resetMailTransport();
    await pool.end();
  });

  it('keeps an e-mail while the SMTP server is down and sends it once it is back', async () => {
    process.env.SMTP_HOST = '127.0.0.1';
    process.env.SMTP_PORT = String(PORT);
    resetMailTransport();
    const id = await enqueueEmail({
      to: 'claims@osterlind.example',
      subject: 'Case opened',
      text: 'Evidence attached.',
    });

    const t0 = new Date();
    const down = await deliverDueEmails(t0);
    expect(down.failed).toBeGreaterThanOrEqual(1);
    const [afterFailure] = await db.select().from(emailOutbox).where(eq(emailOutbox.id, id));
    expect(afterFailure.status).toBe('pending');
    expect(afterFailure.attempts).toBe(1);
    expect(afterFailure.lastError).toBeTruthy();
    expect(afterFailure.nextAttemptAt.getTime()).toBeGreaterThan(t0.getTime());

    const received: string[] = [];
    const server = await startInbox(received);
    try {
      // not due yet: nothing is retried before its back-off ends
      expect((await deliverDueEmails(t0)).sent).toBe(0);
      const later = new Date(afterFailure.nextAttemptAt.getTime() + 1000);
      const up = await deliverDueEmails(later);
      expect(up.sent).toBeGreaterThanOrEqual(1);
      expect(received).toContain('claims@osterlind.example');
      const [sent] = await db.select().from(emailOutbox).where(eq(emailOutbox.id, id));
      expect(sent.status).toBe('sent');
      expect(sent.attempts).toBe(2);
    } finally {
      await new Promise<void>((r) => server.close(() => r()));
    }
  });

  it('backs off 30 s, 60 s, 120 s … and never more than 30 minutes', () => {
    const now = new Date('2026-12-01T00:00:00Z');
    const gaps = [1, 2, 3, 10].map((n) => (nextAttemptAt(n, now).getTime() - now.getTime()) / 1000);
    expect(gaps).toEqual([30, 60, 120, 1800]);
  });
});
