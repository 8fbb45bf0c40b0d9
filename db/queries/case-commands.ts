// No `server-only` marker: the demo seed (db/seed-desk.ts) runs these commands under plain Node.
import { and, eq, inArray, isNull } from 'drizzle-orm';
import { db, type Tx } from '@/db';
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
import { enqueueEmail } from '@/db/queries/outbox';
import { signCaseLink } from '@/lib/desk/case-link';
import { decisionEmail, notifyEmail, type CaseEmailFacts } from '@/lib/desk/case-email';
import { applyCaseCommand, type CaseCommand, type CaseState } from '@/lib/desk/case-state';
import { effectiveAmountCents, estimateCase, formatCents } from '@/lib/desk/estimate';
import { itemLabel } from '@/lib/desk/item-labels';
import { CONDITION_LABELS, type Condition } from '@/lib/engine';
import { caseVisibleTo, type CaseViewer } from './case-visibility';

export type CaseActor = CaseViewer & { id: string | null };
export type CommandOutcome =
  { ok: true; toState: CaseState; eventId: string } | { ok: false; reason: string; status: 404 | 409 };

const DEFAULT_DISPUTE_WINDOW_DAYS = 14; // terminal policy default when a policy row lacks it (common practice)

async function lockCase(tx: Tx, caseId: string, actor: CaseViewer) {
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
    })
    .from(cases)
    .innerJoin(terminals, eq(terminals.id, cases.terminalId))
    .innerJoin(trailers, eq(trailers.id, cases.trailerId))
    .innerJoin(handoffs, eq(handoffs.id, cases.handoffId))
    .leftJoin(policies, eq(policies.terminalId, cases.terminalId))
    .leftJoin(carriers, eq(carriers.id, cases.proposedCarrierId))
    .where(and(eq(cases.id, caseId), caseVisibleTo(actor)))
    .for('update', { of: cases });
  return row ?? null;
}

async function emailFacts(
  tx: Tx,
  row: NonNullable<Awaited<ReturnType<typeof lockCase>>>,
  amountCents: number,
): Promise<CaseEmailFacts> {
  const fs = await tx.select().from(findings).where(eq(findings.caseId, row.c.id));
  return {
    unitNumber: row.unitNumber,
    terminalName: row.terminalName,
    carrierName: row.carrierName ?? 'Carrier',
    timeZone: row.timeZone,
    handoffAt: row.occurredAt,
    amountCents,
    items: fs.map((f) => ({
      label: itemLabel(f.itemKey),
      before: f.previousCondition ? CONDITION_LABELS[f.previousCondition] : null,
      after: f.condition ? CONDITION_LABELS[f.condition] : null,
      reason: f.reason,
    })),
  };
}

/**
 * Applies one command to a case inside a transaction: checks the state machine, updates the case,
 * writes the case_events row and, for notify and decide, the e-mail to the outbox. The actor's
 * ownership is part of the WHERE clause (a driver can only touch their carrier's cases).
 */
export async function runCaseCommand(input: {
  caseId: string;
  command: CaseCommand;
  actor: CaseActor;
  now: Date;
  appUrl: string;
  linkSecret: string;
  sendEmail?: boolean;
}): Promise<CommandOutcome> {
  const { caseId, command, actor, now } = input;
  return db.transaction(async (tx) => {
    const row = await lockCase(tx, caseId, actor);
    if (!row) return { ok: false, reason: 'This case does not exist or is not yours.', status: 404 };
    const c = row.c;
    const amountCents = effectiveAmountCents(c);
    const windowDays = Number(row.policy?.disputeWindowDays ?? DEFAULT_DISPUTE_WINDOW_DAYS);
    const result = applyCaseCommand(
      {
        state: c.state,
        amountCents,
        disputeDeadline: c.disputeDeadline,
        hasProposedCarrier: !!c.proposedCarrierId,
      },
      command,
      { now, disputeWindowDays: windowDays, timeZone: row.timeZone },
    );
    if (!result.ok) return { ok: false, reason: result.reason, status: 409 };
    const photoIds = command.kind === 'dispute' ? (command.photoIds ?? []) : [];
    const ownPhotos = photoIds.length
      ? and(
          inArray(photos.id, photoIds),
          eq(photos.trailerId, c.trailerId),
          eq(photos.status, 'stored'),
          isNull(photos.handoffId),
          isNull(photos.caseEventId),
          actor.id ? eq(photos.uploadedById, actor.id) : isNull(photos.id),
        )
      : undefined;
    if (
      ownPhotos &&
      (await tx.select({ id: photos.id }).from(photos).where(ownPhotos)).length !== photoIds.length
    ) {
      return {
        ok: false,
        reason: 'A photo is missing, still uploading, or belongs to another record. Take it again.',
        status: 409,
      };
    }

    const patch: Partial<typeof cases.$inferInsert> = { state: result.toState, updatedAt: now };
    if (result.disputeDeadline) patch.disputeDeadline = result.disputeDeadline;
    if (command.kind === 'override')
      Object.assign(patch, { overrideCents: command.overrideCents, overrideReason: command.reason.trim() });
    if (command.kind === 'decide')
      Object.assign(patch, {
        decision: command.decision,
        chargedCents: command.chargedCents,
        decisionReason: command.reason.trim(),
      });
    await tx.update(cases).set(patch).where(eq(cases.id, caseId));
    const note =
      command.kind === 'override'
        ? `${formatCents(command.overrideCents)}: ${result.event.note}`
        : command.kind === 'decide'
          ? `${command.decision} ${formatCents(command.chargedCents)}: ${result.event.note}`
          : result.event.note;
    const [event] = await tx
      .insert(caseEvents)
      .values({
        caseId,
        kind: result.event.kind,
        fromState: result.event.fromState,
        toState: result.event.toState,
        actorId: actor.id,
        note,
        createdAt: now,
      })
      .returning({ id: caseEvents.id });
    if (ownPhotos) await tx.update(photos).set({ caseEventId: event.id }).where(ownPhotos);

    if (
      input.sendEmail !== false &&
      command.kind === 'notify' &&
      row.carrierEmail &&
      c.proposedCarrierId &&
      result.disputeDeadline
    ) {
      const token = signCaseLink(
        { caseId, carrierId: c.proposedCarrierId, expiresAt: result.disputeDeadline },
        input.linkSecret,
      );
      const mail = notifyEmail(
        await emailFacts(tx, row, amountCents),
        result.disputeDeadline,
        `${input.appUrl}/case-link/${token}`,
      );
      await enqueueEmail({ to: row.carrierEmail, ...mail, relatedType: 'case', relatedId: caseId }, tx);
    }
    if (input.sendEmail !== false && command.kind === 'decide' && row.carrierEmail) {
      const mail = decisionEmail(
        await emailFacts(tx, row, amountCents),
        command.decision,
        command.chargedCents,
        command.reason.trim(),
      );
      await enqueueEmail({ to: row.carrierEmail, ...mail, relatedType: 'case', relatedId: caseId }, tx);
    }
    return { ok: true, toState: result.toState, eventId: event.id };
  });
}

/**
 * Prices open cases the gate opened with no estimate yet (estimate 0, no override, no 'estimated'
 * event): the rate card's most specific rate per damage finding. Idempotent.
 */
type RateRow = { itemPattern: string; condition: Condition; amountCents: number };

/** Prices one open case from the rate card, once (an `estimated` event marks it done). Runs in the caller's transaction. */
export async function priceCase(tx: Tx, id: string, now: Date, rates?: RateRow[]): Promise<boolean> {
  const done = await tx
    .select({ id: caseEvents.id })
    .from(caseEvents)
    .where(and(eq(caseEvents.caseId, id), eq(caseEvents.kind, 'estimated')))
    .limit(1);
  if (done.length) return false;
  const card =
    rates ??
    (await tx
      .select({
        itemPattern: rateCard.itemPattern,
        condition: rateCard.condition,
        amountCents: rateCard.amountCents,
      })
      .from(rateCard));
  const fs = await tx
    .select({ itemKey: findings.itemKey, condition: findings.condition })
    .from(findings)
    .where(eq(findings.caseId, id));
  const estimate = estimateCase(fs, card);
  await tx
    .update(cases)
    .set({ estimateCents: estimate.totalCents, updatedAt: now })
    .where(and(eq(cases.id, id), eq(cases.estimateCents, 0)));
  const missing = estimate.unpricedItemKeys.length
    ? `; no rate for ${estimate.unpricedItemKeys.map(itemLabel).join(', ')}`
    : '';
  await tx.insert(caseEvents).values({
    caseId: id,
    kind: 'estimated',
    fromState: 'open',
    toState: 'open',
    note: `Rate card: ${formatCents(estimate.totalCents)} for ${fs.length} item(s)${missing}`,
    createdAt: now,
  });
  return true;
}

/** Prices open cases still at 0 that have no estimate yet (the gate prices new cases itself; this catches older ones). */
export async function priceNewCases(now = new Date(), caseIds?: string[]) {
  const pending = await db
    .select({ id: cases.id })
    .from(cases)
    .where(
      and(
        eq(cases.state, 'open'),
        eq(cases.estimateCents, 0),
        caseIds ? inArray(cases.id, caseIds) : undefined,
      ),
    );
  if (pending.length === 0) return 0;
  const rates = await db
    .select({
      itemPattern: rateCard.itemPattern,
      condition: rateCard.condition,
      amountCents: rateCard.amountCents,
    })
    .from(rateCard);
  let priced = 0;
  for (const { id } of pending) {
    if (await db.transaction((tx) => priceCase(tx, id, now, rates))) priced++;
  }
  return priced;
}
