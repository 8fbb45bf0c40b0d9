import 'server-only';
import { db, type Tx } from '@/db';
import {
  caseHasEvent,
  insertCaseEvent,
  listFindingConditions,
  listRateCard,
  listUnpricedOpenCaseIds,
  setEstimateIfUnset,
} from '@/db/queries/case-changes';
import { estimateCase, estimateNote, type RateRow } from '@/lib/desk/estimate';

/**
 * Prices one open case from the rate card, once: the most specific rate per damage finding, and an
 * `estimated` event that marks it done. Runs in the caller's transaction (the gate prices the case
 * it opens in the handoff's own). Returns false when the case was priced before.
 */
export async function priceCase(tx: Tx, caseId: string, now: Date, rates?: RateRow[]): Promise<boolean> {
  if (await caseHasEvent(tx, caseId, 'estimated')) return false;
  const card = rates ?? (await listRateCard(tx));
  const estimate = estimateCase(await listFindingConditions(tx, caseId), card);
  await setEstimateIfUnset(tx, caseId, estimate.totalCents, now);
  await insertCaseEvent(tx, {
    caseId,
    kind: 'estimated',
    fromState: 'open',
    toState: 'open',
    note: estimateNote(estimate),
    createdAt: now,
  });
  return true;
}

/**
 * Prices open cases still at 0 that have no estimate yet, each in its own transaction (the gate
 * prices new cases itself; this catches older ones). Idempotent; returns how many it priced.
 */
export async function priceNewCases(now = new Date(), caseIds?: string[]): Promise<number> {
  const pending = await listUnpricedOpenCaseIds(caseIds);
  if (pending.length === 0) return 0;
  const rates = await listRateCard();
  let priced = 0;
  for (const id of pending) {
    if (await db.transaction((tx) => priceCase(tx, id, now, rates))) priced++;
  }
  return priced;
}
