// The desk on top of the gate's real submit service: a case opened by a drop with new damage is
// priced, shows its evidence, and its trailer's chain verifies until a row is changed.
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { getCaseEvidence } from '@/db/queries/case-evidence';
import { getCase } from '@/db/queries/cases';
import { cases } from '@/db/schema';
import { seed } from '@/db/seed';
import { priceNewCases } from '@/lib/server/desk/pricing';
import { buildChecklist } from '@/lib/engine';
import { untouchedTrailer } from './desk-fixtures';
import { actor, allOk, recorded, storedPhoto, submitInput } from './handoff-fixtures';
import { verifyTrailerChain } from '@/lib/server/handoffs/chain';

describe('desk over submitted handoffs', () => {
  beforeAll(async () => {
    await seed();
  });
  afterAll(async () => {
    await pool.end();
  });

  it('prices the case, pairs before/after photos, and verifies the chain', async () => {
    const driver = await actor('D2001');
    // a seeded trailer, not a new one: the foundation test counts the seeded trailers
    const trailer = await untouchedTrailer();
    const checklist = buildChecklist({
      kind: 'reefer',
      hingesPerDoor: trailer.hingesPerDoor === 5 ? 5 : 4,
      axles: trailer.axleCount,
      tireLayout: trailer.tireLayout,
      fuelTankGallons: trailer.fuelTankGallons,
    });
    const ok = allOk(checklist);
    const t0 = new Date('2026-09-01T12:00:00Z');
    await recorded(submitInput(trailer.id, driver.carrierId!, 'drop', ok, t0), driver, {
      now: t0,
      sendReceipt: false,
    });
    const before = await storedPhoto(trailer.id, driver.id);
    const t1 = new Date('2026-09-02T12:00:00Z');
    await recorded(
      submitInput(
        trailer.id,
        driver.carrierId!,
        'hook',
        { ...ok, 'left_side.skin': { ...ok['left_side.skin'], photoIds: [before] } },
        t1,
      ),
      driver,
      { now: t1, sendReceipt: false },
    );
    const after = await storedPhoto(trailer.id, driver.id);
    const damaged = {
      ...ok,
      'left_side.skin': {
        condition: 'damaged' as const,
        isInsulationShowing: false,
        note: 'Long tear behind the landing gear',
        photoIds: [after],
      },
    };
    const t2 = new Date('2026-09-05T08:00:00Z');
    const { handoffId } = await recorded(
      submitInput(trailer.id, driver.carrierId!, 'drop', damaged, t2),
      driver,
      { now: t2, sendReceipt: false },
    );

    const [row] = await db.select().from(cases).where(eq(cases.handoffId, handoffId));
    expect(row.proposedCarrierId).toBe(driver.carrierId);
    // priced by the submit itself, in the case's own transaction: nothing is left to price afterwards
    expect(await priceNewCases(t2, [row.id])).toBe(0);
    const priced = await getCase(row.id, { role: 'driver', carrierId: driver.carrierId });
    // seed rate card: left_side damaged = 85,000 cents (invented demo figure in db/seed/index.ts)
    expect(priced?.estimateCents).toBe(85_000);

    const ev = await getCaseEvidence(row);
    const finding = ev.findings.find((f) => f.itemKey === 'left_side.skin');
    expect(finding).toMatchObject({ kind: 'new', previousCondition: 'ok', condition: 'damaged' });
    expect(finding?.reason).toMatch(/Osterlind/);
    const photoOf = (h: string | null | undefined) =>
      ev.photos.filter((p) => p.handoffId === h && p.itemKey === 'left_side.skin').map((p) => p.id);
    expect(photoOf(finding?.previousHandoffId)).toEqual([before]);
    expect(photoOf(handoffId)).toEqual([after]);

    expect((await verifyTrailerChain(trailer.id)).check).toEqual({ ok: true, count: 3 });
  });
});
