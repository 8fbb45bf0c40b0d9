import 'server-only';
import { aliasedTable, and, asc, desc, eq, gte, lte, sql } from 'drizzle-orm';
import { db } from '@/db';
import { carriers, caseEvents, cases, handoffs, photos, terminals, trailers, users } from '@/db/schema';
import type { CaseQueueQuery } from '@/lib/validation/desk';
import { caseVisibleTo, type CaseViewer } from './case-visibility';

export { caseVisibleTo, type CaseViewer } from './case-visibility';

const amount = sql<number>`coalesce(${cases.overrideCents}, ${cases.estimateCents})`;

/** The desk queue, filtered and sorted; already limited to what the viewer may see. */
export async function listCases(
  viewer: CaseViewer,
  q: Partial<CaseQueueQuery> & { now?: Date; limit?: number },
) {
  const now = q.now ?? new Date();
  const sort = q.sort ?? 'oldest';
  // keyset paging on (opened_at, id) for the time sorts: the index cases_opened serves any page
  const after =
    q.after && (sort === 'oldest' || sort === 'newest')
      ? sort === 'oldest'
        ? sql`(${cases.openedAt}, ${cases.id}) > (${q.after.openedAt.toISOString()}::timestamptz, ${q.after.id}::uuid)`
        : sql`(${cases.openedAt}, ${cases.id}) < (${q.after.openedAt.toISOString()}::timestamptz, ${q.after.id}::uuid)`
      : undefined;
  const where = and(
    after,
    caseVisibleTo(viewer),
    q.state ? eq(cases.state, q.state) : undefined,
    q.carrier ? eq(cases.proposedCarrierId, q.carrier) : undefined,
    q.olderThanDays
      ? lte(cases.openedAt, new Date(now.getTime() - Number(q.olderThanDays) * 86_400_000))
      : undefined,
    q.minAmount !== undefined ? gte(amount, q.minAmount) : undefined,
    q.maxAmount !== undefined ? lte(amount, q.maxAmount) : undefined,
  );
  const order = {
    oldest: [asc(cases.openedAt), asc(cases.id)],
    newest: [desc(cases.openedAt), desc(cases.id)],
    amount_high: [desc(amount), asc(cases.openedAt)],
    amount_low: [asc(amount), asc(cases.openedAt)],
  }[sort];
  return db
    .select({
      id: cases.id,
      state: cases.state,
      openedAt: cases.openedAt,
      amountCents: amount,
      isOverridden: sql<boolean>`${cases.overrideCents} is not null`,
      decision: cases.decision,
      chargedCents: cases.chargedCents,
      unitNumber: trailers.unitNumber,
      trailerId: trailers.id,
      carrierScac: carriers.scac,
      carrierName: carriers.name,
      terminalCode: terminals.code,
      // one primary-key lookup per listed case, never a join over every handoff
      handoffKind: sql<
        'drop' | 'hook'
      >`(select ${handoffs.kind} from ${handoffs} where ${handoffs.id} = ${cases.handoffId})`,
    })
    .from(cases)
    .innerJoin(trailers, eq(trailers.id, cases.trailerId))
    .innerJoin(terminals, eq(terminals.id, cases.terminalId))
    .leftJoin(carriers, eq(carriers.id, cases.proposedCarrierId))
    .where(where)
    .orderBy(...order)
    .limit(q.limit ?? 200);
}

/** One case with its trailer, terminal and proposed carrier; null when missing or not the viewer's. */
export async function getCase(id: string, viewer: CaseViewer) {
  const [row] = await db
    .select({
      id: cases.id,
      state: cases.state,
      handoffId: cases.handoffId,
      trailerId: cases.trailerId,
      terminalId: cases.terminalId,
      proposedCarrierId: cases.proposedCarrierId,
      attributionNote: cases.attributionNote,
      attributionNoteCode: cases.attributionNoteCode,
      attributionNoteParams: cases.attributionNoteParams,
      estimateCents: cases.estimateCents,
      overrideCents: cases.overrideCents,
      overrideReason: cases.overrideReason,
      decision: cases.decision,
      chargedCents: cases.chargedCents,
      decisionReason: cases.decisionReason,
      disputeDeadline: cases.disputeDeadline,
      openedAt: cases.openedAt,
      unitNumber: trailers.unitNumber,
      trailerKind: trailers.kind,
      axleCount: trailers.axleCount,
      carrierName: carriers.name,
      carrierScac: carriers.scac,
      carrierEmail: carriers.contactEmail,
      terminalName: terminals.name,
      timeZone: terminals.timeZone,
    })
    .from(cases)
    .innerJoin(trailers, eq(trailers.id, cases.trailerId))
    .innerJoin(terminals, eq(terminals.id, cases.terminalId))
    .leftJoin(carriers, eq(carriers.id, cases.proposedCarrierId))
    .where(and(eq(cases.id, id), caseVisibleTo(viewer)))
    .limit(1);
  return row ?? null;
}

const actors = aliasedTable(users, 'actors');

/** A case's history, oldest first, each event with the ids of photos attached to it (a dispute's evidence). */
export async function listCaseEvents(caseId: string) {
  const [events, pics] = await Promise.all([
    listEventRows(caseId),
    db
      .select({ id: photos.id, caseEventId: photos.caseEventId })
      .from(photos)
      .innerJoin(caseEvents, eq(caseEvents.id, photos.caseEventId))
      .where(and(eq(caseEvents.caseId, caseId), eq(photos.status, 'stored'))),
  ]);
  return events.map((e) => ({ ...e, photoIds: pics.filter((p) => p.caseEventId === e.id).map((p) => p.id) }));
}

function listEventRows(caseId: string) {
  return db
    .select({
      id: caseEvents.id,
      kind: caseEvents.kind,
      fromState: caseEvents.fromState,
      toState: caseEvents.toState,
      note: caseEvents.note,
      createdAt: caseEvents.createdAt,
      actorName: actors.name,
      actorRole: actors.role,
    })
    .from(caseEvents)
    .leftJoin(actors, eq(actors.id, caseEvents.actorId))
    .where(eq(caseEvents.caseId, caseId))
    .orderBy(asc(caseEvents.createdAt), asc(caseEvents.id));
}

export async function listCaseCarriers() {
  return db
    .select({ id: carriers.id, scac: carriers.scac, name: carriers.name })
    .from(carriers)
    .orderBy(asc(carriers.scac));
}
