// Corrections of stored handoffs (correctsHandoffId): who may, when, and what the timeline, the
// attribution and the trailer file make of them. Real database, real route handler and service.
import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { getTrailerFileRows } from '@/db/queries/trailer-file';
import { seed } from '@/db/seed';
import { findings, handoffs, trailers } from '@/db/schema';
import { buildTrailerFile } from '@/lib/desk/trailer-file';
import { verifyTrailerChain } from '@/lib/server/handoffs/chain';
import { loadTimeline } from '@/lib/server/handoffs/timeline';
import { actor, allOk, freshTrailer, recorded, refused, storedPhoto, submitInput } from './handoff-fixtures';

const signedIn = vi.hoisted(() => ({ user: null as unknown }));
vi.mock('@/lib/server/auth', () => ({ currentUser: async () => signedIn.user }));
vi.mock('next/server', () => ({ after: () => undefined }));
const { POST } = await import('@/app/api/handoffs/route');

const MIN = 60_000;
const T0 = new Date('2026-11-09T13:00:00Z');
const at = (minutes: number) => new Date(T0.getTime() + minutes * MIN);

type Person = Awaited<ReturnType<typeof actor>>;
const post = (who: Person, body: unknown) => {
  signedIn.user = { id: who.id, role: who.role, carrierId: who.carrierId, terminalId: who.terminalId };
  return POST(
    new Request('http://localhost/api/handoffs', {
      method: 'POST',
      body: JSON.stringify(body),
      headers: { 'content-type': 'application/json' },
    }),
  );
};

describe('corrections of stored handoffs', () => {
  let d1: Person;
  let d2: Person;
  let clerk: Person;
  beforeAll(async () => {
    await seed();
    d1 = await actor('D1001');
    d2 = await actor('D2001');
    clerk = await actor('clerk@bramblecrest.example');
  });
  afterAll(async () => {
    await pool.end();
  });

  /** A drop by D1001 recorded `minutesAgo` minutes before now (the route stamps the real time). */
  async function dropBy(who: Person, minutesAgo = 0) {
    const { trailer, checklist } = await freshTrailer();
    const when = new Date(Date.now() - minutesAgo * MIN);
    const h = await recorded(submitInput(trailer.id, who.carrierId!, 'drop', allOk(checklist), when), who, {
      now: when,
    });
    return { trailer, checklist, h };
  }

  it('an unknown id is a 422 under correctsHandoffId, and nothing is stored', async () => {
    const { trailer, checklist } = await dropBy(d1);
    const res = await post(
      d1,
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), new Date(), {
        correctsHandoffId: '5f1d7c1e-0000-4000-8000-000000000000',
      }),
    );
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors.correctsHandoffId).toEqual(['No handoff has this id.']);
    expect(await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id))).toHaveLength(1);
  });

  it("another carrier's driver correcting someone else's record gets 403, and the record stays in the timeline", async () => {
    const { trailer, checklist, h } = await dropBy(d1);
    const res = await post(
      d2,
      submitInput(trailer.id, d2.carrierId!, 'drop', allOk(checklist), new Date(), {
        correctsHandoffId: h.handoffId,
      }),
    );
    expect(res.status).toBe(403);
    expect((await res.json()).message).toMatch(/only a handoff you recorded yourself/);
    const timeline = await loadTimeline(trailer.id);
    expect(timeline.map((e) => e.id)).toEqual([h.handoffId]);
  });

  it("a driver's own record of another trailer is a 422: a correction is of the same trailer", async () => {
    const a = await dropBy(d1);
    const b = await dropBy(d1);
    const res = await post(
      d1,
      submitInput(b.trailer.id, d1.carrierId!, 'drop', allOk(b.checklist), new Date(), {
        correctsHandoffId: a.h.handoffId,
      }),
    );
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors.correctsHandoffId).toEqual(['That handoff is of another trailer.']);
  });

  it('the recorder within the window: 201; the original stays stored, the timeline uses the correction, the chain verifies', async () => {
    const { trailer, checklist, h } = await dropBy(d1, 5);
    const [before] = await db.select().from(trailers).where(eq(trailers.id, trailer.id));
    const res = await post(
      d1,
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), new Date(), {
        correctsHandoffId: h.handoffId,
        fuelEighths: 3,
        isLoaded: true,
      }),
    );
    expect(res.status).toBe(201);
    const correction = (await res.json()).handoff;
    const stored = await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id));
    expect(stored.map((r) => r.id).sort()).toEqual([h.handoffId, correction.id].sort());
    const timeline = await loadTimeline(trailer.id);
    expect(timeline.map((e) => e.id)).toEqual([correction.id]);
    // it stands at the original's time and says when it was recorded
    const orig = stored.find((r) => r.id === h.handoffId)!;
    expect(timeline[0].at.getTime()).toBe(orig.occurredAt.getTime());
    expect(timeline[0].type === 'drop' && timeline[0].correctedAt).toBeInstanceOf(Date);
    // the trailer stays on its slot; its readings are the corrected ones
    const [after] = await db.select().from(trailers).where(eq(trailers.id, trailer.id));
    expect(after.currentSpotId).toBe(before.currentSpotId);
    expect(after.status).toBe('in_yard');
    expect([after.fuelEighths, after.isLoaded]).toEqual([3, true]);
    expect((await verifyTrailerChain(trailer.id)).check).toEqual({ ok: true, count: 2 });
    // the trailer file keeps the original, marked as corrected by the correction's receipt
    const file = buildTrailerFile((await getTrailerFileRows(trailer.id)).rows, 'handoff');
    const original = file.find((e) => e.id === h.handoffId)!;
    expect(original.title).toMatch(/\(corrected\)$/);
    expect(original.detail).toContain(`corrected by receipt ${correction.verificationCode}`);
    expect(file.find((e) => e.id === correction.id)!.title).toMatch(/^Correction: Drop by/);
    // pages of one handoff each (the two share their time; the keyset breaks the tie by id): each
    // still names the other, looked up across pages
    const first = await getTrailerFileRows(trailer.id, null, 1);
    const second = await getTrailerFileRows(trailer.id, first.next, 1);
    expect(second.next).toBeNull();
    const paged = [first, second].flatMap((p) => buildTrailerFile(p.rows, 'handoff'));
    expect(paged.map((e) => e.id).sort()).toEqual([h.handoffId, correction.id].sort());
    expect(paged.find((e) => e.id === h.handoffId)!.detail).toContain(
      `corrected by receipt ${correction.verificationCode}`,
    );
    expect(paged.find((e) => e.id === correction.id)!.detail).toContain(
      `corrects receipt ${orig.verificationCode}`,
    );
    // a second correction of the same original is refused: correct the correction instead
    const again = await post(
      d1,
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), new Date(), {
        correctsHandoffId: h.handoffId,
      }),
    );
    expect(again.status).toBe(409);
  });

  it('the recorder after the window (30 minutes by default) gets 403; a clerk needs a reason, then may', async () => {
    const { trailer, checklist, h } = await dropBy(d1, 31);
    const late = await post(
      d1,
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), new Date(), {
        correctsHandoffId: h.handoffId,
      }),
    );
    expect(late.status).toBe(403);
    expect((await late.json()).message).toMatch(/for 30 minutes/);

    const noReason = await post(
      clerk,
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), new Date(), {
        correctsHandoffId: h.handoffId,
      }),
    );
    expect(noReason.status).toBe(422);
    expect((await noReason.json()).fieldErrors.correctionReason).toEqual([
      'Give the reason for the correction.',
    ]);

    const withReason = await post(
      clerk,
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), new Date(), {
        correctsHandoffId: h.handoffId,
        correctionReason: 'Driver read the fuel gauge of the tractor, not the reefer',
        fuelEighths: 5,
      }),
    );
    expect(withReason.status).toBe(201);
    const id = (await withReason.json()).handoff.id;
    const [row] = await db.select().from(handoffs).where(eq(handoffs.id, id));
    expect(row.correctionReason).toBe('Driver read the fuel gauge of the tractor, not the reefer');
    expect(row.correctsHandoffId).toBe(h.handoffId);
    // the reason is part of the keyed link
    expect((await verifyTrailerChain(trailer.id)).check).toEqual({ ok: true, count: 2 });
  });

  it('a correction may itself be corrected by its recorder, within the window counted from the correction', async () => {
    const { trailer, checklist } = await freshTrailer();
    const h = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0)), d1, {
      now: at(0),
    });
    // within 30 minutes by the default policy
    const ok = await recorded(
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(30), {
        correctsHandoffId: h.handoffId,
      }),
      d1,
      { now: at(30) },
    );
    expect(ok.isReplay).toBe(false);
    // the correction itself, 31 minutes after it was recorded, is past the window
    const past = await refused(
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(61), {
        correctsHandoffId: ok.handoffId,
      }),
      d1,
      { now: at(61) },
    );
    expect(past.code).toBe('forbidden');
  });

  it("the attribution's reason names the correction it compared with", async () => {
    const { trailer, checklist } = await freshTrailer();
    const drop = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0)), d1, {
      now: at(0),
    });
    const fix = await recorded(
      submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(12), {
        correctsHandoffId: drop.handoffId,
        sealNumber: 'SL-2207',
      }),
      d1,
      { now: at(12) },
    );
    const damaged = allOk(checklist);
    damaged['left_side.skin'] = {
      condition: 'damaged',
      isInsulationShowing: true,
      note: 'Torn skin, 30 cm, insulation showing',
      photoIds: [await storedPhoto(trailer.id, d2.id)],
    };
    const hook = await recorded(
      submitInput(trailer.id, d2.carrierId!, 'hook', damaged, at(180), { isLoadPerishable: false }),
      d2,
      {
        now: at(180),
      },
    );
    const [f] = await db
      .select()
      .from(findings)
      .where(and(eq(findings.handoffId, hook.handoffId), eq(findings.itemKey, 'left_side.skin')));
    expect(f.kind).toBe('new');
    expect(f.previousHandoffId).toBe(fix.handoffId);
    // times in the terminal's zone; the demo home terminal keeps US Central time (IANA America/Chicago):
    // 13:00Z is 07:00 and 13:12Z is 07:12 on 9 Nov 2026 (CST, UTC-6)
    expect(f.reason).toContain('the drop on 9 Nov 2026 07:00 by driver Test Driver');
    expect(f.reason).toContain('as corrected on 9 Nov 2026 07:12');
  });
});
