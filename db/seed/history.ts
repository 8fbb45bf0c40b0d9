// Where the demo trailers stand now: most in the two yards, the rest out on the road, and weeks
// of handoff history for a sixth of them (db/seed/handoffs.ts, through the real submit service).
// Runs once (skips when any trailer is already in a yard).
import { and, asc, eq, isNotNull } from 'drizzle-orm';
import { db } from '@/db';
import { trailers, yardSpots } from '@/db/schema';
import { seedHandoffs, type HandoffPlan } from './handoffs';

const HOUR = 3_600_000;

export async function seedHistory({
  terminalIds,
}: {
  terminalIds: Record<string, string>;
  carrierIds: Record<string, string>;
}) {
  const placed = await db
    .select({ id: trailers.id })
    .from(trailers)
    .where(isNotNull(trailers.currentSpotId))
    .limit(1);
  if (placed.length) return;
  const all = await db.select().from(trailers).orderBy(asc(trailers.unitNumber));
  const now = Date.now();
  const plans: HandoffPlan[] = [];
  let next = 0;
  for (const [code, share] of [
    ['RVB', 130],
    ['HMS', 50],
  ] as const) {
    const spots = await db
      .select({ id: yardSpots.id })
      .from(yardSpots)
      .where(and(eq(yardSpots.terminalId, terminalIds[code]), eq(yardSpots.kind, 'slot')))
      .orderBy(asc(yardSpots.label));
    for (let i = 0; i < share && i < spots.length; i++, next++) {
      const t = all[next];
      // deterministic spread of dwell (2–140 h) and fuel so the board has something to sort by
      const dwellHours = 2 + ((next * 37) % 139);
      if (next % 6 === 0) {
        // dropped through Hitchmark: the drop picks a free slot after the direct placements below
        plans.push({
          trailer: t,
          terminalId: terminalIds[code],
          endsInYard: true,
          finalAt: new Date(now - dwellHours * HOUR),
          cycles: 1 + (next % 2),
          index: next,
        });
        continue;
      }
      await db
        .update(trailers)
        .set({
          status: 'in_yard',
          currentTerminalId: terminalIds[code],
          currentSpotId: spots[(i * 7) % spots.length].id,
          isLoaded: next % 3 === 0,
          fuelEighths: t.kind === 'reefer' ? 2 + (next % 7) : null,
          isReeferOn: t.kind === 'reefer' ? next % 3 === 0 : null,
          setpointTenthsF: t.kind === 'reefer' && next % 3 === 0 ? [340, -100, 0, 350][next % 4] : null,
          gateInAt: new Date(now - dwellHours * HOUR),
          lastSeenAt: new Date(now - (dwellHours % 9) * HOUR),
        })
        .where(eq(trailers.id, t.id));
    }
  }
  // a fifth of the trailers on the road were hooked through Hitchmark, outside carriers' units among them
  for (let k = next; k < all.length; k += 5) {
    plans.push({
      trailer: all[k],
      terminalId: terminalIds[k % 2 ? 'HMS' : 'RVB'],
      endsInYard: false,
      finalAt: new Date(now - (5 + (k % 90)) * HOUR),
      cycles: 1 + (k % 3),
      index: k,
    });
  }
  await seedHandoffs(plans);
}
