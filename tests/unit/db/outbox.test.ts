// The e-mail outbox driven by the job queue (graphile-worker, real, on this file's database):
// a send that keeps failing is marked failed after MAIL_MAX_ATTEMPTS and listed for the desk,
// a resend delivers it; an SMTP server that is down and then up gets the e-mail exactly once.
// The queue's waits between attempts (e^n seconds) are skipped by rescheduling the job to now.
import { createServer } from 'node:net';
import { eq, sql } from 'drizzle-orm';
import { Logger, makeWorkerUtils, runOnce, type WorkerUtils } from 'graphile-worker';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { enqueueEmail, MAIL_MAX_ATTEMPTS } from '@/db/queries/outbox';
import { databaseUrl } from '@/db/url';
import { emailOutbox } from '@/db/schema';
import { reloadEnv } from '@/lib/server/env';
import { listFailedEmails, resendEmail } from '@/lib/server/jobs/mail-failures';
import { taskList } from '@/lib/server/jobs/tasks';
import { resetMailTransport } from '@/lib/server/mail';

/** A loopback port nothing listens on now (so other checkouts' test runs never share it). */
function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const probe = createServer().listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

/** An SMTP inbox; while `refuse` holds an address, RCPT TO that address gets 550 (RFC 5321 §4.2.2: mailbox unavailable). */
function startInbox(port: number, received: string[], refuse: Set<string>, messageIds: string[] = []) {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onRcptTo(address, _session, cb) {
      if (refuse.has(address.address)) {
        const err = new Error('mailbox unavailable') as Error & { responseCode: number };
        err.responseCode = 550;
        return cb(err);
      }
      cb();
    },
    onData(stream, session, cb) {
      let head = '';
      stream.on('data', (chunk: Buffer) => (head += head.length < 4000 ? chunk.toString() : ''));
      stream.on('end', () => {
        const m = /^Message-ID:\s*(\S+)/im.exec(head);
        messageIds.push(m ? m[1] : '');
        received.push(session.envelope.rcptTo.map((r) => r.address).join(','));
        cb();
      });
    },
  });
  return new Promise<SMTPServer>((resolve) => server.listen(port, '127.0.0.1', () => resolve(server)));
}

const stop = (s: SMTPServer) => new Promise<void>((r) => s.close(() => r()));

describe('e-mail outbox on the job queue', () => {
  let utils: WorkerUtils;
  // the queue logs each failed attempt with its stack; the assertions below say what matters
  const quiet = new Logger(() => () => undefined);
  const options = () => ({ connectionString: databaseUrl(), taskList, concurrency: 1, logger: quiet });

  /** Runs every job that is due now, once. */
  const runDueJobs = () => runOnce(options());
  /** The e-mail's job, made due now (as if the back-off had passed). False when there is none. */
  async function makeDue(emailId: string): Promise<boolean> {
    const { rows } = await pool.query<{ id: string }>('select id from graphile_worker.jobs where key = $1', [
      `email:${emailId}`,
    ]);
    if (!rows.length) return false;
    await utils.rescheduleJobs(
      rows.map((r) => r.id),
      { runAt: new Date() },
    );
    return true;
  }
  const row = async (id: string) => (await db.select().from(emailOutbox).where(eq(emailOutbox.id, id)))[0];

  beforeAll(async () => {
    utils = await makeWorkerUtils({ connectionString: databaseUrl(), logger: quiet });
    // the demo seed queued e-mails of its own: drop their jobs so only this file's e-mails run
    await db.execute(sql`delete from graphile_worker._private_jobs`);
  });
  afterAll(async () => {
    resetMailTransport();
    await utils.release();
    await pool.end();
  });

  async function pointSmtpAt(port: number) {
    process.env.SMTP_HOST = '127.0.0.1';
    process.env.SMTP_PORT = String(port);
    reloadEnv();
    resetMailTransport();
  }

  it('queues the sending job in the same transaction as the e-mail', async () => {
    const rolledBack = await db
      .transaction(async (tx) => {
        await enqueueEmail({ to: 'never@hitchmark.example', subject: 'Rolled back', text: 'x' }, tx);
        throw new Error('abort');
      })
      .catch(() => 'aborted');
    expect(rolledBack).toBe('aborted');
    const { rows } = await pool.query(
      `select 1 from graphile_worker.jobs where task_identifier = 'send_email'`,
    );
    expect(rows).toEqual([]);
    expect(await db.select().from(emailOutbox).where(eq(emailOutbox.subject, 'Rolled back'))).toEqual([]);
  });

  it(`a refused address is marked failed after ${MAIL_MAX_ATTEMPTS} attempts, listed, and a resend delivers it`, async () => {
    const port = await freePort();
    await pointSmtpAt(port);
    const received: string[] = [];
    const refused = new Set(['night-desk@carrier-osterlind.example']);
    const server = await startInbox(port, received, refused);
    try {
      const id = await enqueueEmail({
        to: 'night-desk@carrier-osterlind.example',
        subject: 'Case opened: trailer 5301',
        text: 'Evidence attached.',
      });
      for (let attempt = 1; attempt <= MAIL_MAX_ATTEMPTS; attempt++) {
        expect(await makeDue(id)).toBe(true);
        await runDueJobs();
        const r = await row(id);
        expect(r.attempts).toBe(attempt);
        expect(r.lastError).toMatch(/550/);
        expect(r.status).toBe(attempt < MAIL_MAX_ATTEMPTS ? 'pending' : 'failed');
      }
      // the queue has given up: made due again, nothing more is tried
      await makeDue(id);
      await runDueJobs();
      expect((await row(id)).attempts).toBe(MAIL_MAX_ATTEMPTS);
      expect(received).toEqual([]);

      const failed = await listFailedEmails();
      expect(failed.map((f) => f.id)).toContain(id);

      // the carrier fixes its mailbox; the clerk resends
      refused.clear();
      expect(await resendEmail({ emailId: id })).toEqual({ ok: true, value: { emailId: id } });
      expect((await row(id)).status).toBe('pending');
      await runDueJobs();
      const sent = await row(id);
      expect(sent.status).toBe('sent');
      expect(sent.attempts).toBe(MAIL_MAX_ATTEMPTS + 1);
      expect(received).toEqual(['night-desk@carrier-osterlind.example']);
      expect((await listFailedEmails()).map((f) => f.id)).not.toContain(id);
      // a second resend of a sent e-mail is refused
      expect((await resendEmail({ emailId: id })).ok).toBe(false);
    } finally {
      await stop(server);
    }
  }, 60_000);

  it('keeps an e-mail while the SMTP server is down and delivers it once when it is back', async () => {
    const port = await freePort();
    await pointSmtpAt(port);
    const id = await enqueueEmail({
      to: 'claims@osterlind.example',
      subject: 'Case decided',
      text: 'Decision attached.',
    });
    await runDueJobs();
    const afterFailure = await row(id);
    expect(afterFailure.status).toBe('pending');
    expect(afterFailure.attempts).toBe(1);
    expect(afterFailure.lastError).toMatch(/ECONNREFUSED|connect/i);

    const received: string[] = [];
    const messageIds: string[] = [];
    const server = await startInbox(port, received, new Set(), messageIds);
    try {
      // not due yet: the queue waits before the second attempt
      await runDueJobs();
      expect(received).toEqual([]);
      expect(await makeDue(id)).toBe(true);
      await runDueJobs();
      expect(received).toEqual(['claims@osterlind.example']);
      const sent = await row(id);
      expect(sent.status).toBe('sent');
      expect(sent.attempts).toBe(2);
      // its Message-ID is the outbox row's (RFC 5322 §3.6.4), the same on every attempt, so a repeat shows
      expect(messageIds).toEqual([`<${id}@hitchmark.example>`]);
      // the job is done and gone: nothing is sent twice
      expect(await makeDue(id)).toBe(false);
      await runDueJobs();
      expect(received).toEqual(['claims@osterlind.example']);
    } finally {
      await stop(server);
    }
  }, 30_000);
});
