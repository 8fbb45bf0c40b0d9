import 'server-only';
import { asc, eq, inArray, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import { handoffItems, handoffs, photos } from '@/db/schema';
import type { ChainRecord } from '@/lib/handoffs/chain';

/** A trailer's handoffs as stored, oldest first (as the submit links them), with their items and photos. */
export async function listChainRecords(trailerId: string): Promise<ChainRecord[]> {
  return (await chainsWhere(eq(handoffs.trailerId, trailerId))).get(trailerId) ?? [];
}

/** The chains of every trailer with a handoff recorded at the terminal, by trailer (three queries). */
export async function listTerminalChains(terminalId: string): Promise<Map<string, ChainRecord[]>> {
  const atTerminal = db
    .selectDistinct({ trailerId: handoffs.trailerId })
    .from(handoffs)
    .where(eq(handoffs.terminalId, terminalId));
  return chainsWhere(inArray(handoffs.trailerId, atTerminal));
}

/** The chains of the given trailers, by trailer. */
export async function listChainsOf(trailerIds: string[]): Promise<Map<string, ChainRecord[]>> {
  if (!trailerIds.length) return new Map();
  return chainsWhere(inArray(handoffs.trailerId, trailerIds));
}

/** The records matching `where`, by trailer, each trailer's oldest first (three queries). */
async function chainsWhere(where: SQL): Promise<Map<string, ChainRecord[]>> {
  const rows = await db
    .select()
    .from(handoffs)
    .where(where)
    .orderBy(asc(handoffs.trailerId), asc(handoffs.occurredAt), asc(handoffs.createdAt));
  const chains = new Map<string, ChainRecord[]>();
  if (!rows.length) return chains;
  const ids = rows.map((r) => r.id);
  const [items, pics] = await Promise.all([
    db.select().from(handoffItems).where(inArray(handoffItems.handoffId, ids)),
    db
      .select({ handoffId: photos.handoffId, sha256: photos.sha256, status: photos.status })
      .from(photos)
      .where(inArray(photos.handoffId, ids)),
  ]);
  const itemsOf = groupBy(items, (i) => i.handoffId);
  const photosOf = groupBy(pics, (p) => p.handoffId ?? '');
  for (const row of rows) {
    const list = chains.get(row.trailerId) ?? [];
    list.push({ row, items: itemsOf.get(row.id) ?? [], photos: photosOf.get(row.id) ?? [] });
    chains.set(row.trailerId, list);
  }
  return chains;
}

// (Map.groupBy needs Node 21)
function groupBy<T>(list: T[], key: (t: T) => string): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const t of list) {
    const k = key(t);
    const group = out.get(k);
    if (group) group.push(t);
    else out.set(k, [t]);
  }
  return out;
}
