// Test data for the desk's database tests: an invented terminal, two outside carriers, a trailer
// with a hook and a drop (new damage on the left side skin), its finding and its open case.
import { randomUUID } from 'node:crypto';
import { and, asc, eq, sql } from 'drizzle-orm';
import { db } from '@/db';
import {
  carriers,
  cases,
  caseEvents,
  findings,
  handoffItems,
  handoffs,
  holds,
  policies,
  rateCard,
  terminals,
  trailers,
  users,
} from '@/db/schema';
import { hashableFromRows } from '@/lib/handoffs/canonical';
import { handoffContentHash, KEYED_HASH_VERSION } from '@/lib/handoffs/hash';
import { chainKey } from '@/lib/server/env';

const tag = () => randomUUID().replace(/-/g, '').slice(0, 6).toUpperCase();

/**
 * A seeded reefer on the road that no handoff has touched. The demo seed must have run (the
 * foundation test counts the seeded trailers, so desk tests add none of their own).
 */
export async function untouchedTrailer() {
  const [row] = await db
    .select()
    .from(trailers)
    .where(
      and(
        eq(trailers.status, 'on_road'),
        eq(trailers.kind, 'reefer'),
        sql`not exists (select 1 from ${handoffs} where ${handoffs.trailerId} = ${trailers.id})`,
      ),
    )
    .orderBy(asc(trailers.unitNumber))
    .limit(1);
  if (!row) throw new Error('no untouched trailer left in the test database');
  return row;
}

export async function makeDeskFixture() {
  const t = tag();
  const [terminal] = await db
    .insert(terminals)
    .values({ code: `T${t}`, name: `Test terminal ${t}`, timeZone: 'America/Chicago' })
    .returning();
  await db.insert(policies).values({ terminalId: terminal.id, data: { disputeWindowDays: 14 } });
  const [carrierA, carrierB] = await db
    .insert(carriers)
    .values([
      { scac: `A${t}`, name: `Carrier A ${t}`, contactEmail: `a-${t.toLowerCase()}@carrier-a.example` },
      { scac: `B${t}`, name: `Carrier B ${t}`, contactEmail: `b-${t.toLowerCase()}@carrier-b.example` },
    ])
    .returning();
  const [clerk, driverA, driverB] = await db
    .insert(users)
    .values([
      {
        name: 'Test Clerk',
        role: 'clerk',
        email: `clerk-${t.toLowerCase()}@test.example`,
        secretHash: 'x',
        homeTerminalId: terminal.id,
      },
      {
        name: 'Driver of A',
        role: 'driver',
        driverNumber: `DA${t}`,
        secretHash: 'x',
        carrierId: carrierA.id,
      },
      {
        name: 'Driver of B',
        role: 'driver',
        driverNumber: `DB${t}`,
        secretHash: 'x',
        carrierId: carrierB.id,
      },
    ])
    .returning();
  const trailer = await untouchedTrailer();

  let prevHash: string | null = null;
  const addHandoff = async (
    kind: 'drop' | 'hook',
    at: string,
    skin: 'ok' | 'damaged',
    carrierId: string,
    driver: { id: string; name: string },
  ) => {
    const row = {
      id: randomUUID(),
      trailerId: trailer.id,
      terminalId: terminal.id,
      kind,
      level: 'full' as const,
      carrierId,
      driverId: driver.id,
      driverName: driver.name,
      tractorNumber: 'T-100',
      recordedById: driver.id,
      isLoaded: false,
      occurredAt: new Date(at),
      idempotencyKey: randomUUID(),
      verificationCode: tag() + tag(),
      sealNumber: null,
      fuelEighths: null,
      isReeferOn: null,
      setpointTenthsF: null,
      returnAirTenthsF: null,
      engineHoursTenths: null,
      pretripResult: null,
      pretripAt: null,
      note: null,
      correctsHandoffId: null,
      prevHash,
    };
    const items = [
      {
        itemKey: 'left_side.skin',
        condition: skin,
        treadThirtySeconds: null,
        isHoldingAir: null,
        note: skin === 'ok' ? null : 'Torn skin behind the landing gear',
      },
      {
        itemKey: 'rear.header',
        condition: 'ok' as const,
        treadThirtySeconds: null,
        isHoldingAir: null,
        note: null,
      },
    ];
    const contentHash = handoffContentHash(hashableFromRows(row, items, [], KEYED_HASH_VERSION), chainKey());
    await db.insert(handoffs).values({ ...row, contentHash, hashVersion: KEYED_HASH_VERSION });
    await db.insert(handoffItems).values(items.map((i) => ({ ...i, handoffId: row.id })));
    prevHash = contentHash;
    return row;
  };
  const hook = await addHandoff('hook', '2026-10-20T14:00:00Z', 'ok', carrierA.id, driverA);
  const drop = await addHandoff('drop', '2026-10-23T09:30:00Z', 'damaged', carrierA.id, driverA);

  const [kase] = await db
    .insert(cases)
    .values({
      handoffId: drop.id,
      trailerId: trailer.id,
      terminalId: terminal.id,
      proposedCarrierId: carrierA.id,
      openedAt: drop.occurredAt,
    })
    .returning();
  await db
    .insert(caseEvents)
    .values({ caseId: kase.id, kind: 'opened', toState: 'open', note: 'Opened by the drop' });
  await db.insert(findings).values({
    handoffId: drop.id,
    trailerId: trailer.id,
    itemKey: 'left_side.skin',
    kind: 'new',
    condition: 'damaged',
    previousCondition: 'ok',
    previousHandoffId: hook.id,
    responsibleCarrierId: carrierA.id,
    responsibleParty: carrierA.name,
    confidence: 'high',
    reason: `Left side skin: inspected ok at the hook, damaged at the drop; ${carrierA.name} held the trailer in between.`,
    caseId: kase.id,
  });
  const [hold] = await db
    .insert(holds)
    .values({
      trailerId: trailer.id,
      handoffId: drop.id,
      severity: 'restricted',
      restriction: 'no_perishable',
      ruleKey: 'insulation',
      itemKey: 'left_side.skin',
      reason: 'Insulation showing',
      source: 'handoff',
      placedAt: drop.occurredAt,
    })
    .returning();
  // a rate only this fixture's item pattern uses, so other tests' rates do not interfere
  await db
    .insert(rateCard)
    .values({ itemPattern: 'left_side', condition: 'damaged', amountCents: 85_000 })
    .onConflictDoNothing();
  return { terminal, carrierA, carrierB, clerk, driverA, driverB, trailer, hook, drop, kase, hold };
}
