// The no-loss run's e-mail check: every e-mail in the outbox (the receipts of the run's handoffs and
// whatever the demo seed queued) must arrive in the SMTP fake's inbox exactly once, counted by its
// Message-ID (the outbox row's id, lib/server/mail.ts), even though the SMTP fake was down for a while.
import { inboxUrl } from './server';
import { sleep } from './setup';

export type MailFigures = {
  queued: number;
  sentRows: number;
  failedRows: number;
  delivered: number;
  deliveredTwice: number;
  missing: number;
  strays: number;
  attempts: number;
  waitedSeconds: number;
};

type OutboxRow = { id: string; status: string; attempts: number };

async function outboxRows(): Promise<OutboxRow[]> {
  const { pool } = await import('@/db');
  const { rows } = await pool.query<OutboxRow>('select id, status, attempts from email_outbox');
  return rows;
}

async function inboxIds(): Promise<string[]> {
  const res = await fetch(`${inboxUrl()}/messages`);
  const list = (await res.json()) as { messageId: string }[];
  return list.map((m) => m.messageId);
}

/** Waits (up to `seconds`) until no outbox row is pending, then counts the inbox against the outbox. */
export async function checkMail(seconds: number): Promise<MailFigures> {
  const t0 = Date.now();
  let rows = await outboxRows();
  while (rows.some((r) => r.status === 'pending') && Date.now() - t0 < seconds * 1000) {
    await sleep(2000);
    rows = await outboxRows();
  }
  // a send marks its row after the fake took the message: give the last one a moment to list
  await sleep(1000);
  const ids = await inboxIds();
  const seen = new Map<string, number>();
  for (const id of ids) seen.set(id, (seen.get(id) ?? 0) + 1);
  // `<row id@domain>` → row id
  const byRow = new Map([...seen.keys()].map((m) => [m.slice(1, m.indexOf('@')), m]));
  const matched = rows.map((r) => byRow.get(r.id) ?? null);
  const mine = new Set(matched.filter((m): m is string => m !== null));
  return {
    queued: rows.length,
    sentRows: rows.filter((r) => r.status === 'sent').length,
    failedRows: rows.filter((r) => r.status === 'failed').length,
    delivered: mine.size,
    deliveredTwice: [...mine].filter((m) => (seen.get(m) ?? 0) > 1).length,
    missing: matched.filter((m) => m === null).length,
    strays: [...seen.keys()].filter((k) => !mine.has(k)).length,
    attempts: rows.reduce((n, r) => n + r.attempts, 0),
    waitedSeconds: Math.round((Date.now() - t0) / 1000),
  };
}
