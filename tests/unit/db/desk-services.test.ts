// The desk's smaller services and the database constraints under them, on real PostgreSQL.
import { randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { auditLog, caseEvents, cases, holds, rateCard } from '@/db/schema';
import { seed } from '@/db/seed';
import { signCaseLink } from '@/lib/desk/case-link';
import { disputeByLink } from '@/lib/server/desk/link-dispute';
import { addRate, changeRate } from '@/lib/server/desk/rates';
import { caseLinkSecret, reloadEnv } from '@/lib/server/env';
import { releaseHold } from '@/lib/server/holds/release';
import { makeDeskFixture } from './desk-fixtures';

type Fixture = Awaited<ReturnType<typeof makeDeskFixture>>;

/** The PostgreSQL error under Drizzle's wrapper (or the error itself from a plain pool query). */
async function pgError(work: Promise<unknown>) {
  const e = await work.then(
    () => null,
    (error: unknown) => error,
  );
  expect(e, 'the statement should have been refused').not.toBeNull();
  const cause = (e as { cause?: unknown }).cause ?? e;
  return cause as { code?: string; constraint?: string };
}

describe('desk services', () => {
  let f: Fixture;
  beforeAll(async () => {
    process.env.CASE_LINK_SECRET = 'desk-services-test-secret-0123456789';
    reloadEnv();
    await seed();
    f = await makeDeskFixture();
  });
  afterAll(async () => {
    await pool.end();
  });

  it('adds a rate with its audit entry, and refuses a second rate for the same item and condition', async () => {
    const itemPattern = `svc_${randomUUID().slice(0, 8)}`;
    const input = { itemPattern, condition: 'damaged' as const, amount: 12_500 };
    expect(await addRate(f.clerk, input)).toEqual({ ok: true, value: undefined });
    expect(await addRate(f.clerk, { ...input, amount: 99 })).toMatchObject({
      ok: false,
      code: 'conflict',
      fieldErrors: { itemPattern: [`${itemPattern} already has a damaged rate; change it in the list.`] },
    });
    const rows = await db.select().from(rateCard).where(eq(rateCard.itemPattern, itemPattern));
    expect(rows.map((r) => r.amountCents)).toEqual([12_500]);
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.action, 'rate_added'), eq(auditLog.entityId, itemPattern)));
    expect(audit).toHaveLength(1);

    expect(await changeRate(f.clerk, { id: rows[0].id, amount: 13_000 })).toEqual({
      ok: true,
      value: undefined,
    });
    expect(await changeRate(f.clerk, { id: randomUUID(), amount: 1 })).toMatchObject({
      ok: false,
      code: 'not_found',
    });
  });

  it('refuses a repair time in the future or before the hold, under the time field', async () => {
    const release = {
      holdId: f.hold.id,
      trailerId: f.trailer.id,
      repairedBy: 'Riverbend body shop',
      repairNote: 'Skin patched and sealed',
    };
    const now = new Date('2026-10-25T12:00:00Z');
    // a minute of slack for a phone clock ahead of the server's; more is the future
    const future = await releaseHold(
      f.clerk,
      { ...release, repairedAt: new Date('2026-10-25T12:01:01Z') },
      now,
    );
    expect(future).toMatchObject({
      code: 'invalid',
      fieldErrors: { repairedAt: ['The repair time is in the future.'] },
    });
    const early = await releaseHold(
      f.clerk,
      { ...release, repairedAt: new Date('2026-10-23T09:29:00Z') },
      now,
    );
    expect(early).toMatchObject({
      code: 'invalid',
      fieldErrors: { repairedAt: ['The repair time is before the hold was placed.'] },
    });
    const elsewhere = await releaseHold(
      f.clerk,
      { ...release, trailerId: randomUUID(), repairedAt: now },
      now,
    );
    expect(elsewhere).toMatchObject({ ok: false, code: 'not_found' });
    const [hold] = await db.select().from(holds).where(eq(holds.id, f.hold.id));
    expect(hold.releasedAt).toBeNull();
  });

  it('refuses a dispute through a link that has expired', async () => {
    const token = signCaseLink(
      { caseId: f.kase.id, carrierId: f.carrierA.id, expiresAt: new Date('2026-11-07T16:00:00Z') },
      caseLinkSecret(),
    );
    const late = await disputeByLink(
      { token, note: 'Too late to say so.' },
      new Date('2026-11-07T16:00:01Z'),
    );
    expect(late).toMatchObject({ ok: false, code: 'gone' });
  });

  it('keeps one case per handoff, one rate per item and condition, and no event without its case', async () => {
    const second = db.insert(cases).values({
      handoffId: f.drop.id,
      trailerId: f.trailer.id,
      terminalId: f.terminal.id,
    });
    expect(await pgError(second)).toMatchObject({ code: '23505', constraint: 'cases_handoff_id_unique' });
    const again = db
      .insert(rateCard)
      .values({ itemPattern: 'left_side', condition: 'damaged', amountCents: 1 });
    expect(await pgError(again)).toMatchObject({ code: '23505', constraint: 'rate_card_item_condition' });
    const orphan = db.insert(caseEvents).values({ caseId: randomUUID(), kind: 'note' });
    expect(await pgError(orphan)).toMatchObject({
      code: '23503',
      constraint: 'case_events_case_id_cases_id_fk',
    });
  });
});
