import 'server-only';
import { asc, eq, inArray } from 'drizzle-orm';
import { db } from '@/db';
import { handoffItems, handoffs, photos } from '@/db/schema';
import { hashableFromRows } from '@/lib/handoffs/canonical';
import { verifyChain, type ChainLink } from '@/lib/handoffs/hash';

/** A trailer's handoffs as hash-chain links, oldest first, recomputed from the stored rows. */
export async function listChainLinks(trailerId: string): Promise<ChainLink[]> {
  const rows = await db
    .select()
    .from(handoffs)
    .where(eq(handoffs.trailerId, trailerId))
    .orderBy(asc(handoffs.occurredAt), asc(handoffs.createdAt));
  if (!rows.length) return [];
  const ids = rows.map((r) => r.id);
  const items = await db.select().from(handoffItems).where(inArray(handoffItems.handoffId, ids));
  const shas = await db
    .select({ handoffId: photos.handoffId, sha256: photos.sha256 })
    .from(photos)
    .where(inArray(photos.handoffId, ids));
  return rows.map((r) => ({
    id: r.id,
    storedHash: r.contentHash,
    storedPrevHash: r.prevHash,
    recomputed: hashableFromRows(
      r,
      items.filter((i) => i.handoffId === r.id),
      shas.filter((p) => p.handoffId === r.id).map((p) => p.sha256),
    ),
  }));
}

/** Whether a trailer's stored handoffs still match their hashes and links. */
export async function checkTrailerChain(trailerId: string) {
  return verifyChain(await listChainLinks(trailerId));
}
