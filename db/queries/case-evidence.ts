import 'server-only';
import { and, asc, eq, gte, inArray, isNull, lte, ne, or } from 'drizzle-orm';
import { db } from '@/db';
import {
  carriers,
  findings,
  handoffItems,
  handoffs,
  photos,
  walkScans,
  yardMoves,
  yardSpots,
} from '@/db/schema';
import type { CustodyRows } from '@/lib/desk/custody';

/** Damage findings of a case: those linked to it, or (older rows) the new/worse findings of its handoff. */
export async function listCaseFindings(c: { id: string; handoffId: string }) {
  return db
    .select({
      id: findings.id,
      itemKey: findings.itemKey,
      kind: findings.kind,
      condition: findings.condition,
      previousCondition: findings.previousCondition,
      previousHandoffId: findings.previousHandoffId,
      responsibleParty: findings.responsibleParty,
      responsibleCarrierName: carriers.name,
      confidence: findings.confidence,
      candidates: findings.candidates,
      reason: findings.reason,
      reasonCode: findings.reasonCode,
      reasonParams: findings.reasonParams,
    })
    .from(findings)
    .leftJoin(carriers, eq(carriers.id, findings.responsibleCarrierId))
    .where(
      or(
        eq(findings.caseId, c.id),
        and(
          isNull(findings.caseId),
          eq(findings.handoffId, c.handoffId),
          inArray(findings.kind, ['new', 'worse']),
        ),
      ),
    )
    .orderBy(asc(findings.itemKey));
}
export type CaseFinding = Awaited<ReturnType<typeof listCaseFindings>>[number];

const handoffHeader = {
  id: handoffs.id,
  kind: handoffs.kind,
  level: handoffs.level,
  occurredAt: handoffs.occurredAt,
  driverName: handoffs.driverName,
  carrierName: carriers.name,
  carrierScac: carriers.scac,
  verificationCode: handoffs.verificationCode,
};

/** The before and after records of every item of a case: handoff headers, item rows and stored photos. */
export async function getCaseEvidence(c: { id: string; handoffId: string }) {
  const caseFindings = await listCaseFindings(c);
  const handoffIds = [
    ...new Set([
      c.handoffId,
      ...caseFindings.map((f) => f.previousHandoffId).filter((x): x is string => !!x),
    ]),
  ];
  const itemKeys = caseFindings.map((f) => f.itemKey);
  if (itemKeys.length === 0) return { findings: caseFindings, handoffs: [], items: [], photos: [] };
  const [headers, items, pics] = await Promise.all([
    db
      .select(handoffHeader)
      .from(handoffs)
      .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
      .where(inArray(handoffs.id, handoffIds)),
    db
      .select({
        handoffId: handoffItems.handoffId,
        itemKey: handoffItems.itemKey,
        condition: handoffItems.condition,
        note: handoffItems.note,
        treadThirtySeconds: handoffItems.treadThirtySeconds,
        isHoldingAir: handoffItems.isHoldingAir,
      })
      .from(handoffItems)
      .where(and(inArray(handoffItems.handoffId, handoffIds), inArray(handoffItems.itemKey, itemKeys))),
    db
      .select({
        id: photos.id,
        handoffId: photos.handoffId,
        itemKey: photos.itemKey,
        contentType: photos.contentType,
        // when the phone says it was taken (EXIF, may be missing) and when it reached Hitchmark
        capturedAt: photos.capturedAt,
        uploadedAt: photos.createdAt,
      })
      .from(photos)
      .where(and(inArray(photos.handoffId, handoffIds), ne(photos.status, 'rejected')))
      .orderBy(asc(photos.createdAt)),
  ]);
  return { findings: caseFindings, handoffs: headers, items, photos: pics };
}
export type CaseEvidence = Awaited<ReturnType<typeof getCaseEvidence>>;

/** What happened to the trailer between two instants: its handoffs, yard moves and yard-walk scans. */
export async function listCustodyRows(trailerId: string, from: Date, to: Date): Promise<CustodyRows> {
  const [hs, moves, walks] = await Promise.all([
    db
      .select(handoffHeader)
      .from(handoffs)
      .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
      .where(
        and(eq(handoffs.trailerId, trailerId), gte(handoffs.occurredAt, from), lte(handoffs.occurredAt, to)),
      ),
    db
      .select({ id: yardMoves.id, movedAt: yardMoves.movedAt, toSpot: yardSpots.label })
      .from(yardMoves)
      .innerJoin(yardSpots, eq(yardSpots.id, yardMoves.toSpotId))
      .where(
        and(eq(yardMoves.trailerId, trailerId), gte(yardMoves.movedAt, from), lte(yardMoves.movedAt, to)),
      ),
    db
      .select({ id: walkScans.id, scannedAt: walkScans.scannedAt })
      .from(walkScans)
      .where(
        and(eq(walkScans.trailerId, trailerId), gte(walkScans.scannedAt, from), lte(walkScans.scannedAt, to)),
      ),
  ]);
  return { handoffs: hs, moves, walks };
}
