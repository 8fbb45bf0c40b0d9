import 'server-only';
import { and, asc, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { carriers, labels, terminals, trailers, yardRows, yardSpots } from '@/db/schema';
import { recordAudit } from './audit';

/** Issues a label: one new row. Pass `tx` to issue inside a caller's transaction. */
export async function issueLabel(trailerId: string, issuedById: string | null, tx?: Tx) {
  const [row] = await (tx ?? db)
    .insert(labels)
    .values({ trailerId, issuedById })
    .returning({ id: labels.id, trailerId: labels.trailerId, issuedAt: labels.issuedAt });
  return row;
}

/**
 * Re-issues a trailer's label: revokes every unrevoked label of the trailer and issues a new one,
 * in one transaction under a row lock on the trailer (two re-issues cannot interleave), audit-logged.
 * Returns null when the trailer does not exist.
 */
export async function reissueLabel(trailerId: string, actorId: string) {
  return db.transaction(async (tx) => {
    const locked = await tx
      .select({ id: trailers.id })
      .from(trailers)
      .where(eq(trailers.id, trailerId))
      .for('update');
    if (locked.length === 0) return null;
    const now = new Date();
    const revoked = await tx
      .update(labels)
      .set({ revokedAt: now })
      .where(and(eq(labels.trailerId, trailerId), isNull(labels.revokedAt)))
      .returning({ id: labels.id });
    const label = await issueLabel(trailerId, actorId, tx);
    await recordAudit(
      {
        actorId,
        action: 'label.reissue',
        entityType: 'trailer',
        entityId: trailerId,
        detail: { labelId: label.id, revokedLabelIds: revoked.map((r) => r.id) },
      },
      tx,
    );
    return { label, revokedLabelIds: revoked.map((r) => r.id) };
  });
}

/** The trailer's current label: the newest unrevoked one, or null. */
export async function getCurrentLabel(trailerId: string, tx?: Tx) {
  const [row] = await (tx ?? db)
    .select({ id: labels.id, trailerId: labels.trailerId, issuedAt: labels.issuedAt })
    .from(labels)
    .where(and(eq(labels.trailerId, trailerId), isNull(labels.revokedAt)))
    .orderBy(desc(labels.issuedAt), desc(labels.createdAt))
    .limit(1);
  return row ?? null;
}

/**
 * A label as a scan needs it: whether it is still the trailer's current label and, if not,
 * when it was replaced (its revocation time, or the issue time of the label that superseded it).
 */
export async function getLabelStanding(labelId: string) {
  const [row] = await db
    .select({
      id: labels.id,
      trailerId: labels.trailerId,
      issuedAt: labels.issuedAt,
      revokedAt: labels.revokedAt,
    })
    .from(labels)
    .where(eq(labels.id, labelId))
    .limit(1);
  if (!row) return null;
  const current = await getCurrentLabel(row.trailerId);
  const isCurrent = row.revokedAt === null && current?.id === row.id;
  return { ...row, isCurrent, replacedAt: isCurrent ? null : (row.revokedAt ?? current?.issuedAt ?? null) };
}

const sheetColumns = {
  id: trailers.id,
  unitNumber: trailers.unitNumber,
  vin: trailers.vin,
  ownerScac: carriers.scac,
};

/**
 * The trailers a label sheet prints, each with its current label id; trailers without a current
 * label get one issued (under a row lock, so two sheets printed at once do not issue two).
 * A selection keeps unit-number order; a row keeps slot order.
 */
export async function prepareLabelSheet(
  query: { trailerIds: string[] } | { rowId: string },
  actorId: string,
) {
  const base = db
    .select({ ...sheetColumns, spotOrder: yardSpots.sortOrder })
    .from(trailers)
    .innerJoin(carriers, eq(carriers.id, trailers.ownerCarrierId));
  const rows =
    'rowId' in query
      ? await base
          .innerJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
          .where(eq(yardSpots.rowId, query.rowId))
          .orderBy(asc(yardSpots.sortOrder))
      : await base
          .leftJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
          .where(inArray(trailers.id, query.trailerIds))
          .orderBy(asc(trailers.unitNumber));
  if (rows.length === 0) return [];
  const labelIds = await db.transaction(async (tx) => {
    const ids = rows.map((r) => r.id);
    await tx
      .select({ id: trailers.id })
      .from(trailers)
      .where(inArray(trailers.id, ids))
      .orderBy(asc(trailers.id))
      .for('update');
    const found = new Map<string, string>();
    for (const id of ids) {
      const current = (await getCurrentLabel(id, tx)) ?? (await issueLabel(id, actorId, tx));
      found.set(id, current.id);
    }
    return found;
  });
  return rows.map(({ spotOrder: _spotOrder, ...r }) => ({ ...r, labelId: labelIds.get(r.id)! }));
}

/** Yard rows with how many trailers stand in each, for choosing a row to print. */
export async function listRowsForLabels() {
  return db
    .select({
      id: yardRows.id,
      name: yardRows.name,
      terminalName: terminals.name,
      trailerCount: sql<number>`count(${trailers.id})::int`,
    })
    .from(yardRows)
    .innerJoin(terminals, eq(terminals.id, yardRows.terminalId))
    .leftJoin(yardSpots, eq(yardSpots.rowId, yardRows.id))
    .leftJoin(trailers, eq(trailers.currentSpotId, yardSpots.id))
    .groupBy(yardRows.id, terminals.name)
    .orderBy(asc(terminals.name), asc(yardRows.sortOrder));
}

export async function getRowName(rowId: string) {
  const [row] = await db
    .select({ name: yardRows.name, terminalName: terminals.name })
    .from(yardRows)
    .innerJoin(terminals, eq(terminals.id, yardRows.terminalId))
    .where(eq(yardRows.id, rowId));
  return row ?? null;
}
