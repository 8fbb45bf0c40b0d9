import 'server-only';
import { asc, eq, ilike, or, sql } from 'drizzle-orm';
import { db } from '@/db';
import { carriers, terminals, trailers, yardSpots } from '@/db/schema';

/** Trailers matching a unit number, VIN or plate fragment, with owner and where they stand. */
export async function listTrailers({
  q,
  limit = 50,
  offset = 0,
}: {
  q?: string;
  limit?: number;
  offset?: number;
}) {
  const pattern = q ? `%${q.replace(/[%_\\]/g, (c) => `\\${c}`)}%` : null;
  return db
    .select({
      id: trailers.id,
      unitNumber: trailers.unitNumber,
      vin: trailers.vin,
      kind: trailers.kind,
      status: trailers.status,
      ownerScac: carriers.scac,
      terminalCode: terminals.code,
      spotLabel: yardSpots.label,
    })
    .from(trailers)
    .innerJoin(carriers, eq(carriers.id, trailers.ownerCarrierId))
    .leftJoin(terminals, eq(terminals.id, trailers.currentTerminalId))
    .leftJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
    .where(
      pattern
        ? or(
            ilike(trailers.unitNumber, pattern),
            ilike(trailers.vin, pattern),
            ilike(trailers.plate, pattern),
          )
        : undefined,
    )
    .orderBy(asc(trailers.unitNumber))
    .limit(limit)
    .offset(offset);
}

export async function countTrailersByStatus(terminalId?: string | null) {
  return db
    .select({ status: trailers.status, count: sql<number>`count(*)::int` })
    .from(trailers)
    .where(terminalId ? eq(trailers.currentTerminalId, terminalId) : undefined)
    .groupBy(trailers.status);
}

/** One trailer as the gate start page shows it; null when unknown. */
export async function getTrailerForGate(id: string) {
  const [row] = await db
    .select({
      id: trailers.id,
      unitNumber: trailers.unitNumber,
      vin: trailers.vin,
      kind: trailers.kind,
      status: trailers.status,
      hingesPerDoor: trailers.hingesPerDoor,
      axleCount: trailers.axleCount,
      tireLayout: trailers.tireLayout,
      fuelTankGallons: trailers.fuelTankGallons,
      isLoaded: trailers.isLoaded,
      fuelEighths: trailers.fuelEighths,
      ownerName: carriers.name,
      ownerScac: carriers.scac,
      terminalName: terminals.name,
      spotLabel: yardSpots.label,
      gateInAt: trailers.gateInAt,
    })
    .from(trailers)
    .innerJoin(carriers, eq(carriers.id, trailers.ownerCarrierId))
    .leftJoin(terminals, eq(terminals.id, trailers.currentTerminalId))
    .leftJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
    .where(eq(trailers.id, id))
    .limit(1);
  return row ?? null;
}

/** Carriers for the clerk's carrier picker. */
export function listCarriers() {
  return db
    .select({ id: carriers.id, name: carriers.name, scac: carriers.scac })
    .from(carriers)
    .orderBy(asc(carriers.name));
}
