// What a checked handoff writes, in order: the record and its hash-chain link, items and photos,
// a case for new or worse damage (priced from the rate card), findings, new holds, the trailer's
// new state, the audit entry and the receipt e-mail. All in the submit's transaction.
import 'server-only';
import type { Tx } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { priceCase } from '@/lib/server/desk/pricing';
import { getSpotLabel, getUserMailbox, latestContentHash } from '@/db/queries/handoff-submit';
import {
  attachPhotos,
  insertFindings,
  insertHandoff,
  insertHandoffItems,
  insertHolds,
  insertOpenedCase,
  recordCurrentCondition,
  updateTrailer,
} from '@/db/queries/handoff-writes';
import { hashableFromRows } from '@/lib/handoffs/canonical';
import { handoffContentHash, WRITTEN_HASH_VERSION } from '@/lib/handoffs/hash';
import { holdsNotYetOpen } from '@/lib/handoffs/holds';
import { englishReason } from '@/lib/i18n/reasons';
import { receiptLetters } from '@/lib/handoffs/receipt';
import { handoffRow, readingsOf, trailerAfter } from '@/lib/handoffs/submission';
import { newVerificationCode } from '@/lib/handoffs/verification-code';
import { abort } from '@/lib/result';
import { chainKey } from '@/lib/server/env';
import { enqueueReceiptEmails } from './receipt-mail';
import { chooseSpot } from './slots';
import type { CheckedHandoff } from './checked';
import type { SubmitResult } from './types';

export type { CheckedHandoff };

export async function storeHandoff(tx: Tx, c: CheckedHandoff): Promise<SubmitResult> {
  const { input, actor, trailer, terminal, event, evaluation: ev, items } = c;
  const id = event.id;
  const now = c.recordedAt;
  let spotId: string | null = null;
  if (input.kind === 'drop' && !c.correction) {
    const spot = await chooseSpot(tx, terminal.id, input.spotId);
    spotId = spot.ok ? spot.value : abort(spot);
  }
  const row = handoffRow(input, {
    id,
    trailerId: trailer.id,
    terminalId: terminal.id,
    event,
    occurredAt: now,
    recordedById: actor.id,
    verificationCode: newVerificationCode(),
    prevHash: await latestContentHash(tx, trailer.id),
  });
  const shas = c.photos.map((p) => p.sha256);
  const hashed = { ...row, isLoadPerishable: c.isLoadPerishable };
  const contentHash = handoffContentHash(
    hashableFromRows(hashed, items.rows, shas, WRITTEN_HASH_VERSION),
    chainKey(),
  );
  await insertHandoff(tx, {
    ...hashed,
    contentHash,
    hashVersion: WRITTEN_HASH_VERSION,
    requestHash: c.requestHash,
  });
  await insertHandoffItems(
    tx,
    items.rows.map((i) => ({ ...i, handoffId: id })),
  );
  await attachPhotos(tx, id, items.photoIds);
  await recordCurrentCondition(tx, { trailerId: trailer.id, handoffId: id, observedAt: now }, items.rows);

  // new or worse damage, and damage no earlier inspection saw (followed, not attributed), open one case
  const caseId =
    ev.damageKeys.length || ev.unattributedKeys.length
      ? await insertOpenedCase(
          tx,
          {
            handoffId: id,
            trailerId: trailer.id,
            terminalId: terminal.id,
            proposedCarrierId: ev.proposedCarrierId,
            attributionNote: ev.attributionNote,
            attributionNoteCode: ev.attributionNoteCoded?.code ?? null,
            attributionNoteParams: ev.attributionNoteCoded?.params ?? null,
            estimateCents: 0,
            openedAt: now,
          },
          {
            actorId: actor.id,
            note:
              `Opened by the ${input.kind} of ${trailer.unitNumber}.` +
              (ev.attributionNote ? ` Marked "${ev.attributionNote}".` : ''),
          },
        )
      : null;
  // a finding links to an earlier handoff only: the engine may also name a walk or a move
  const handoffIds = new Set(
    c.history.filter((e) => e.type === 'drop' || e.type === 'hook').map((e) => e.id),
  );
  await insertFindings(
    tx,
    ev.rows.map((f) => ({
      handoffId: id,
      trailerId: trailer.id,
      itemKey: f.itemKey,
      kind: f.kind,
      condition: f.condition,
      previousCondition: f.previousCondition,
      previousHandoffId: f.previousEventId && handoffIds.has(f.previousEventId) ? f.previousEventId : null,
      responsibleCarrierId: f.responsibleCarrierId,
      responsibleParty: f.responsibleParty,
      confidence: f.confidence,
      candidates: f.candidates,
      reason: f.reason,
      reasonCode: f.coded.code,
      reasonParams: f.coded.params,
      caseId: f.isDamage ? caseId : null,
    })),
  );
  // the repair estimate from the rate card, in the same transaction as the case
  if (caseId) await priceCase(tx, caseId, now);
  const newHolds = holdsNotYetOpen(ev.holds, c.openHolds);
  await insertHolds(
    tx,
    newHolds.map((h) => ({
      trailerId: trailer.id,
      handoffId: id,
      severity: h.severity,
      restriction: h.restriction,
      ruleKey: h.ruleKey,
      itemKey: h.itemKey,
      reason: englishReason(h.reason, terminal.timeZone),
      reasonCode: h.reason.code,
      reasonParams: h.reason.params,
      source: h.source,
      caution: h.caution ? englishReason(h.caution, terminal.timeZone) : null,
      cautionCode: h.caution?.code ?? null,
      cautionParams: h.caution?.params ?? null,
      placedById: actor.id,
      placedAt: now,
    })),
  );
  // a correction leaves the trailer where it is; it updates the readings only if it corrects the latest record
  if (!c.correction) await updateTrailer(tx, trailer.id, trailerAfter(row, spotId));
  else if (c.correction.isOfLatest) await updateTrailer(tx, trailer.id, readingsOf(row));
  await recordAudit(
    {
      actorId: actor.id,
      action: c.correction ? `handoff.${input.kind}.correction` : `handoff.${input.kind}`,
      entityType: 'handoff',
      entityId: id,
      detail: {
        trailerId: trailer.id,
        findings: ev.rows.length,
        holds: newHolds.length,
        caseId,
        ...(input.correctsHandoffId
          ? { corrects: input.correctsHandoffId, reason: row.correctionReason }
          : {}),
      },
    },
    tx,
  );
  if (c.sendReceipt) {
    const driver = row.driverId ? await getUserMailbox(tx, row.driverId) : null;
    const carrier = { email: c.carrier.contactEmail, locale: c.carrier.locale };
    await enqueueReceiptEmails(tx, receiptLetters(driver, carrier), {
      handoffId: id,
      unitNumber: trailer.unitNumber,
      kind: input.kind,
      occurredAt: now,
      terminalName: terminal.name,
      timeZone: terminal.timeZone,
      carrierName: c.carrier.name,
      driverName: input.driverName,
      tractorNumber: input.tractorNumber,
      isLoaded: input.isLoaded,
      sealNumber: row.sealNumber,
      fuelEighths: row.fuelEighths,
      spotLabel: spotId ? await getSpotLabel(tx, spotId) : null,
      verificationCode: row.verificationCode,
      contentHash,
      findings: ev.rows.map((f) => ({
        kind: f.kind,
        itemKey: f.itemKey,
        reason: f.reason,
        reasonCode: f.coded.code,
        reasonParams: f.coded.params,
      })),
      holds: [
        ...c.openHolds,
        ...newHolds.map((h) => ({
          severity: h.severity,
          restriction: h.restriction,
          reason: englishReason(h.reason, terminal.timeZone),
          reasonCode: h.reason.code,
          reasonParams: h.reason.params,
        })),
      ],
      photos: c.photos.map((p) => ({ id: p.id, itemKey: null })),
    });
  }
  return { handoffId: id, verificationCode: row.verificationCode, isReplay: false };
}
