// The daily anchor: once a day per terminal, the heads of the chains of every trailer recorded
// there are stored with one digest over them, and the digest is e-mailed to the terminal's
// managers (outbox + job queue, in the anchor's transaction). The anchors page checks that the
// chains as stored now still lead to those heads.
import 'server-only';
import { db } from '@/db';
import { insertAnchor, listAnchors, listTerminalManagerEmails } from '@/db/queries/anchors';
import { listChainsOf, listTerminalChains } from '@/db/queries/handoff-chain';
import { enqueueEmail } from '@/db/queries/outbox';
import { listTerminals } from '@/db/queries/terminals';
import { previousLocalDay } from '@/lib/format/time';
import { anchorDigest, chainHeads, checkAnchor, type AnchorCheck } from '@/lib/handoffs/anchor';
import { anchorEmail } from '@/lib/handoffs/anchor-email';
import { appUrl, chainKey } from '../env';

type Terminal = { id: string; code: string; name: string; timeZone: string };

/** Anchors one terminal's chains as of now for `day`; null when that day was anchored already. */
export async function anchorTerminal(terminal: Terminal, day: string) {
  const heads = chainHeads(await listTerminalChains(terminal.id));
  const digest = anchorDigest(heads);
  const recordCount = heads.reduce((n, h) => n + h.count, 0);
  const managers = await listTerminalManagerEmails(terminal.id);
  const facts = (id: string) => ({
    id,
    terminal,
    day,
    digest,
    trailers: heads.length,
    records: recordCount,
    url: `${appUrl()}/admin/anchors`,
  });
  return db.transaction(async (tx) => {
    const row = await insertAnchor(tx, {
      terminalId: terminal.id,
      day,
      digest,
      heads,
      recordCount,
      emailedTo: managers.map((m) => m.email),
    });
    if (!row) return null;
    for (const to of managers)
      await enqueueEmail({ to: to.email, ...anchorEmail(to.locale, facts(row.id)) }, tx);
    return {
      id: row.id,
      digest,
      trailers: heads.length,
      records: recordCount,
      emailedTo: managers.map((m) => m.email),
    };
  });
}

/**
 * Anchors every terminal whose previous local day has no anchor yet (the job runs hourly, so each
 * terminal is anchored soon after its own midnight).
 */
export async function anchorDueTerminals(now = new Date()) {
  const done: { terminal: string; day: string; digest: string }[] = [];
  for (const t of await listTerminals()) {
    const day = previousLocalDay(now, t.timeZone);
    const anchored = await anchorTerminal(t, day);
    if (anchored) done.push({ terminal: t.code, day, digest: anchored.digest });
  }
  return done;
}

export type AnchorRow = Awaited<ReturnType<typeof listAnchors>>[number] & { check: AnchorCheck };

/** A terminal's recent anchors, each checked against the chains as stored now. */
export async function checkTerminalAnchors(terminalId: string): Promise<AnchorRow[]> {
  const anchors = await listAnchors(terminalId);
  const trailerIds = [...new Set(anchors.flatMap((a) => a.heads.map((h) => h.trailerId)))];
  const chains = await listChainsOf(trailerIds);
  return anchors.map((a) => ({ ...a, check: checkAnchor(a, chains, chainKey()) }));
}
