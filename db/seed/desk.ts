// Demo damage cases for the desk: eight outside-carrier trailers, each with a drop and hook all
// ok and then a drop with new damage, recorded through the gate's real submit service; the cases
// are then walked through the desk's own commands into every state, two of them disputed.
// Invented data only. Skips when it ran before (its idempotency keys start with "seed-desk-").
import { createHash } from 'node:crypto';
import { and, desc, eq, inArray, like, sql } from 'drizzle-orm';
import { PNG } from 'pngjs';
import { buildChecklist, type Checklist } from '@/lib/engine';
import { putObject } from '@/lib/server/storage';
import { recordSeedHandoff, type HandoffActor } from './submit';
import type { ItemObservationInput } from '@/lib/validation/handoffs';
import { priceNewCases, runCaseCommand } from '@/db/queries/case-commands';
import { db } from '@/db';
import { caseEvents, cases, handoffs, photos, trailers, users } from '@/db/schema';

import { allOkObservations } from '@/lib/handoffs/all-ok';

const DAY = 86_400_000;

const okItems = (checklist: Checklist) => allOkObservations(checklist);

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

/** An invented picture of a trailer panel: light grey skin with rivet lines; `isTorn` adds a dark tear. */
function panelPng(isTorn: boolean, shade: number): Uint8Array {
  const w = 320;
  const h = 200;
  const png = new PNG({ width: w, height: h });
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      const rivet = x % 40 < 2 || y % 50 < 2;
      const tear = isTorn && Math.abs(y - 60 - (x - 80) * 0.45) < 5 && x > 80 && x < 260;
      const v = tear ? 35 : rivet ? 150 : 205 + ((x + y + shade) % 7);
      png.data.set(tear ? [70, 40, 30, 255] : [v, v, v + 6, 255], (y * w + x) * 4);
    }
  }
  return PNG.sync.write(png);
}

async function demoPhoto(
  trailerId: string,
  uploadedById: string,
  key: string,
  isTorn: boolean,
  shade: number,
) {
  const bytes = panelPng(isTorn, shade);
  const objectKey = `photos/${trailerId}/seed-desk-${key}.png`;
  await putObject(objectKey, bytes, 'image/png');
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const [p] = await db
    .insert(photos)
    .values({
      objectKey,
      uploadedById,
      trailerId,
      status: 'stored',
      contentType: 'image/png',
      byteSize: bytes.length,
      sha256,
    })
    .returning({ id: photos.id });
  return p.id;
}

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
    const checklist = buildChecklist({
      kind: t.kind,
      hingesPerDoor: t.hingesPerDoor === 5 ? 5 : 4,
      axles: t.axleCount,
      tireLayout: t.tireLayout,
      fuelTankGallons: t.fuelTankGallons || undefined,
    });
    const ok = okItems(checklist);
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

  // Walk the cases through the desk: 0 open, 1 notified, 2 disputed, 3 charged, 4 shared after a
  // dispute, 5 absorbed without notice, 6 closed, 7 waived.
  const clerkActor = { id: clerk.id, role: 'clerk' as const, carrierId: null };
  const at = (i: number, days: number) => new Date(now.getTime() - (90 - i * 8) * DAY + (4 + days) * DAY);
  const step = (
    i: number,
    command: Parameters<typeof runCaseCommand>[0]['command'],
    days: number,
    actor: { id: string; role: 'clerk' | 'driver'; carrierId: string | null } = clerkActor,
  ) =>
    caseIds[i]
      ? runCaseCommand({
          caseId: caseIds[i],
          command,
          actor,
          now: at(i, days),
          appUrl: '',
          linkSecret: 'seed-sends-no-mail',
          sendEmail: false,
        })
      : null;
  const driverOf = (i: number) => {
    const p = people.find((u) => u.driverNumber === DRIVERS[i % DRIVERS.length])!;
    return { id: p.id, role: 'driver' as const, carrierId: p.carrierId };
  };
  for (const i of [1, 2, 3, 4, 6, 7]) await step(i, { kind: 'notify' }, 0.1);
  await step(
    2,
    {
      kind: 'dispute',
      note: 'Our driver photographed that side at the hook; the tear is not in our pictures.',
    },
    2,
    driverOf(2),
  );
  await step(
    3,
    {
      kind: 'decide',
      decision: 'charge',
      chargedCents: 95_000,
      reason: 'Unit door was ok at the hook and cracked at the drop; no dispute.',
    },
    15,
  );
  await step(4, { kind: 'dispute', note: 'The rail was already dented when we took it.' }, 3, driverOf(4));
  await step(
    4,
    {
      kind: 'decide',
      decision: 'share',
      chargedCents: 42_500,
      reason: 'Hook photo is unclear on the rail; split the repair.',
    },
    6,
  );
  await step(
    5,
    {
      kind: 'decide',
      decision: 'absorb',
      chargedCents: 0,
      reason: 'Yard tractor contact reported by our own jockey.',
    },
    1,
  );
  await step(
    6,
    { kind: 'decide', decision: 'charge', chargedCents: 85_000, reason: 'Clear before and after photos.' },
    15,
  );
  await step(6, { kind: 'close', note: 'Carrier paid.' }, 20);
  await step(
    7,
    {
      kind: 'decide',
      decision: 'waive',
      chargedCents: 0,
      reason: 'Long-standing customer; small repair done in house.',
    },
    5,
  );
  // the gate's seed history opens cases of its own: price them from the rate card too
  await priceNewCases(now);
}
