import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { getCase, listCaseEvents, listCases } from '@/db/queries/cases';
import { getCaseEvidence } from '@/db/queries/case-evidence';
import { getTrailerFileRows } from '@/db/queries/trailer-file';
import { caseEvents, cases, emailOutbox, holds, photos, rateCard } from '@/db/schema';
import { verifyCaseLink } from '@/lib/desk/case-link';
import type { CaseCommand } from '@/lib/desk/case-state';
import { buildTrailerFile } from '@/lib/desk/trailer-file';
import { runCaseCommand, type CaseActor } from '@/lib/server/desk/case-command';
import { priceNewCases } from '@/lib/server/desk/pricing';
import { reloadEnv } from '@/lib/server/env';
import { releaseHold } from '@/lib/server/holds/release';
import { seed } from '@/db/seed';
import { makeDeskFixture } from './desk-fixtures';
import { verifyTrailerChain } from '@/lib/server/handoffs/chain';
import { asOwner } from './owner-connection';

type Fixture = Awaited<ReturnType<typeof makeDeskFixture>>;
let f: Fixture;
const secret = 'desk-test-secret-0123456789abcdef';
const run = (command: CaseCommand, actor: CaseActor, now: Date) =>
  runCaseCommand(actor, { caseId: f.kase.id, command }, { now });
const clerk = (): CaseActor => ({ id: f.clerk.id, role: 'clerk', carrierId: null });
const driverA = (): CaseActor => ({ id: f.driverA.id, role: 'driver', carrierId: f.carrierA.id });
const driverB = (): CaseActor => ({ id: f.driverB.id, role: 'driver', carrierId: f.carrierB.id });
const eventsOf = () => db.select().from(caseEvents).where(eq(caseEvents.caseId, f.kase.id));

describe('desk in the database', () => {
  beforeAll(async () => {
    // the e-mailed links are signed with this secret, so the test can check them
    process.env.CASE_LINK_SECRET = secret;
    reloadEnv();
    await seed();
    f = await makeDeskFixture();
  });
  afterAll(async () => {
    await pool.end();
  });

  it('a driver sees only cases proposed to their own carrier', async () => {
    const mine = await listCases(driverA(), {});
    expect(mine.map((c) => c.id)).toContain(f.kase.id);
    expect(mine.every((c) => c.carrierScac === f.carrierA.scac)).toBe(true);
    expect((await listCases(driverB(), {})).map((c) => c.id)).not.toContain(f.kase.id);
    expect(await getCase(f.kase.id, driverB())).toBeNull();
    expect(await getCase(f.kase.id, { role: 'jockey', carrierId: null })).toBeNull();
    expect((await getCase(f.kase.id, clerk()))?.unitNumber).toBe(f.trailer.unitNumber);
  });

  it('prices the new case from the rate card in whole cents, once', async () => {
    const [rate] = await db
      .select()
      .from(rateCard)
      .where(and(eq(rateCard.itemPattern, 'left_side'), eq(rateCard.condition, 'damaged')));
    expect(await priceNewCases(new Date('2026-10-23T10:00:00Z'), [f.kase.id])).toBe(1);
    expect(await priceNewCases(new Date('2026-10-23T10:05:00Z'), [f.kase.id])).toBe(0);
    const [row] = await db.select().from(cases).where(eq(cases.id, f.kase.id));
    expect(row.estimateCents).toBe(rate.amountCents);
    expect((await eventsOf()).filter((e) => e.kind === 'estimated')).toHaveLength(1);
  });

  it('filters the queue by state, carrier and amount', async () => {
    expect((await listCases(clerk(), { state: 'open', carrier: f.carrierA.id })).map((c) => c.id)).toEqual([
      f.kase.id,
    ]);
    expect(await listCases(clerk(), { carrier: f.carrierA.id, minAmount: 85_001 })).toEqual([]);
    expect(
      (await listCases(clerk(), { carrier: f.carrierA.id, maxAmount: 85_000 })).map((c) => c.id),
    ).toEqual([f.kase.id]);
  });

  it('shows the before and after records of the damaged item', async () => {
    const ev = await getCaseEvidence(f.kase);
    expect(ev.findings).toHaveLength(1);
    const before = ev.items.find((i) => i.handoffId === f.hook.id && i.itemKey === 'left_side.skin');
    const after = ev.items.find((i) => i.handoffId === f.drop.id && i.itemKey === 'left_side.skin');
    expect([before?.condition, after?.condition]).toEqual(['ok', 'damaged']);
  });

  it('persists each allowed change as an event, refuses the rest, and e-mails through the outbox', async () => {
    const notifiedAt = new Date('2026-10-24T15:00:00Z');
    expect(
      await run({ kind: 'dispute', note: 'Not ours at all, we say.' }, driverA(), notifiedAt),
    ).toMatchObject({ ok: false, code: 'conflict' });
    expect(await run({ kind: 'notify' }, clerk(), notifiedAt)).toMatchObject({
      ok: true,
      value: { toState: 'notified' },
    });
    expect(await run({ kind: 'notify' }, clerk(), notifiedAt)).toMatchObject({ ok: false, code: 'conflict' });

    const mail = await db
      .select()
      .from(emailOutbox)
      .where(and(eq(emailOutbox.relatedType, 'case'), eq(emailOutbox.relatedId, f.kase.id)));
    expect(mail).toHaveLength(1);
    expect(mail[0].toAddress).toBe(f.carrierA.contactEmail);
    expect(mail[0].textBody).toContain(f.trailer.unitNumber);
    expect(mail[0].textBody).toContain('$850.00');
    const token = /\/case-link\/(\S+)/.exec(mail[0].textBody)?.[1] ?? '';
    expect(verifyCaseLink(token, secret, notifiedAt)).toMatchObject({
      ok: true,
      claims: { caseId: f.kase.id, carrierId: f.carrierA.id },
    });

    // another carrier's driver cannot touch it: the WHERE clause hides the case
    expect(
      await run({ kind: 'dispute', note: 'We want to dispute this.' }, driverB(), notifiedAt),
    ).toMatchObject({ ok: false, code: 'not_found' });
    expect(
      await run(
        { kind: 'dispute', note: 'The tear was there at our hook.' },
        driverA(),
        new Date('2026-10-30T12:00:00Z'),
      ),
    ).toMatchObject({ ok: true, value: { toState: 'disputed' } });
    expect(
      await run(
        {
          kind: 'decide',
          decision: 'share',
          chargedCents: 42_500,
          reason: 'Hook photos are unclear; split.',
        },
        clerk(),
        new Date('2026-11-02T12:00:00Z'),
      ),
    ).toMatchObject({ ok: true, value: { toState: 'decided' } });
    expect(
      await run(
        { kind: 'decide', decision: 'waive', chargedCents: 0, reason: 'Second try' },
        clerk(),
        new Date('2026-11-02T12:01:00Z'),
      ),
    ).toMatchObject({ ok: false, code: 'conflict', message: 'This case is already decided.' });

    const events = await eventsOf();
    expect(events.map((e) => e.kind)).toEqual(['opened', 'estimated', 'notify', 'dispute', 'decide']);
    expect(events.find((e) => e.kind === 'dispute')).toMatchObject({
      actorId: f.driverA.id,
      fromState: 'notified',
      toState: 'disputed',
    });
    const [row] = await db.select().from(cases).where(eq(cases.id, f.kase.id));
    expect(row).toMatchObject({ state: 'decided', decision: 'share', chargedCents: 42_500 });
    // 14 days after 24 Oct 10:00 CDT is 7 Nov 10:00 CST: the IANA tz database ends US DST on 1 Nov 2026.
    expect(row.disputeDeadline?.toISOString()).toBe('2026-11-07T16:00:00.000Z');
    const mails = await db.select().from(emailOutbox).where(eq(emailOutbox.relatedId, f.kase.id));
    expect(mails.map((m) => m.subject)).toEqual(expect.arrayContaining([expect.stringMatching(/^Decision/)]));
  });

  it('refuses a dispute after the window closes', async () => {
    const g = await makeDeskFixture();
    await priceNewCases(new Date(), [g.kase.id]);
    const r = (command: CaseCommand, actor: CaseActor, now: Date) =>
      runCaseCommand(actor, { caseId: g.kase.id, command }, { now });
    await r(
      { kind: 'notify' },
      { id: g.clerk.id, role: 'clerk', carrierId: null },
      new Date('2026-10-24T15:00:00Z'),
    );
    const late = await r(
      { kind: 'dispute', note: 'Too late but trying.' },
      { id: g.driverA.id, role: 'driver', carrierId: g.carrierA.id },
      new Date('2026-11-07T16:00:00.001Z'),
    );
    expect(late).toMatchObject({ ok: false, code: 'conflict', message: expect.stringMatching(/window/) });
  });

  it("attaches the disputer's own uploaded photos to the dispute, and refuses someone else's", async () => {
    const h = await makeDeskFixture();
    await priceNewCases(new Date(), [h.kase.id]);
    const cmd = (command: CaseCommand, actor: CaseActor, now: Date) =>
      runCaseCommand(actor, { caseId: h.kase.id, command }, { now, sendEmail: false });
    await cmd(
      { kind: 'notify' },
      { id: h.clerk.id, role: 'clerk', carrierId: null },
      new Date('2026-10-24T15:00:00Z'),
    );
    const photo = async (uploadedById: string) =>
      (
        await db
          .insert(photos)
          .values({
            objectKey: `test/${randomUUID()}.png`,
            uploadedById,
            trailerId: h.trailer.id,
            status: 'stored',
            contentType: 'image/png',
            byteSize: 10,
            sha256: 'a'.repeat(64),
          })
          .returning()
      )[0].id;
    const driver: CaseActor = { id: h.driverA.id, role: 'driver', carrierId: h.carrierA.id };
    const foreign = await photo(h.clerk.id);
    expect(
      await cmd(
        { kind: 'dispute', note: 'See the attached photo.', photoIds: [foreign] },
        driver,
        new Date('2026-10-25T10:00:00Z'),
      ),
    ).toMatchObject({ ok: false, code: 'conflict', fieldErrors: { photoIds: [expect.any(String)] } });
    const mine = await photo(h.driverA.id);
    expect(
      await cmd(
        { kind: 'dispute', note: 'See the attached photo.', photoIds: [mine] },
        driver,
        new Date('2026-10-25T10:00:00Z'),
      ),
    ).toMatchObject({ ok: true, value: { toState: 'disputed' } });
    const events = await listCaseEvents(h.kase.id);
    expect(events.find((e) => e.kind === 'dispute')?.photoIds).toEqual([mine]);
    expect(events.filter((e) => e.kind === 'dispute')).toHaveLength(1);
  });

  it('releases a hold by recording the repair, shown on the trailer file', async () => {
    const repairedAt = new Date('2026-10-25T08:00:00Z');
    expect(
      await releaseHold(f.clerk, {
        holdId: f.hold.id,
        trailerId: f.trailer.id,
        repairedBy: 'Riverbend body shop',
        repairNote: 'Skin patched and sealed',
        repairedAt,
      }),
    ).toEqual({ ok: true, value: { holdId: f.hold.id } });
    expect(
      await releaseHold(f.clerk, {
        holdId: f.hold.id,
        trailerId: f.trailer.id,
        repairedBy: 'x',
        repairNote: 'again',
        repairedAt,
      }),
    ).toMatchObject({ ok: false, code: 'conflict', message: 'This hold was already released.' });
    const [h] = await db.select().from(holds).where(eq(holds.id, f.hold.id));
    expect(h).toMatchObject({ repairedBy: 'Riverbend body shop', releasedById: f.clerk.id });
    const file = buildTrailerFile((await getTrailerFileRows(f.trailer.id)).rows);
    expect(file.some((e) => e.kind === 'hold' && e.title.includes('released'))).toBe(true);
  });

  it('the hash chain verifies, and detects a handoff row changed in the database', async () => {
    expect((await verifyTrailerChain(f.trailer.id)).check).toEqual({ ok: true, count: 2 });
    // handoffs are append-only by trigger and the app's role may not update them; as the table
    // owner, switch the trigger off to play the tamperer
    await asOwner(async (owner) => {
      await owner.query('ALTER TABLE handoffs DISABLE TRIGGER handoffs_append_only');
      try {
        await owner.query('UPDATE handoffs SET driver_name = $1 WHERE id = $2', ['Somebody Else', f.hook.id]);
      } finally {
        await owner.query('ALTER TABLE handoffs ENABLE TRIGGER handoffs_append_only');
      }
    });
    const { check, brokenAt } = await verifyTrailerChain(f.trailer.id);
    expect(check).toEqual({ ok: false, brokenAt: f.hook.id, why: 'content_changed' });
    expect(brokenAt?.toISOString()).toBe('2026-10-20T14:00:00.000Z');
    // the app's role is refused by its grants (42501); the owner by the append-only trigger (HM001,
    // db/migrations/0001_append-only-records.sql)
    await expect(
      pool.query('UPDATE handoffs SET driver_name = $1 WHERE id = $2', ['Again', f.hook.id]),
    ).rejects.toMatchObject({ code: '42501' });
    await asOwner(async (owner) => {
      await expect(
        owner.query('UPDATE handoffs SET driver_name = $1 WHERE id = $2', ['Again', f.hook.id]),
      ).rejects.toMatchObject({ code: 'HM001', message: expect.stringMatching(/append-only/) });
    });
  });
});
