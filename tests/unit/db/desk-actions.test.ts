// The desk's server actions as Next calls them, without a running server: the session cookie and
// Next's interrupts (forbidden, redirect) are replaced; roles, form parsing, the services and the
// database are real.
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { caseEvents, cases, holds, rateCard, users } from '@/db/schema';
import { seed } from '@/db/seed';
import { signCaseLink } from '@/lib/desk/case-link';
import { IDLE } from '@/lib/result';
import { priceNewCases } from '@/lib/server/desk/pricing';
import { caseLinkSecret, reloadEnv } from '@/lib/server/env';
import { makeDeskFixture } from './desk-fixtures';

// version 1: the seeded accounts have never ended their sessions (users.session_version starts at 1)
const session = vi.hoisted(() => ({ userId: undefined as string | undefined, version: 1 }));
vi.mock('@/lib/server/session', () => ({ getSession: async () => session }));
vi.mock('next/navigation', () => ({
  forbidden: () => {
    throw new Error('forbidden (403)');
  },
  redirect: (to: string) => {
    throw new Error(`redirect to ${to}`);
  },
}));
vi.mock('next/cache', () => ({ revalidatePath: () => undefined }));
// sending is the outbox's business; these tests look at the rows the actions write
vi.mock('@/lib/server/mail', () => ({ deliverDueEmails: async () => ({ sent: 0, failed: 0 }) }));

const desk = await import('@/app/(app)/desk/actions');
const { releaseHoldAction } = await import('@/app/(app)/trailers/actions');
const { addRateAction } = await import('@/app/(app)/admin/rates/actions');
const { disputeByLinkAction } = await import('@/app/case-link/actions');

type Fixture = Awaited<ReturnType<typeof makeDeskFixture>>;
type Action = typeof desk.notifyCaseAction;

const form = (fields: Record<string, string>) => {
  const data = new FormData();
  for (const [k, v] of Object.entries(fields)) data.append(k, v);
  return data;
};
const signIn = (userId: string | undefined) => {
  session.userId = userId;
};
const historyOf = async (caseId: string) => ({
  state: (await db.select({ state: cases.state }).from(cases).where(eq(cases.id, caseId)))[0].state,
  events: (await db.select({ kind: caseEvents.kind }).from(caseEvents).where(eq(caseEvents.caseId, caseId)))
    .map((e) => e.kind)
    .sort(),
});
const userByEmail = async (email: string) =>
  (await db.select({ id: users.id }).from(users).where(eq(users.email, email)))[0].id;

/** Every case command with fields that would pass the form's schema. */
const commands = (caseId: string): [string, Action, Record<string, string>][] => [
  ['notify', desk.notifyCaseAction, { caseId }],
  ['override', desk.overrideEstimateAction, { caseId, amount: '100.00', reason: 'Body shop quote' }],
  ['decide', desk.decideCaseAction, { caseId, decision: 'waive', amount: '', reason: 'Small repair' }],
  ['close', desk.closeCaseAction, { caseId, note: 'Paid' }],
  ['dispute', desk.disputeCaseAction, { caseId, note: 'The tear was there when we hooked it.' }],
];

describe('desk server actions', () => {
  let f: Fixture;
  let jockey: string;
  let admin: string;
  beforeAll(async () => {
    process.env.CASE_LINK_SECRET = 'desk-actions-test-secret-0123456789';
    reloadEnv();
    await seed();
    f = await makeDeskFixture();
    await priceNewCases(new Date(), [f.kase.id]);
    jockey = await userByEmail('jockey@bramblecrest.example');
    admin = await userByEmail('admin@bramblecrest.example');
  });
  afterAll(async () => {
    await pool.end();
  });

  it('send a visitor without a session to sign in', async () => {
    signIn(undefined);
    await expect(desk.notifyCaseAction(IDLE, form({ caseId: f.kase.id }))).rejects.toThrow(
      'redirect to /login',
    );
  });

  it('refuse every case command to a jockey, and change nothing', async () => {
    const before = await historyOf(f.kase.id);
    signIn(jockey);
    for (const [kind, action, fields] of commands(f.kase.id)) {
      await expect(action(IDLE, form(fields)), kind).rejects.toThrow('forbidden (403)');
    }
    expect(await historyOf(f.kase.id)).toEqual(before);
  });

  it("leave a driver only the dispute, and only of their own carrier's case", async () => {
    const before = await historyOf(f.kase.id);
    signIn(f.driverA.id);
    for (const [kind, action, fields] of commands(f.kase.id).filter(([k]) => k !== 'dispute')) {
      await expect(action(IDLE, form(fields)), kind).rejects.toThrow('forbidden (403)');
    }
    expect(await historyOf(f.kase.id)).toEqual(before);

    signIn(f.clerk.id);
    expect(await desk.notifyCaseAction(IDLE, form({ caseId: f.kase.id }))).toMatchObject({ ok: true });
    const dispute = { caseId: f.kase.id, note: 'The tear was there when we hooked it.' };
    signIn(f.driverB.id);
    expect(await desk.disputeCaseAction(IDLE, form(dispute))).toMatchObject({
      ok: false,
      formError: 'This case does not exist or is not yours.',
    });
    expect((await historyOf(f.kase.id)).state).toBe('notified');
    signIn(f.driverA.id);
    expect(await desk.disputeCaseAction(IDLE, form(dispute))).toMatchObject({ ok: true });
    expect((await historyOf(f.kase.id)).state).toBe('disputed');
  });

  it("put the state machine's refusal under the input it concerns, and give the typed values back", async () => {
    signIn(f.clerk.id);
    const answer = await desk.decideCaseAction(
      IDLE,
      form({ caseId: f.kase.id, decision: 'share', amount: '900.00', reason: 'Split it' }),
    );
    expect(answer).toMatchObject({
      ok: false,
      fieldErrors: { amount: ['A shared charge is more than zero and less than the estimate.'] },
      values: { amount: '900.00', reason: 'Split it', decision: 'share' },
    });
    expect((await historyOf(f.kase.id)).state).toBe('disputed');
  });

  it('refuse hold release to a jockey and the rate card to a clerk', async () => {
    signIn(jockey);
    const release = {
      holdId: f.hold.id,
      trailerId: f.trailer.id,
      repairedBy: 'Yard shop',
      repairNote: 'Skin patched',
      repairedAt: '2026-10-25T08:00',
    };
    await expect(releaseHoldAction(IDLE, form(release))).rejects.toThrow('forbidden (403)');
    const [hold] = await db.select().from(holds).where(eq(holds.id, f.hold.id));
    expect(hold.releasedAt).toBeNull();

    const rate = { itemPattern: 'desk_actions_test', condition: 'minor', amount: '10.00' };
    signIn(f.clerk.id);
    await expect(addRateAction(IDLE, form(rate))).rejects.toThrow('forbidden (403)');
    const added = () =>
      db
        .select()
        .from(rateCard)
        .where(and(eq(rateCard.itemPattern, rate.itemPattern)));
    expect(await added()).toHaveLength(0);
    signIn(admin);
    expect(await addRateAction(IDLE, form(rate))).toMatchObject({ ok: true });
    expect(await added()).toHaveLength(1);
  });

  it('take a dispute from the e-mailed link without a session, and refuse a forged link', async () => {
    const g = await makeDeskFixture();
    await priceNewCases(new Date(), [g.kase.id]);
    signIn(g.clerk.id);
    expect(await desk.notifyCaseAction(IDLE, form({ caseId: g.kase.id }))).toMatchObject({ ok: true });
    const [{ disputeDeadline }] = await db.select().from(cases).where(eq(cases.id, g.kase.id));
    const claims = { caseId: g.kase.id, carrierId: g.carrierA.id, expiresAt: disputeDeadline! };
    const note = 'Our pickup photos show the same tear.';
    signIn(undefined);
    const forged = signCaseLink(claims, 'some-other-secret-0123456789');
    expect(await disputeByLinkAction(IDLE, form({ token: forged, note }))).toMatchObject({
      ok: false,
      formError: 'This link is not valid.',
    });
    const token = signCaseLink(claims, caseLinkSecret());
    expect(await disputeByLinkAction(IDLE, form({ token, note }))).toMatchObject({ ok: true });
    const [event] = await db
      .select()
      .from(caseEvents)
      .where(and(eq(caseEvents.caseId, g.kase.id), eq(caseEvents.kind, 'dispute')));
    expect(event).toMatchObject({ actorId: null, note: `Via the e-mailed link: ${note}` });
  });
});
