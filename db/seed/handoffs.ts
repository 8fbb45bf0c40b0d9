// Weeks of demo handoff history, recorded through the real submit service with `now` in the
// past, so findings, holds, cases and the hash chain are the engine's own.
// Invented scenario: home drivers run most trips; outside carriers' drivers run some, and a few
// of their trips bring back new damage (→ cases); a few final drops find a pin not engaged or a
// flat spare (→ holds). Photos are small generated PNGs stored in the object storage fake.
import { inArray } from 'drizzle-orm';
import { db } from '@/db';
import { trailers, users } from '@/db/schema';
import type { Checklist } from '@/lib/engine';
import { allOkObservations } from '@/lib/handoffs/all-ok';
import { checklistOf } from '@/lib/trailers/checklist';
import type { ItemObservationInput } from '@/lib/validation/handoffs';
import { demoPng, storeDemoPhoto } from './photos';
import { recordSeedHandoff, type HandoffActor } from './submit';

const HOUR = 3_600_000;
type TrailerRow = typeof trailers.$inferSelect;
type Driver = HandoffActor & { name: string; driverNumber: string };

const allOk = (checklist: Checklist) => allOkObservations(checklist, (key) => 8 + (key.length % 5));

const DAMAGE: { key: string; obs: ItemObservationInput }[] = [
  {
    key: 'left_side.skin',
    obs: {
      condition: 'damaged',
      isInsulationShowing: true,
      note: 'Skin torn about 40 cm behind the landing gear; insulation showing.',
    },
  },
  {
    key: 'rear.door_right.hinge_2',
    obs: { condition: 'damaged', isLocking: false, note: 'Hinge bent, door does not close flush.' },
  },
  {
    key: 'interior.floor',
    obs: { condition: 'damaged', note: 'Crack across two floor boards near the nose.' },
  },
  {
    key: 'undercarriage.landing_gear.cross_shaft',
    obs: { condition: 'damaged', note: 'Cross shaft bent; crank is stiff.' },
  },
  {
    key: 'right_side.side_skirt',
    obs: { condition: 'damaged', note: 'Side skirt torn loose at two brackets.' },
  },
];

function input(
  t: TrailerRow,
  d: Driver,
  kind: 'drop' | 'hook',
  n: number,
  at: Date,
  items: Record<string, ItemObservationInput>,
) {
  const isReefer = t.kind === 'reefer';
  return {
    idempotencyKey: `seed-${t.unitNumber}-${n}`,
    trailerId: t.id,
    kind,
    carrierId: d.carrierId!,
    driverName: d.name,
    tractorNumber: `T${4100 + ((n * 13 + t.unitNumber.length * 7) % 500)}`,
    isLoaded: n % 3 === 0,
    sealNumber: n % 3 === 0 ? `SL${(t.unitNumber.charCodeAt(2) * 1000 + n) % 999999}` : null,
    fuelEighths: isReefer ? (n % 5 === 4 ? 6 : 8) : null,
    reefer: isReefer
      ? {
          isUnitOn: n % 3 === 0,
          setpointF: n % 3 === 0 ? 34 : null,
          returnAirF: n % 3 === 0 ? 35.5 : null,
          engineHours: 8000 + n * 12,
          preTripResult: 'pass' as const,
          preTripAt: new Date(at.getTime() - 2 * HOUR).toISOString(),
        }
      : null,
    items,
    spotId: null,
    note: null,
  };
}

export type HandoffPlan = {
  trailer: TrailerRow;
  terminalId: string;
  endsInYard: boolean;
  finalAt: Date;
  cycles: number;
  index: number;
};

/**
 * Records each plan's history oldest first: alternating drops and hooks, ending with a drop
 * (trailer in the yard) or a hook (on the road). Returns how many handoffs were recorded.
 */
export async function seedHandoffs(plans: HandoffPlan[]): Promise<number> {
  const rows = await db
    .select()
    .from(users)
    .where(
      inArray(users.driverNumber, ['D1001', 'D1002', 'D1003', 'D1004', 'D2001', 'D2002', 'D3001', 'D4001']),
    );
  const drivers = new Map(
    rows.map((u) => [
      u.driverNumber!,
      {
        id: u.id,
        role: u.role,
        carrierId: u.carrierId,
        terminalId: u.homeTerminalId,
        name: u.name,
        driverNumber: u.driverNumber!,
      },
    ]),
  );
  const home = ['D1001', 'D1002', 'D1003', 'D1004'].map((n) => drivers.get(n)!);
  const outside = ['D2001', 'D2002', 'D3001', 'D4001'].map((n) => drivers.get(n)!);
  let count = 0;
  for (const [j, p] of plans.entries()) {
    const t = p.trailer;
    const checklist = checklistOf(t);
    const events = p.endsInYard ? 2 * p.cycles + 1 : 2 * p.cycles;
    // times backwards from the final event: yard stays of 10–60 h, trips of 30–100 h
    const times: Date[] = [p.finalAt];
    for (let k = events - 2; k >= 0; k--) {
      const isDropNext = (k + 1) % 2 === 0;
      const gap = isDropNext ? 30 + ((p.index * 17 + k * 7) % 70) : 10 + ((p.index * 13 + k * 5) % 50);
      times.unshift(new Date(times[0].getTime() - gap * HOUR));
    }
    const isDamageTrip = p.endsInYard && j % 5 === 1;
    for (let n = 0; n < events; n++) {
      const kind = n % 2 === 0 ? 'drop' : 'hook';
      const isLast = n === events - 1;
      // a trip is one carrier's: the hook at n and the drop at n + 1 share a driver
      const trip = Math.floor((n + 1) / 2);
      const isLastTrip = n >= events - 2 && p.endsInYard;
      const driver =
        (isLastTrip && isDamageTrip) || (p.index + trip) % 5 === 0
          ? outside[(p.index + trip) % 4]
          : home[(p.index + trip) % 4];
      const actor = { ...driver, terminalId: p.terminalId };
      const items = allOk(checklist);
      if (isLast && kind === 'drop') {
        if (isDamageTrip) {
          const d = DAMAGE[Math.floor(j / 5) % DAMAGE.length];
          if (items[d.key]) {
            const photo = {
              trailerId: t.id,
              uploadedById: driver.id,
              itemKey: d.key,
              name: `seed-${p.index}`,
            };
            items[d.key] = { ...d.obs, photoIds: [await storeDemoPhoto(photo, demoPng(p.index))] };
          }
        } else if (j % 11 === 3) {
          items['undercarriage.tandem_pin.right_rear'] = { condition: 'ok', isEngaged: false };
        } else if (j % 11 === 7) {
          items['undercarriage.spare_tire'] = {
            condition: 'ok',
            isMounted: true,
            isHoldingAir: false,
            note: 'Spare flat.',
          };
        }
      }
      await recordSeedHandoff(input(t, actor, kind, n, times[n], items), actor, {
        now: times[n],
        sendReceipt: false,
        isBulk: true,
      });
      count++;
    }
  }
  return count;
}
