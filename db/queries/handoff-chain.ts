import 'server-only';
import { asc, eq, inArray } from 'drizzle-orm';
import { db } from '@/db';
import { handoffItems, handoffs, photos } from '@/db/schema';
import type { ChainRecord } from '@/lib/handoffs/chain';

/** A trailer's handoffs as stored, oldest first (as the submit links them), with their items and photos. */
export async function listChainRecords(trailerId: string): Promise<ChainRecord[]> {
  const rows = await db
    .select()
    .from(handoffs)
    .where(eq(handoffs.trailerId, trailerId))
    .orderBy(asc(handoffs.occurredAt), asc(handoffs.createdAt));
  if (!rows.length) return [];
  const ids = rows.map((r) => r.id);
  const [items, pics] = await Promise.all([
    db.select().from(handoffItems).where(inArray(handoffItems.handoffId, ids)),
    db
      .select({ handoffId: photos.handoffId, sha256: photos.sha256, status: photos.status })
      .from(photos)
      .where(inArray(photos.handoffId, ids)),
  ]);
  return rows.map((row) => ({
    row,
    items: items.filter((i) => i.handoffId === row.id),
    photos: pics.filter((p) => p.handoffId === row.id),
  }));
}
