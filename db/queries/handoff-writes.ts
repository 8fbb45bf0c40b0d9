import 'server-only';
import { eq, inArray, sql } from 'drizzle-orm';
import type { Tx } from '@/db';
import {
  caseEvents,
  cases,
  findings,
  handoffItems,
  handoffs,
  holds,
  photos,
  trailerCondition,
  trailers,
} from '@/db/schema';

// The rows a handoff submit writes, one function per table. The service decides what and in
// which order; these only write.

type Insert<T extends { $inferInsert: unknown }> = T['$inferInsert'];

/** The demo seed records hundreds of handoffs in a row: waiting for each commit's disk flush would take most of its time. */
export async function skipCommitFlush(tx: Tx) {
  await tx.execute(sql`set local synchronous_commit = off`);
}

export async function insertHandoff(tx: Tx, row: Insert<typeof handoffs>) {
  await tx.insert(handoffs).values(row);
}

export async function insertHandoffItems(tx: Tx, rows: Insert<typeof handoffItems>[]) {
  if (rows.length) await tx.insert(handoffItems).values(rows);
}

/** Attaches each item's photos to the handoff. */
export async function attachPhotos(tx: Tx, handoffId: string, byItem: Map<string, string[]>) {
  for (const [itemKey, ids] of byItem) {
    await tx.update(photos).set({ handoffId, itemKey }).where(inArray(photos.id, ids));
  }
}

/** A new damage case in state `open` and its `opened` event; returns the case id. */
export async function insertOpenedCase(
  tx: Tx,
  row: Omit<Insert<typeof cases>, 'state'>,
  event: { actorId: string; note: string },
): Promise<string> {
  const [c] = await tx
    .insert(cases)
    .values({ ...row, state: 'open' })
    .returning({ id: cases.id });
  await tx.insert(caseEvents).values({ caseId: c.id, kind: 'opened', toState: 'open', ...event });
  return c.id;
}

/** The trailer's current condition: these items were last observed by this handoff. */
export async function recordCurrentCondition(
  tx: Tx,
  x: { trailerId: string; handoffId: string; observedAt: Date },
  items: { itemKey: string; condition: Insert<typeof trailerCondition>['condition'] }[],
) {
  if (!items.length) return;
  await tx
    .insert(trailerCondition)
    .values(items.map((i) => ({ ...x, itemKey: i.itemKey, condition: i.condition })))
    .onConflictDoUpdate({
      target: [trailerCondition.trailerId, trailerCondition.itemKey],
      set: {
        handoffId: sql`excluded.handoff_id`,
        observedAt: sql`excluded.observed_at`,
        condition: sql`excluded.condition`,
      },
    });
}

export async function insertFindings(tx: Tx, rows: Insert<typeof findings>[]) {
  if (rows.length) await tx.insert(findings).values(rows);
}

export async function insertHolds(tx: Tx, rows: Insert<typeof holds>[]) {
  if (rows.length) await tx.insert(holds).values(rows);
}

export async function updateTrailer(tx: Tx, trailerId: string, values: Partial<Insert<typeof trailers>>) {
  await tx.update(trailers).set(values).where(eq(trailers.id, trailerId));
}
