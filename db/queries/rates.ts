import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { db, type Db, type Tx } from '@/db';
import { rateCard } from '@/db/schema';
import type { RateCondition } from '@/lib/validation/desk';

export async function listRates() {
  return db
    .select({
      id: rateCard.id,
      itemPattern: rateCard.itemPattern,
      condition: rateCard.condition,
      amountCents: rateCard.amountCents,
    })
    .from(rateCard)
    .orderBy(asc(rateCard.itemPattern), asc(rateCard.condition));
}

/** Adds a rate; false when that pattern and condition already has one (change it instead). */
export async function addRate(
  rate: { itemPattern: string; condition: RateCondition; amountCents: number },
  tx: Tx | Db = db,
) {
  const rows = await tx.insert(rateCard).values(rate).onConflictDoNothing().returning({ id: rateCard.id });
  return rows.length > 0;
}

/** Changes a rate's amount; false when the rate no longer exists. */
export async function changeRate(id: string, amountCents: number, tx: Tx | Db = db) {
  const rows = await tx
    .update(rateCard)
    .set({ amountCents })
    .where(eq(rateCard.id, id))
    .returning({ id: rateCard.id });
  return rows.length > 0;
}
