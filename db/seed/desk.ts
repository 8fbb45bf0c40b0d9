// Demo damage cases for the desk: eight outside-carrier trailers, each with a drop and hook all
// ok and then a drop with new damage, recorded through the gate's real submit service; the cases
// are then walked through the desk's own commands into every state, two of them disputed.
// Invented data only. Skips when it ran before (its idempotency keys start with "seed-desk-").
import { and, desc, eq, inArray, like, sql } from 'drizzle-orm';
import { db } from '@/db';
import { caseEvents, cases, handoffs, trailers, users } from '@/db/schema';
import { allOkObservations } from '@/lib/handoffs/all-ok';
import { priceNewCases } from '@/lib/server/desk/pricing';
import { checklistOf } from '@/lib/trailers/checklist';
import type { ItemObservationInput } from '@/lib/validation/handoffs';
import { demoPhoto } from './desk-photos';
import { walkDemoCases } from './desk-walk';
import { recordSeedHandoff, type HandoffActor } from './submit';

const DAY = 86_400_000;

const DAMAGE: { itemKey: string; condition: 'damaged'; note: string; isInsulationShowing?: boolean }[] = [
  {
    itemKey: 'left_side.skin',
    condition: 'damaged',
    note: 'Skin torn about 40 cm behind the landing gear, insulation showing',
    isInsulationShowing: true,
  },
  { itemKey: 'rear.header', condition: 'damaged', note: 'Door header bent at the right corner' },
  { itemKey: 'right_side.skin', condition: 'damaged', note: 'Long scrape with a puncture near the rear' },
  { itemKey: 'reefer_unit.housing', condition: 'damaged', note: 'Unit door cracked, latch missing' },
  { itemKey: 'left_side.bottom_rail', condition: 'damaged', note: 'Bottom rail dented at the tandem' },
  { itemKey: 'right_side.top_rail', condition: 'damaged', note: 'Top rail creased near the nose' },
  { itemKey: 'left_side.skin', condition: 'damaged', note: 'Hole in the skin at shoulder height' },
  { itemKey: 'rear.header', condition: 'damaged', note: 'Header detached on the left' },
];
const DRIVERS = ['D2001', 'D3001', 'D4001', 'D2002'];

export async function seedDesk(now = new Date()) {
  const done = await db
    .select({ id: handoffs.id })
    .from(handoffs)
    .where(like(handoffs.idempotencyKey, 'seed-desk-%'))
    .limit(1);
  if (done.length) return;
  const people = await db.select().from(users).where(inArray(users.driverNumber, DRIVERS));
  const [clerk] = await db.select().from(users).where(eq(users.email, 'clerk@bramblecrest.example'));
  // eight home-carrier reefers out on the road with no handoff yet (the gate's seed history runs
  // first and uses others), hauled power-only by outside carriers
  const fleet = await db
    .select()
    .from(trailers)
    .where(
      and(
        eq(trailers.status, 'on_road'),
        eq(trailers.kind, 'reefer'),
        like(trailers.unitNumber, 'R53%'),
        sql`not exists (select 1 from ${handoffs} where ${handoffs.trailerId} = ${trailers.id})`,
      ),
    )
    .orderBy(desc(trailers.unitNumber))
    .limit(DAMAGE.length);
  const pickable = fleet.reverse();
  const caseIds: string[] = [];
  for (const [k, t] of pickable.entries()) {
    const p = people.find((u) => u.driverNumber === DRIVERS[k % DRIVERS.length])!;
    const actor: HandoffActor = {
      id: p.id,
      role: 'driver',
      carrierId: p.carrierId,
      terminalId: p.homeTerminalId,
    };
    const ok = allOkObservations(checklistOf(t));
    const base = now.getTime() - (90 - k * 8) * DAY;
    const submit = async (
      kind: 'drop' | 'hook',
      at: number,
      items: Record<string, ItemObservationInput>,
      n: number,
    ) =>
      recordSeedHandoff(
        {
          idempotencyKey: `seed-desk-${t.unitNumber}-${n}`,
          trailerId: t.id,
          kind,
          carrierId: p.carrierId!,
          driverName: p.name,
          tractorNumber: `TR-${400 + k}`,
          isLoaded: false,
          sealNumber: null,
          fuelEighths: 8,
          reefer: {
            isUnitOn: true,
            setpointF: 34,
            returnAirF: 35,
            engineHours: 4000 + k * 50 + n * 8,
            preTripResult: 'pass',
            preTripAt: new Date(at - 3_600_000).toISOString(),
          },
          items,
          spotId: null,
          note: null,
        },
        actor,
        { now: new Date(at), sendReceipt: false },
      );
    const d = DAMAGE[k];
    await submit('drop', base, ok, 1);
    const beforePhoto = await demoPhoto(t.id, p.id, `${t.unitNumber}-before`, false, k);
    await submit(
      'hook',
      base + 2 * DAY,
      { ...ok, [d.itemKey]: { ...ok[d.itemKey], photoIds: [beforePhoto] } },
      2,
    );
    const afterPhoto = await demoPhoto(t.id, p.id, `${t.unitNumber}-after`, true, k);
    const { handoffId } = await submit(
      'drop',
      base + 4 * DAY,
      {
        ...ok,
        [d.itemKey]: {
          ...ok[d.itemKey],
          condition: d.condition,
          note: d.note,
          photoIds: [afterPhoto],
          ...(d.isInsulationShowing ? { isInsulationShowing: true } : {}),
        },
      },
      3,
    );
    // all but the first leave again an hour later, so the demo yard keeps free slots
    if (k > 0)
      await submit(
        'hook',
        base + 4 * DAY + 3_600_000,
        { ...ok, [d.itemKey]: { ...ok[d.itemKey], condition: d.condition, note: d.note } },
        4,
      );
    const [c] = await db.select({ id: cases.id }).from(cases).where(eq(cases.handoffId, handoffId));
    if (c) caseIds.push(c.id);
    // the case's first events are dated by the drop that opened it, not by when the seed ran
    if (c)
      await db
        .update(caseEvents)
        .set({ createdAt: new Date(base + 4 * DAY) })
        .where(eq(caseEvents.caseId, c.id));
  }
  for (const [i, id] of caseIds.entries())
    await priceNewCases(new Date(now.getTime() - (90 - i * 8) * DAY + 4 * DAY + 60_000), [id]);

  await walkDemoCases(
    caseIds,
    clerk.id,
    (i) => {
      const p = people.find((u) => u.driverNumber === DRIVERS[i % DRIVERS.length])!;
      return { id: p.id, role: 'driver', carrierId: p.carrierId };
    },
    (i, days) => new Date(now.getTime() - (90 - i * 8) * DAY + (4 + days) * DAY),
  );
  // the gate's seed history opens cases of its own: price them from the rate card too
  await priceNewCases(now);
}
