import 'server-only';
import { asc, eq } from 'drizzle-orm';
import { db } from '@/db';
import { rateCard } from '@/db/schema';

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
export async function addRate(rate: {
  itemPattern: string;
  condition: 'minor' | 'damaged' | 'unsafe' | 'missing';
  amountCents: number;
}) {
  const rows = await db.insert(rateCard).values(rate).onConflictDoNothing().returning({ id: rateCard.id });
  return rows.length > 0;
}

export async function changeRate(id: string, amountCents: number) {
  const rows = await db
    .update(rateCard)
    .set({ amountCents })
    .where(eq(rateCard.id, id))
    .returning({ id: rateCard.id });
  return rows.length > 0;
}
