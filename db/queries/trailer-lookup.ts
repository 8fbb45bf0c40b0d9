import 'server-only';
import { eq, sql, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import { carriers, trailers } from '@/db/schema';

/** What a scan or a typed lookup answers: enough to start a handoff, nothing private. */
async function findOne(where: SQL) {
  const [row] = await db
    .select({
      id: trailers.id,
      unitNumber: trailers.unitNumber,
      vin: trailers.vin,
      kind: trailers.kind,
      ownerScac: carriers.scac,
      status: trailers.status,
    })
    .from(trailers)
    .innerJoin(carriers, eq(carriers.id, trailers.ownerCarrierId))
    .where(where)
    .limit(1);
  return row ?? null;
}
export type LookedUpTrailer = NonNullable<Awaited<ReturnType<typeof findOne>>>;

export const getTrailerById = (id: string) => findOne(eq(trailers.id, id));
/** Unit numbers match without regard to case (typed on a phone). */
export const getTrailerByUnit = (unit: string) =>
  findOne(sql`upper(${trailers.unitNumber}) = ${unit.toUpperCase()}`);
/** Expects a VIN already normalised (upper case, 17 characters). */
export const getTrailerByVin = (vin: string) => findOne(eq(trailers.vin, vin));
