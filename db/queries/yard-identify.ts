import 'server-only';
import { eq, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { trailers } from '@/db/schema';

/** The trailer with this VIN, or null. */
export async function findTrailerIdByVin(vin: string, tx: Tx | typeof db = db): Promise<string | null> {
  const [row] = await tx.select({ id: trailers.id }).from(trailers).where(eq(trailers.vin, vin)).limit(1);
  return row?.id ?? null;
}

/** The trailer whose unit number, upper-cased, is `unitNumber` (already upper case), or null. */
export async function findTrailerIdByUnit(
  unitNumber: string,
  tx: Tx | typeof db = db,
): Promise<string | null> {
  const [row] = await tx
    .select({ id: trailers.id })
    .from(trailers)
    .where(sql`upper(${trailers.unitNumber}) = ${unitNumber}`)
    .limit(1);
  return row?.id ?? null;
}
