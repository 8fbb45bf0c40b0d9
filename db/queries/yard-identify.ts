import 'server-only';
import { sql, eq } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { trailers } from '@/db/schema';
import { resolveLabelToken } from '@/lib/server/labels';
import { classifyScanText } from '@/lib/yard/scan-text';

/**
 * The trailer a scanned or typed text names (current label link, VIN or unit number), or null.
 * A replaced or forged label names no trailer (it shows as unknown in a walk).
 */
export async function findTrailerIdByScan(text: string, tx: Tx | typeof db = db): Promise<string | null> {
  const target = classifyScanText(text);
  if (target.kind === 'label') {
    const label = await resolveLabelToken(target.token);
    return label.ok ? label.trailerId : null;
  }
  const where =
    target.kind === 'vin'
      ? eq(trailers.vin, target.vin)
      : sql`upper(${trailers.unitNumber}) = ${target.unitNumber}`;
  const [row] = await tx.select({ id: trailers.id }).from(trailers).where(where).limit(1);
  return row?.id ?? null;
}
