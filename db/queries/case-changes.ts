import 'server-only';
import { and, eq, inArray, isNull } from 'drizzle-orm';
import { db, type Db, type Tx } from '@/db';
import {
  carriers,
  caseEvents,
  cases,
  findings,
  handoffs,
  photos,
  policies,
  rateCard,
  terminals,
  trailers,
} from '@/db/schema';
import { caseVisibleTo, type CaseViewer } from './case-visibility';

/** One case with what a command needs, locked for update; null when missing or not the viewer's. */
export async function lockCase(tx: Tx, caseId: string, viewer: CaseViewer) {
  const [row] = await tx
    .select({
      c: cases,
      timeZone: terminals.timeZone,
      terminalName: terminals.name,
      policy: policies.data,
      unitNumber: trailers.unitNumber,
      occurredAt: handoffs.occurredAt,
      carrierName: carriers.name,
      carrierEmail: carriers.contactEmail,
      carrierLocale: carriers.locale,
    })
    .from(cases)
    .innerJoin(terminals, eq(terminals.id, cases.terminalId))
    .innerJoin(trailers, eq(trailers.id, cases.trailerId))
    .innerJoin(handoffs, eq(handoffs.id, cases.handoffId))
    .leftJoin(policies, eq(policies.terminalId, cases.terminalId))
    .leftJoin(carriers, eq(carriers.id, cases.proposedCarrierId))
    .where(and(eq(cases.id, caseId), caseVisibleTo(viewer)))
    .for('update', { of: cases });
  return row ?? null;
}
export type LockedCase = NonNullable<Awaited<ReturnType<typeof lockCase>>>;

/** The findings linked to a case, as its e-mails describe them. */
export async function listFindingsOfCase(tx: Tx, caseId: string) {
  return tx
    .select({
      itemKey: findings.itemKey,
      condition: findings.condition,
      previousCondition: findings.previousCondition,
      reason: findings.reason,
      reasonCode: findings.reasonCode,
      reasonParams: findings.reasonParams,
    })
    .from(findings)
    .where(eq(findings.caseId, caseId));
}

type PhotoOwner = { photoIds: string[]; trailerId: string; uploadedById: string | null };

// Stored, of this trailer, not attached to any record yet, and uploaded by this person.
function attachable(p: PhotoOwner) {
  return and(
    inArray(photos.id, p.photoIds),
    eq(photos.trailerId, p.trailerId),
    eq(photos.status, 'stored'),
    isNull(photos.handoffId),
    isNull(photos.caseEventId),
    p.uploadedById ? eq(photos.uploadedById, p.uploadedById) : isNull(photos.id),
  );
}

/** How many of the given photos this person may still attach to a case event. */
export async function countAttachablePhotos(tx: Tx, p: PhotoOwner): Promise<number> {
  if (!p.photoIds.length) return 0;
  return (await tx.select({ id: photos.id }).from(photos).where(attachable(p))).length;
}

export async function attachPhotosToEvent(tx: Tx, p: PhotoOwner, caseEventId: string) {
  if (!p.photoIds.length) return;
  await tx.update(photos).set({ caseEventId }).where(attachable(p));
}

export async function updateCase(tx: Tx, caseId: string, patch: Partial<typeof cases.$inferInsert>) {
  await tx.update(cases).set(patch).where(eq(cases.id, caseId));
}

/** Appends one row to a case's history; returns its id. */
export async function insertCaseEvent(tx: Tx, event: typeof caseEvents.$inferInsert): Promise<string> {
  const [row] = await tx.insert(caseEvents).values(event).returning({ id: caseEvents.id });
  return row.id;
}

export async function caseHasEvent(tx: Tx, caseId: string, kind: string): Promise<boolean> {
  const rows = await tx
    .select({ id: caseEvents.id })
    .from(caseEvents)
    .where(and(eq(caseEvents.caseId, caseId), eq(caseEvents.kind, kind)))
    .limit(1);
  return rows.length > 0;
}

/** Every rate of the rate card, as the estimate reads them. */
export async function listRateCard(tx: Tx | Db = db) {
  return tx
    .select({
      itemPattern: rateCard.itemPattern,
      condition: rateCard.condition,
      amountCents: rateCard.amountCents,
    })
    .from(rateCard);
}

export async function listFindingConditions(tx: Tx, caseId: string) {
  return tx
    .select({ itemKey: findings.itemKey, condition: findings.condition })
    .from(findings)
    .where(eq(findings.caseId, caseId));
}

/** Writes the rate-card estimate unless the case already has one. */
export async function setEstimateIfUnset(tx: Tx, caseId: string, estimateCents: number, now: Date) {
  await tx
    .update(cases)
    .set({ estimateCents, updatedAt: now })
    .where(and(eq(cases.id, caseId), eq(cases.estimateCents, 0)));
}

/** Open cases still at an estimate of 0 (optionally only among `caseIds`). */
export async function listUnpricedOpenCaseIds(caseIds?: string[]): Promise<string[]> {
  const rows = await db
    .select({ id: cases.id })
    .from(cases)
    .where(
      and(
        eq(cases.state, 'open'),
        eq(cases.estimateCents, 0),
        caseIds ? inArray(cases.id, caseIds) : undefined,
      ),
    );
  return rows.map((r) => r.id);
}
