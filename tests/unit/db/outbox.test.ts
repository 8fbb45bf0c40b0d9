import { createServer } from 'node:net';
import { eq } from 'drizzle-orm';
import { SMTPServer } from 'smtp-server';
import { afterAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { enqueueEmail } from '@/db/queries/outbox';
import { emailOutbox } from '@/db/schema';
import { nextAttemptAt } from '@/lib/mail/retry';
import { reloadEnv } from '@/lib/server/env';
import { deliverDueEmails, resetMailTransport } from '@/lib/server/mail';

/** A loopback port nothing listens on now (so other checkouts' test runs never share it). */
function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

function startInbox(port: number, received: string[]) {
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
  return new Promise<SMTPServer>((resolve) => server.listen(port, '127.0.0.1', () => resolve(server)));
}

describe('e-mail outbox', () => {
  afterAll(async () => {
    resetMailTransport();
    await pool.end();
  });

  it('keeps an e-mail while the SMTP server is down and sends it once it is back', async () => {
    const port = await freePort();
    process.env.SMTP_HOST = '127.0.0.1';
    process.env.SMTP_PORT = String(port);
    reloadEnv();
    resetMailTransport();
    const id = await enqueueEmail({
      to: 'claims@osterlind.example',
      subject: 'Case opened',
      text: 'Evidence attached.',
    });

    const t0 = new Date();
    // this file's database holds only this e-mail, so the counts are exact
    expect(await deliverDueEmails(t0)).toEqual({ sent: 0, failed: 1 });
    const [afterFailure] = await db.select().from(emailOutbox).where(eq(emailOutbox.id, id));
    expect(afterFailure.status).toBe('pending');
    expect(afterFailure.attempts).toBe(1);
    expect(afterFailure.lastError).toBeTruthy();
    expect(afterFailure.nextAttemptAt.getTime()).toBeGreaterThan(t0.getTime());

    const received: string[] = [];
    const server = await startInbox(port, received);
    try {
      // not due yet: nothing is retried before its back-off ends
      expect(await deliverDueEmails(t0)).toEqual({ sent: 0, failed: 0 });
      const later = new Date(afterFailure.nextAttemptAt.getTime() + 1000);
      expect(await deliverDueEmails(later)).toEqual({ sent: 1, failed: 0 });
      expect(received).toEqual(['claims@osterlind.example']);
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
