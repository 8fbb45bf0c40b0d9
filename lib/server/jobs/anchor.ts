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
import { appUrl, chainKey } from '../env';

type Terminal = { id: string; code: string; name: string; timeZone: string };

/** Anchors one terminal's chains as of now for `day`; null when that day was anchored already. */
export async function anchorTerminal(terminal: Terminal, day: string) {
  const heads = chainHeads(await listTerminalChains(terminal.id));
  const digest = anchorDigest(heads);
  const recordCount = heads.reduce((n, h) => n + h.count, 0);
  const managers = await listTerminalManagerEmails(terminal.id);
  return db.transaction(async (tx) => {
    const row = await insertAnchor(tx, {
      terminalId: terminal.id,
      day,
      digest,
      heads,
      recordCount,
      emailedTo: managers,
    });
    if (!row) return null;
    for (const to of managers) {
      await enqueueEmail(
        {
          to,
          subject: `Hitchmark chain anchor ${terminal.code} ${day}: ${digest.slice(0, 16)}`,
          text: [
            `Daily record anchor of terminal ${terminal.code} (${terminal.name}) for ${day}.`,
            '',
            `Digest (SHA-256 over ${heads.length} trailer chains, ${recordCount} handoff records):`,
            digest,
            '',
            'Keep this e-mail. The anchors page shows the same digest and checks that the records',
            `as stored today still lead to it: ${appUrl()}/admin/anchors`,
            'If the page ever shows another digest for this day, the records were rewritten.',
          ].join('\n'),
          relatedType: 'anchor',
          relatedId: row.id,
        },
        tx,
      );
    }
    return { id: row.id, digest, trailers: heads.length, records: recordCount, emailedTo: managers };
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
