import 'server-only';
import { and, eq, isNull, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { labels, trailers } from '@/db/schema';
import { verifyLabelToken } from '@/lib/engine/identity/label-token';
import { classifyScanText } from '@/lib/yard/scan-text';

/**
 * The trailer a scanned or typed text names (current label link, VIN or unit number), or null.
 * A revoked or forged label names no trailer.
 */
export async function findTrailerIdByScan(text: string, tx: Tx | typeof db = db): Promise<string | null> {
  const target = classifyScanText(text);
  if (target.kind === 'label') {
    const secret = process.env.LABEL_SECRET;
    if (!secret || secret.length < 32) return null;
    const claims = verifyLabelToken(target.token, secret);
    if (!claims.ok) return null;
    const [label] = await tx
      .select({ trailerId: labels.trailerId })
      .from(labels)
      .where(and(eq(labels.id, claims.labelId), eq(labels.trailerId, claims.trailerId), isNull(labels.revokedAt)))
      .limit(1);
    return label?.trailerId ?? null;
  }
  const where = target.kind === 'vin'
    ? eq(trailers.vin, target.vin)
    : sql`upper(${trailers.unitNumber}) = ${target.unitNumber}`;
  const [row] = await tx.select({ id: trailers.id }).from(trailers).where(where).limit(1);
  return row?.id ?? null;
}
