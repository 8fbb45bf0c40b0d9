import 'server-only';
import { and, asc, eq, gt, isNull, lte, or, type SQL } from 'drizzle-orm';
import { db } from '@/db';
import { carriers, findings, handoffs, holds, photos, terminals, trailers, yardSpots } from '@/db/schema';
import type { ReceiptView } from '@/lib/handoffs/receipt';
import type { Role } from '@/lib/auth/roles';

export type Viewer = { id: string; role: Role; carrierId: string | null };

/** Drivers see their own carrier's handoffs only; jockeys, clerks and admins see all. */
function handoffVisibleTo(viewer: Viewer): SQL | undefined {
  if (viewer.role !== 'driver') return undefined;
  return viewer.carrierId
    ? eq(handoffs.carrierId, viewer.carrierId)
    : eq(handoffs.id, '00000000-0000-0000-0000-000000000000');
}

async function receiptWhere(where: SQL | undefined): Promise<ReceiptView | null> {
  const [h] = await db
    .select({
      id: handoffs.id,
      trailerId: handoffs.trailerId,
      kind: handoffs.kind,
      occurredAt: handoffs.occurredAt,
      driverName: handoffs.driverName,
      tractorNumber: handoffs.tractorNumber,
      isLoaded: handoffs.isLoaded,
      sealNumber: handoffs.sealNumber,
      fuelEighths: handoffs.fuelEighths,
      verificationCode: handoffs.verificationCode,
      contentHash: handoffs.contentHash,
      unitNumber: trailers.unitNumber,
      gateInAt: trailers.gateInAt,
      spotLabel: yardSpots.label,
      terminalName: terminals.name,
      timeZone: terminals.timeZone,
      carrierName: carriers.name,
    })
    .from(handoffs)
    .innerJoin(trailers, eq(trailers.id, handoffs.trailerId))
    .innerJoin(terminals, eq(terminals.id, handoffs.terminalId))
    .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
    .leftJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
    .where(where)
    .limit(1);
  if (!h) return null;
  const [f, hl, p] = await Promise.all([
    db
      .select({
        kind: findings.kind,
        itemKey: findings.itemKey,
        reason: findings.reason,
        reasonCode: findings.reasonCode,
        reasonParams: findings.reasonParams,
      })
      .from(findings)
      .where(eq(findings.handoffId, h.id))
      .orderBy(asc(findings.createdAt), asc(findings.itemKey)),
    // every hold open at the moment of the handoff: the ones it placed and the ones already there
    db
      .select({
        severity: holds.severity,
        restriction: holds.restriction,
        reason: holds.reason,
        reasonCode: holds.reasonCode,
        reasonParams: holds.reasonParams,
      })
      .from(holds)
      .where(
        and(
          eq(holds.trailerId, h.trailerId),
          lte(holds.placedAt, h.occurredAt),
          or(isNull(holds.releasedAt), gt(holds.releasedAt, h.occurredAt)),
        ),
      )
      .orderBy(asc(holds.severity), asc(holds.placedAt)),
    db
      .select({ id: photos.id, itemKey: photos.itemKey })
      .from(photos)
      .where(and(eq(photos.handoffId, h.id), eq(photos.status, 'stored')))
      .orderBy(asc(photos.createdAt)),
  ]);
  // the slot shows only while the trailer is still on the stay this drop began
  const isSameStay = h.kind === 'drop' && h.gateInAt?.getTime() === h.occurredAt.getTime();
  return {
    handoffId: h.id,
    unitNumber: h.unitNumber,
    kind: h.kind,
    occurredAt: h.occurredAt,
    terminalName: h.terminalName,
    timeZone: h.timeZone,
    carrierName: h.carrierName,
    driverName: h.driverName,
    tractorNumber: h.tractorNumber,
    isLoaded: h.isLoaded,
    sealNumber: h.sealNumber,
    fuelEighths: h.fuelEighths,
    spotLabel: isSameStay ? h.spotLabel : null,
    verificationCode: h.verificationCode,
    contentHash: h.contentHash,
    findings: f,
    holds: hl,
    photos: p,
  };
}

/** One handoff's receipt, or null when it does not exist or the viewer may not see it. */
export function getReceipt(handoffId: string, viewer: Viewer) {
  return receiptWhere(and(eq(handoffs.id, handoffId), handoffVisibleTo(viewer)));
}

/** Which handoff and trailer a verification code names, or null. */
export async function findHandoffByCode(code: string) {
  const [row] = await db
    .select({ id: handoffs.id, trailerId: handoffs.trailerId })
    .from(handoffs)
    .where(eq(handoffs.verificationCode, code))
    .limit(1);
  return row ?? null;
}

/** The receipt a verification code stands for (public verify page: shows only what the receipt shows). */
export function getReceiptByCode(code: string) {
  return receiptWhere(eq(handoffs.verificationCode, code));
}

/**
 * A stored photo the viewer may see: one attached to a handoff they may see, or one they uploaded
 * themselves (before the submit attaches it). Null otherwise.
 */
export async function getPhotoForViewer(photoId: string, viewer: Viewer) {
  const visible = handoffVisibleTo(viewer);
  const [row] = await db
    .select({ objectKey: photos.objectKey, contentType: photos.contentType, byteSize: photos.byteSize })
    .from(photos)
    .leftJoin(handoffs, eq(handoffs.id, photos.handoffId))
    .where(
      and(
        eq(photos.id, photoId),
        eq(photos.status, 'stored'),
        visible
          ? or(eq(photos.uploadedById, viewer.id), and(visible, eq(photos.handoffId, handoffs.id)))
          : undefined,
      ),
    )
    .limit(1);
  return row ?? null;
}

/** Open holds of a trailer, out-of-service first (the start page and the hook refusal). */
export function listOpenHolds(trailerId: string) {
  return db
    .select({
      id: holds.id,
      severity: holds.severity,
      restriction: holds.restriction,
      reason: holds.reason,
      reasonCode: holds.reasonCode,
      reasonParams: holds.reasonParams,
      caution: holds.caution,
      cautionCode: holds.cautionCode,
      cautionParams: holds.cautionParams,
      placedAt: holds.placedAt,
    })
    .from(holds)
    .where(and(eq(holds.trailerId, trailerId), isNull(holds.releasedAt)))
    .orderBy(asc(holds.severity), asc(holds.placedAt));
}
