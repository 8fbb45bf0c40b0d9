// Test and benchmark helper: builds yard state of its own (a row with slots, trailers placed in
// it) so tests never depend on where the demo seed put anything. Plain Node: no server-only.
import { randomBytes } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import type { Db } from '../../db';
import type { Role } from '../../lib/auth/roles';
import { carriers, terminals, trailers, users, yardRows, yardSpots } from '../../db/schema';

export const uniqueTag = () => randomBytes(3).toString('hex').toUpperCase();

/** A 17-character fake VIN that cannot collide with the seed's (starts with "HMT"); not a valid check digit. */
const fakeVin = (tag: string, n: number) =>
  `HMT${tag.slice(0, 6).padEnd(6, '0')}${String(n).padStart(8, '0')}`;

export async function ensureTerminal(db: Db, code: string, timeZone = 'America/Chicago') {
  await db
    .insert(terminals)
    .values({ code, name: `${code} test terminal`, timeZone })
    .onConflictDoNothing();
  const [t] = await db.select({ id: terminals.id }).from(terminals).where(eq(terminals.code, code));
  return t.id;
}

export async function ensureCarrier(db: Db) {
  await db
    .insert(carriers)
    .values({ scac: 'HMTY', name: 'Hitchmark Test Yard Lines', contactEmail: 'yard@test.example' })
    .onConflictDoNothing();
  const [c] = await db.select({ id: carriers.id }).from(carriers).where(eq(carriers.scac, 'HMTY'));
  return c.id;
}

/** A user of the given role whose home terminal is `terminalId` (a jockey unless told otherwise). */
export async function createStaff(db: Db, terminalId: string, role: Role = 'jockey') {
  const tag = uniqueTag();
  const [u] = await db
    .insert(users)
    .values({
      name: `Test ${role} ${tag}`,
      role,
      email: `${role}-${tag}@test.example`,
      secretHash: 'x',
      homeTerminalId: terminalId,
    })
    .returning({ id: users.id });
  return u.id;
}

/** A new row of `slots` slots (maybe none) named `<rowName>-01…`; returns the row and slot ids in order. */
export async function createRowWithSlots(
  db: Db,
  terminalId: string,
  rowName: string,
  slots: number,
  sortOrder = 1000,
) {
  const [row] = await db
    .insert(yardRows)
    .values({ terminalId, name: rowName, sortOrder })
    .returning({ id: yardRows.id });
  if (slots === 0) return { rowId: row.id, spots: [] };
  const spots = await db
    .insert(yardSpots)
    .values(
      Array.from({ length: slots }, (_, i) => ({
        terminalId,
        rowId: row.id,
        kind: 'slot' as const,
        label: `${rowName.replace(/\s+/g, '')}-${String(i + 1).padStart(2, '0')}`,
        sortOrder: i,
      })),
    )
    .returning({ id: yardSpots.id, label: yardSpots.label });
  return { rowId: row.id, spots };
}

/** Places new reefer trailers in the given spots (null: create the trailer but leave it on the road). */
export async function placeTrailers(
  db: Db,
  terminalId: string,
  tag: string,
  spots: (string | null)[],
  over: Partial<typeof trailers.$inferInsert> = {},
) {
  const carrierId = await ensureCarrier(db);
  const now = Date.now();
  return db
    .insert(trailers)
    .values(
      spots.map((spotId, i) => ({
        unitNumber: `T${tag}${String(i + 1).padStart(2, '0')}`,
        vin: fakeVin(tag, i + 1),
        plate: `TST${i}`,
        plateState: 'IL',
        kind: 'reefer' as const,
        ownerCarrierId: carrierId,
        status: spotId ? ('in_yard' as const) : ('on_road' as const),
        currentTerminalId: spotId ? terminalId : null,
        currentSpotId: spotId,
        isLoaded: true,
        fuelEighths: 6,
        isReeferOn: true,
        setpointTenthsF: 340,
        gateInAt: new Date(now - (i + 1) * 3_600_000),
        lastSeenAt: new Date(now - (i + 1) * 3_600_000),
        ...over,
      })),
    )
    .returning({ id: trailers.id, unitNumber: trailers.unitNumber });
}

export async function spotIdByLabel(db: Db, terminalId: string, label: string) {
  const [s] = await db
    .select({ id: yardSpots.id })
    .from(yardSpots)
    .where(and(eq(yardSpots.terminalId, terminalId), eq(yardSpots.label, label)));
  return s?.id ?? null;
}

/**
 * Removes what the helpers above made in one terminal (walks, moves, tasks, trailers of the test
 * carrier, rows and slots) so other test files see the seeded data alone. Users and audit entries
 * stay: the audit log is append-only and refers to its actors.
 */
export async function removeTestYard(db: Db, terminalId: string) {
  const { labels, walkOutcomes, walkScans, yardMoves, yardTasks, yardWalks } =
    await import('../../db/schema');
  const { inArray } = await import('drizzle-orm');
  const carrierId = await ensureCarrier(db);
  const own = (
    await db.select({ id: trailers.id }).from(trailers).where(eq(trailers.ownerCarrierId, carrierId))
  ).map((t) => t.id);
  const walks = (
    await db.select({ id: yardWalks.id }).from(yardWalks).where(eq(yardWalks.terminalId, terminalId))
  ).map((w) => w.id);
  if (walks.length) {
    await db.delete(walkOutcomes).where(inArray(walkOutcomes.walkId, walks));
    await db.delete(walkScans).where(inArray(walkScans.walkId, walks));
  }
  await db.delete(yardTasks).where(eq(yardTasks.terminalId, terminalId));
  if (walks.length) await db.delete(yardWalks).where(inArray(yardWalks.id, walks));
  await db.delete(yardMoves).where(eq(yardMoves.terminalId, terminalId));
  if (own.length) {
    await db.delete(labels).where(inArray(labels.trailerId, own));
    await db.delete(trailers).where(inArray(trailers.id, own));
  }
  await db.delete(yardSpots).where(eq(yardSpots.terminalId, terminalId));
  await db.delete(yardRows).where(eq(yardRows.terminalId, terminalId));
}
