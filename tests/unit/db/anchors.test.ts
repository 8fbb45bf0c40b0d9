// The daily anchor: a terminal's chain heads fixed in one digest, e-mailed to its managers, and
// checked later against the records as stored. A history rewritten by the database owner, with
// every hash recomputed so the trailer's own chain check still passes, no longer matches it.
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { listChainRecords } from '@/db/queries/handoff-chain';
import { chainAnchors, emailOutbox, terminals, users } from '@/db/schema';
import { seed } from '@/db/seed';
import { hashableFromRows } from '@/lib/handoffs/canonical';
import { hashedPhotos } from '@/lib/handoffs/chain';
import { handoffContentHash } from '@/lib/handoffs/hash';
import { chainKey } from '@/lib/server/env';
import { verifyTrailerChain } from '@/lib/server/handoffs/chain';
import { anchorDueTerminals, anchorTerminal, checkTerminalAnchors } from '@/lib/server/jobs/anchor';
import { actor, allOk, freshTrailer, recorded, submitInput } from './handoff-fixtures';
import { asOwner } from './owner-connection';

describe('daily chain anchors', () => {
  let driver: Awaited<ReturnType<typeof actor>>;
  let terminal: typeof terminals.$inferSelect;
  let trailerId: string;
  let trailerChecklist: Awaited<ReturnType<typeof freshTrailer>>['checklist'];
  let managerEmail: string;

  beforeAll(async () => {
    await seed();
    driver = await actor('D1001');
    [terminal] = await db.select().from(terminals).where(eq(terminals.id, driver.terminalId!));
    // a manager of this terminal (the seed's admin may live at the other one)
    managerEmail = `manager-${terminal.code.toLowerCase()}@bramblecrest.example`;
    await db.insert(users).values({
      name: 'Anchor Test Manager',
      role: 'admin',
      email: managerEmail,
      secretHash: 'not-a-real-hash',
      homeTerminalId: terminal.id,
    });
    const { trailer, checklist } = await freshTrailer();
    trailerId = trailer.id;
    trailerChecklist = checklist;
    const t0 = new Date(Date.now() - 3 * 3_600_000);
    const drop = submitInput(trailer.id, driver.carrierId!, 'drop', allOk(checklist), t0);
    await recorded(drop, driver);
    const hook = submitInput(
      trailer.id,
      driver.carrierId!,
      'hook',
      allOk(checklist),
      new Date(t0.getTime() + 3_600_000),
    );
    await recorded(hook, driver);
  });
  afterAll(async () => {
    await pool.end();
  });

  it('anchors once per terminal day, stores the heads and e-mails the digest to the managers', async () => {
    const day = '2026-11-30';
    const first = await anchorTerminal(terminal, day);
    if (!first) throw new Error('not anchored');
    expect(first.digest).toMatch(/^[0-9a-f]{64}$/);
    expect(first.emailedTo).toContain(managerEmail);
    // a second run for the same day changes nothing
    expect(await anchorTerminal(terminal, day)).toBeNull();
    const rows = await db
      .select()
      .from(chainAnchors)
      .where(and(eq(chainAnchors.terminalId, terminal.id), eq(chainAnchors.day, day)));
    expect(rows).toHaveLength(1);
    const head = rows[0].heads.find((h) => h.trailerId === trailerId);
    const chain = await listChainRecords(trailerId);
    expect(head).toEqual({ trailerId, handoffId: chain[1].row.id, hash: chain[1].row.contentHash, count: 2 });

    const mail = await db.select().from(emailOutbox).where(eq(emailOutbox.relatedId, first.id));
    expect(mail.map((m) => m.toAddress)).toContain(managerEmail);
    expect(mail[0].textBody).toContain(first.digest);
    // and the sending job is queued with it
    const { rows: jobs } = await pool.query('select 1 from graphile_worker.jobs where key = $1', [
      `email:${mail[0].id}`,
    ]);
    expect(jobs).toHaveLength(1);
  });

  it("the hourly job anchors each terminal's previous local day once", async () => {
    const now = new Date('2026-12-02T07:30:00Z'); // 01:30 in Chicago, 00:30 in Denver: both on Dec 2
    const made = await anchorDueTerminals(now);
    expect(made.map((m) => m.day)).toEqual(made.map(() => '2026-12-01'));
    expect(made.length).toBe((await db.select().from(terminals)).length);
    expect(await anchorDueTerminals(now)).toEqual([]);
  });

  it('still verifies after later records are added to the chain', async () => {
    const { trailer, checklist } = await freshTrailer();
    // a trailer not in the anchors gets a record; and the anchored trailer gets one more
    await recorded(submitInput(trailer.id, driver.carrierId!, 'drop', allOk(checklist), new Date()), driver);
    await recorded(
      submitInput(trailerId, driver.carrierId!, 'drop', allOk(trailerChecklist), new Date()),
      driver,
    );
    const checked = await checkTerminalAnchors(terminal.id);
    expect(checked.length).toBeGreaterThanOrEqual(2);
    for (const a of checked) expect(a.check).toEqual({ ok: true, digestMatches: true, problems: [] });
  });

  it('a history rewritten by the database owner, hashes recomputed, no longer matches the anchor', async () => {
    const before = await listChainRecords(trailerId);
    expect((await verifyTrailerChain(trailerId)).check.ok).toBe(true);

    // the owner turns the append-only triggers off, edits the first record and re-links the rest
    // (the owner holds the database and, in this worst case, the chain key too)
    await asOwner(async (owner) => {
      await owner.query('begin');
      await owner.query('alter table handoffs disable trigger user');
      let prevHash: string | null = null;
      for (const [i, rec] of before.entries()) {
        const row = { ...rec.row, prevHash, driverName: i === 0 ? 'Someone Else' : rec.row.driverName };
        const contentHash = handoffContentHash(
          { ...hashableFromRows(row, rec.items, hashedPhotos(rec.photos), rec.row.hashVersion), prevHash },
          chainKey(),
        );
        await owner.query(
          'update handoffs set driver_name = $1, prev_hash = $2, content_hash = $3 where id = $4',
          [row.driverName, prevHash, contentHash, rec.row.id],
        );
        prevHash = contentHash;
      }
      await owner.query('alter table handoffs enable trigger user');
      await owner.query('commit');
    });

    // the chain alone cannot tell: every link recomputes
    expect((await verifyTrailerChain(trailerId)).check.ok).toBe(true);
    expect((await listChainRecords(trailerId))[0].row.driverName).toBe('Someone Else');

    const checked = await checkTerminalAnchors(terminal.id);
    for (const a of checked) {
      expect(a.check.ok).toBe(false);
      expect(a.check.digestMatches).toBe(false);
      expect(a.check.problems).toEqual([{ trailerId, why: 'head_changed' }]);
    }
  });
});
