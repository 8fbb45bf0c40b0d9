import 'server-only';
import { and, desc, eq, inArray, isNull } from 'drizzle-orm';
import type { Db, Tx } from '@/db';
import {
  carriers,
  handoffs,
  holds,
  photos,
  policies,
  terminals,
  trailers,
  users,
  yardSpots,
} from '@/db/schema';

// What the handoff submit reads. Inside its transaction all queries share one connection, so
// the service runs them one after another.

/** The trailer row, locked for the transaction. NOWAIT: a row another transaction holds throws 55P03. */
export async function lockTrailer(tx: Tx, trailerId: string, opts: { noWait: boolean }) {
  const [row] = await tx
    .select()
    .from(trailers)
    .where(eq(trailers.id, trailerId))
    .for('update', opts.noWait ? { noWait: true } : {});
  return row ?? null;
}

export async function findHandoffByKey(q: Db | Tx, idempotencyKey: string) {
  const [row] = await q
    .select({
      id: handoffs.id,
      code: handoffs.verificationCode,
      trailerId: handoffs.trailerId,
      recordedById: handoffs.recordedById,
      requestHash: handoffs.requestHash,
    })
    .from(handoffs)
    .where(eq(handoffs.idempotencyKey, idempotencyKey))
    .limit(1);
  return row ?? null;
}
export type HandoffByKey = NonNullable<Awaited<ReturnType<typeof findHandoffByKey>>>;

export async function getTerminal(tx: Tx, id: string) {
  const [row] = await tx.select().from(terminals).where(eq(terminals.id, id));
  return row ?? null;
}

export async function getCarrier(tx: Tx, id: string) {
  const [row] = await tx.select().from(carriers).where(eq(carriers.id, id));
  return row ?? null;
}

/** The terminal's stored policy document, or null when it has none. */
export async function getPolicyData(tx: Tx, terminalId: string) {
  const [row] = await tx
    .select({ data: policies.data })
    .from(policies)
    .where(eq(policies.terminalId, terminalId));
  return row?.data ?? null;
}

export function listOpenHoldRows(tx: Tx, trailerId: string) {
  return tx
    .select()
    .from(holds)
    .where(and(eq(holds.trailerId, trailerId), isNull(holds.releasedAt)));
}
export type OpenHoldRow = Awaited<ReturnType<typeof listOpenHoldRows>>[number];

/** Of `ids`, the photos stored for this trailer by this uploader and not yet part of a record. */
export async function listUnattachedPhotos(
  tx: Tx,
  ids: string[],
  by: { trailerId: string; uploadedById: string },
) {
  if (!ids.length) return [];
  return tx
    .select({ id: photos.id, sha256: photos.sha256 })
    .from(photos)
    .where(
      and(
        inArray(photos.id, ids),
        eq(photos.trailerId, by.trailerId),
        eq(photos.status, 'stored'),
        isNull(photos.handoffId),
        eq(photos.uploadedById, by.uploadedById),
      ),
    );
}

/** The handoff a correction names, with what the correction rules read; null when none has this id. */
export async function getHandoffForCorrection(tx: Tx, id: string) {
  const [row] = await tx
    .select({
      id: handoffs.id,
      trailerId: handoffs.trailerId,
      terminalId: handoffs.terminalId,
      kind: handoffs.kind,
      recordedById: handoffs.recordedById,
      occurredAt: handoffs.occurredAt,
    })
    .from(handoffs)
    .where(eq(handoffs.id, id));
  return row ?? null;
}

/** The verification code of a record that corrects `id`, or null. */
export async function findCorrectionOf(tx: Tx, id: string): Promise<string | null> {
  const [row] = await tx
    .select({ code: handoffs.verificationCode })
    .from(handoffs)
    .where(eq(handoffs.correctsHandoffId, id))
    .limit(1);
  return row?.code ?? null;
}

/** The id of the trailer's latest handoff (the chain's head), or null. */
export async function latestHandoffId(tx: Tx, trailerId: string): Promise<string | null> {
  const [row] = await tx
    .select({ id: handoffs.id })
    .from(handoffs)
    .where(eq(handoffs.trailerId, trailerId))
    .orderBy(desc(handoffs.occurredAt), desc(handoffs.createdAt))
    .limit(1);
  return row?.id ?? null;
}

/** The content hash of the trailer's latest handoff: the next one links to it. */
export async function latestContentHash(tx: Tx, trailerId: string): Promise<string | null> {
  const [row] = await tx
    .select({ contentHash: handoffs.contentHash })
    .from(handoffs)
    .where(eq(handoffs.trailerId, trailerId))
    .orderBy(desc(handoffs.occurredAt), desc(handoffs.createdAt))
    .limit(1);
  return row?.contentHash ?? null;
}

/** The e-mail address (null when none is kept) and language of one account. */
export async function getUserMailbox(tx: Tx, userId: string) {
  const [row] = await tx
    .select({ email: users.email, locale: users.locale })
    .from(users)
    .where(eq(users.id, userId));
  return row?.email ? { email: row.email, locale: row.locale } : null;
}

export async function getSpotLabel(tx: Tx, spotId: string): Promise<string | null> {
  const [row] = await tx.select({ label: yardSpots.label }).from(yardSpots).where(eq(yardSpots.id, spotId));
  return row?.label ?? null;
}
