import 'server-only';
import { and, asc, eq, isNull, sql } from 'drizzle-orm';
import { db } from '@/db';
import { trailers, yardRows, yardSpots } from '@/db/schema';
import { refuse, type Refusal } from '@/lib/yard/result';
import { recordAudit } from './audit';

type Ok = { ok: true; id: string };

function isUniqueViolation(e: unknown): boolean {
  const cause = (e as { cause?: { code?: string } })?.cause ?? (e as { code?: string });
  return cause?.code === '23505';
}

/** Rows and live or retired spots of one terminal, in layout order, with each spot's occupant. */
export async function listLayout(terminalId: string) {
  const [rows, spots] = await Promise.all([
    db
      .select({ id: yardRows.id, name: yardRows.name })
      .from(yardRows)
      .where(eq(yardRows.terminalId, terminalId))
      .orderBy(asc(yardRows.sortOrder), asc(yardRows.name)),
    db
      .select({
        id: yardSpots.id,
        label: yardSpots.label,
        kind: yardSpots.kind,
        rowId: yardSpots.rowId,
        retiredAt: yardSpots.retiredAt,
        occupant: trailers.unitNumber,
      })
      .from(yardSpots)
      .leftJoin(trailers, eq(trailers.currentSpotId, yardSpots.id))
      .where(eq(yardSpots.terminalId, terminalId))
      .orderBy(asc(yardSpots.sortOrder), asc(yardSpots.label)),
  ]);
  return { rows, spots };
}

export async function createRow(terminalId: string, actorId: string, name: string): Promise<Ok | Refusal> {
  try {
    const [max] = await db
      .select({ n: sql<number>`coalesce(max(${yardRows.sortOrder}), -1)::int` })
      .from(yardRows)
      .where(eq(yardRows.terminalId, terminalId));
    const [row] = await db
      .insert(yardRows)
      .values({ terminalId, name, sortOrder: max.n + 1 })
      .returning({ id: yardRows.id });
    await recordAudit({
      actorId,
      action: 'yard.row_created',
      entityType: 'yard_row',
      entityId: row.id,
      detail: { name },
    });
    return { ok: true, id: row.id };
  } catch (e) {
    if (isUniqueViolation(e)) return refuse('conflict', `A row named ${name} already exists.`, 'name');
    throw e;
  }
}

export async function renameRow(
  terminalId: string,
  actorId: string,
  id: string,
  name: string,
): Promise<Ok | Refusal> {
  try {
    const [row] = await db
      .update(yardRows)
      .set({ name })
      .where(and(eq(yardRows.id, id), eq(yardRows.terminalId, terminalId)))
      .returning({ id: yardRows.id });
    if (!row) return refuse('not_found', 'No such row in this yard.');
    await recordAudit({
      actorId,
      action: 'yard.row_renamed',
      entityType: 'yard_row',
      entityId: id,
      detail: { name },
    });
    return { ok: true, id };
  } catch (e) {
    if (isUniqueViolation(e)) return refuse('conflict', `A row named ${name} already exists.`, 'name');
    throw e;
  }
}

export async function createSpot(
  terminalId: string,
  actorId: string,
  input: { kind: 'slot' | 'door'; rowId?: string; label: string },
): Promise<Ok | Refusal> {
  const rowId = input.kind === 'slot' ? (input.rowId ?? null) : null;
  if (rowId) {
    const [row] = await db
      .select({ id: yardRows.id })
      .from(yardRows)
      .where(and(eq(yardRows.id, rowId), eq(yardRows.terminalId, terminalId)));
    if (!row) return refuse('not_found', 'No such row in this yard.', 'rowId');
  }
  try {
    const scope = rowId
      ? eq(yardSpots.rowId, rowId)
      : and(eq(yardSpots.terminalId, terminalId), isNull(yardSpots.rowId));
    const [max] = await db
      .select({ n: sql<number>`coalesce(max(${yardSpots.sortOrder}), -1)::int` })
      .from(yardSpots)
      .where(scope);
    const [spot] = await db
      .insert(yardSpots)
      .values({ terminalId, rowId, kind: input.kind, label: input.label, sortOrder: max.n + 1 })
      .returning({ id: yardSpots.id });
    await recordAudit({
      actorId,
      action: 'yard.spot_created',
      entityType: 'yard_spot',
      entityId: spot.id,
      detail: { label: input.label, kind: input.kind },
    });
    return { ok: true, id: spot.id };
  } catch (e) {
    if (isUniqueViolation(e))
      return refuse('conflict', `A slot or door labelled ${input.label} already exists.`, 'label');
    throw e;
  }
}

export async function renameSpot(
  terminalId: string,
  actorId: string,
  id: string,
  label: string,
): Promise<Ok | Refusal> {
  try {
    const [spot] = await db
      .update(yardSpots)
      .set({ label })
      .where(and(eq(yardSpots.id, id), eq(yardSpots.terminalId, terminalId)))
      .returning({ id: yardSpots.id });
    if (!spot) return refuse('not_found', 'No such slot or door in this yard.');
    await recordAudit({
      actorId,
      action: 'yard.spot_renamed',
      entityType: 'yard_spot',
      entityId: id,
      detail: { label },
    });
    return { ok: true, id };
  } catch (e) {
    if (isUniqueViolation(e))
      return refuse('conflict', `A slot or door labelled ${label} already exists.`, 'name');
    throw e;
  }
}

/** Retires an empty slot or door. One that still holds a trailer is refused with the occupant named. */
export async function retireSpot(terminalId: string, actorId: string, id: string): Promise<Ok | Refusal> {
  return db.transaction(async (tx) => {
    const [spot] = await tx
      .select({ id: yardSpots.id, label: yardSpots.label, retiredAt: yardSpots.retiredAt })
      .from(yardSpots)
      .where(and(eq(yardSpots.id, id), eq(yardSpots.terminalId, terminalId)))
      .for('update');
    if (!spot) return refuse('not_found', 'No such slot or door in this yard.');
    if (spot.retiredAt) return refuse('conflict', `${spot.label} is already retired.`);
    const [occupant] = await tx
      .select({ unitNumber: trailers.unitNumber })
      .from(trailers)
      .where(eq(trailers.currentSpotId, id))
      .for('update');
    if (occupant)
      return refuse('conflict', `${spot.label} still holds ${occupant.unitNumber}: move it first.`);
    await tx.update(yardSpots).set({ retiredAt: new Date() }).where(eq(yardSpots.id, id));
    await recordAudit(
      {
        actorId,
        action: 'yard.spot_retired',
        entityType: 'yard_spot',
        entityId: id,
        detail: { label: spot.label },
      },
      tx,
    );
    return { ok: true as const, id };
  });
}
