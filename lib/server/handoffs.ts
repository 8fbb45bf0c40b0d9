// The one way a handoff is recorded: POST /api/handoffs and the demo seed both call submitHandoff.
// No `server-only` marker: the seed runs this under plain Node.
import { randomUUID } from 'node:crypto';
import { and, desc, eq, inArray, isNull, sql } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { priceCase } from '@/db/queries/case-commands';
import { listTimeline } from '@/db/queries/timeline';
import {
  auditLog,
  caseEvents,
  cases,
  carriers,
  findings,
  handoffItems,
  handoffs,
  holds,
  photos,
  policies,
  terminals,
  trailers,
  users,
  yardSpots,
} from '@/db/schema';
import {
  blocksHook,
  buildChecklist,
  makePolicy,
  type EnginePolicy,
  type HandoffEvent,
  type Hold,
} from '@/lib/engine';
import { hashableFromRows } from '@/lib/handoffs/canonical';
import { HandoffError, isLockNotAvailable, isUniqueViolation } from '@/lib/handoff-errors';
import { evaluateHandoff } from '@/lib/handoffs/evaluation';
import { handoffContentHash } from '@/lib/handoffs/hash';
import { damageEvidenceErrors, normalizeItems } from '@/lib/handoffs/items';
import type { Role } from '@/lib/auth/roles';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import { newVerificationCode } from '@/lib/handoffs/verification-code';
import { enqueueReceiptEmail } from './handoff-receipt-mail';
import { chooseSpot } from './handoff-slots';

export type HandoffActor = { id: string; role: Role; carrierId: string | null; terminalId: string | null };
export type SubmitResult = { handoffId: string; verificationCode: string; isReplay: boolean };

const POLICY_KEYS: (keyof EnginePolicy)[] = [
  'requiredFuelEighthsAtDrop',
  'requiredFuelEighthsAtHook',
  'reeferBurnGallonsPerHour',
  'fuelDropToleranceGallons',
  'defaultTankGallons',
  'preTripMaxAgeHours',
  'minTreadThirtySeconds',
  'spareHoldSeverity',
];

// db/queries/audit.ts is server-only; the seed needs the same append under plain Node.
async function recordAuditRow(entry: typeof auditLog.$inferInsert, q: typeof db | Tx = db) {
  await q.insert(auditLog).values(entry);
}

async function findByKey(q: typeof db | Tx, key: string) {
  const [row] = await q
    .select({
      id: handoffs.id,
      code: handoffs.verificationCode,
      trailerId: handoffs.trailerId,
      recordedById: handoffs.recordedById,
    })
    .from(handoffs)
    .where(eq(handoffs.idempotencyKey, key))
    .limit(1);
  return row ?? null;
}

function replay(
  row: NonNullable<Awaited<ReturnType<typeof findByKey>>>,
  input: HandoffSubmitInput,
  actor: HandoffActor,
): SubmitResult {
  if (row.trailerId !== input.trailerId || row.recordedById !== actor.id) {
    throw new HandoffError(
      'conflict',
      'This draft key was already used for another handoff. Start a new draft.',
    );
  }
  return { handoffId: row.id, verificationCode: row.code, isReplay: true };
}

/**
 * Records a drop or hook: idempotent by `input.idempotencyKey` (a retry returns the same handoff),
 * in one transaction holding a NOWAIT row lock on the trailer (a concurrent submit for the same
 * trailer gets a conflict). Runs the engine and stores findings, holds, a case for new or worse
 * damage, the hash chain link, the trailer's new state, the audit entry and the receipt e-mail.
 * Throws HandoffError for every expected refusal. `now` is the handoff time (the seed passes the past).
 */
export async function submitHandoff(
  input: HandoffSubmitInput,
  actor: HandoffActor,
  opts: { now?: Date; sendReceipt?: boolean; appUrl?: string; isBulk?: boolean } = {},
): Promise<SubmitResult> {
  const now = opts.now ?? new Date();
  const earlier = await findByKey(db, input.idempotencyKey);
  if (earlier) return replay(earlier, input, actor);
  try {
    return await db.transaction((tx) => record(tx, input, actor, now, opts));
  } catch (error) {
    if (isLockNotAvailable(error)) {
      throw new HandoffError(
        'conflict',
        'Another handoff of this trailer is being recorded right now. Wait a moment, then submit again.',
      );
    }
    if (isUniqueViolation(error, 'handoffs_idempotency_key_unique')) {
      const row = await findByKey(db, input.idempotencyKey);
      if (row) return replay(row, input, actor);
    }
    if (error instanceof HandoffError && error.holds && input.kind === 'hook') {
      await recordAuditRow({
        actorId: actor.id,
        action: 'handoff.hook_refused',
        entityType: 'trailer',
        entityId: input.trailerId,
        detail: { reasons: error.holds.map((h) => h.reason), items: input.items },
      });
      if (error.holdsToPlace?.length)
        await placeRefusedHookHolds(input.trailerId, actor.id, error.holdsToPlace, now);
    }
    throw error;
  }
}

/**
 * A hook refused because the driver's own pickup report found an out-of-service defect: the
 * handoff is not stored (custody stays with the terminal), but the defect must keep the trailer
 * in the yard for the next driver too, so its holds are placed anyway.
 */
async function placeRefusedHookHolds(trailerId: string, actorId: string, found: Hold[], now: Date) {
  await db.transaction(async (tx) => {
    await tx.select({ id: trailers.id }).from(trailers).where(eq(trailers.id, trailerId)).for('update');
    const open = await tx
      .select({ ruleKey: holds.ruleKey, itemKey: holds.itemKey })
      .from(holds)
      .where(and(eq(holds.trailerId, trailerId), isNull(holds.releasedAt)));
    const already = new Set(open.map((h) => `${h.ruleKey}|${h.itemKey ?? ''}`));
    const fresh = found.filter((h) => !already.has(`${h.ruleKey}|${h.itemKey ?? ''}`));
    if (!fresh.length) return;
    await tx.insert(holds).values(
      fresh.map((h) => ({
        trailerId,
        handoffId: null,
        severity: h.severity,
        restriction: h.restriction,
        ruleKey: h.ruleKey,
        itemKey: h.itemKey,
        reason: `${h.reason} (found at a refused hook)`,
        source: h.source,
        placedById: actorId,
        placedAt: now,
      })),
    );
  });
}

async function record(
  tx: Tx,
  input: HandoffSubmitInput,
  actor: HandoffActor,
  now: Date,
  opts: { sendReceipt?: boolean; appUrl?: string; isBulk?: boolean },
): Promise<SubmitResult> {
  // the demo seed records hundreds of handoffs in a row: waiting for each commit's disk flush would take most of its time
  if (opts.isBulk) await tx.execute(sql`set local synchronous_commit = off`);
  const [trailer] = await tx
    .select()
    .from(trailers)
    .where(eq(trailers.id, input.trailerId))
    .for('update', { noWait: true });
  if (!trailer) throw new HandoffError('not_found', 'No such trailer.');
  const again = await findByKey(tx, input.idempotencyKey);
  if (again) return replay(again, input, actor);

  if (input.kind === 'drop' && trailer.status === 'in_yard') {
    throw new HandoffError(
      'conflict',
      `Trailer ${trailer.unitNumber} is already in the yard; record a hook to take it out.`,
    );
  }
  if (input.kind === 'hook' && trailer.status !== 'in_yard') {
    throw new HandoffError(
      'conflict',
      `Trailer ${trailer.unitNumber} is not in the yard; record a drop to bring it in.`,
    );
  }
  const terminalId = input.kind === 'drop' ? actor.terminalId : trailer.currentTerminalId;
  if (!terminalId)
    throw new HandoffError('invalid', 'Your account has no home terminal; ask the terminal manager.');
  if (actor.role === 'driver' && input.carrierId !== actor.carrierId) {
    throw new HandoffError('invalid', 'A driver records handoffs for their own carrier.', {
      carrierId: ['Choose your own carrier.'],
    });
  }
  // one connection per transaction: queries run one after another
  const [terminal] = await tx.select().from(terminals).where(eq(terminals.id, terminalId));
  const [carrier] = await tx.select().from(carriers).where(eq(carriers.id, input.carrierId));
  const [policyRow] = await tx.select().from(policies).where(eq(policies.terminalId, terminalId));
  const openHolds = await tx
    .select()
    .from(holds)
    .where(and(eq(holds.trailerId, trailer.id), isNull(holds.releasedAt)));
  if (!carrier) throw new HandoffError('invalid', 'Unknown carrier.', { carrierId: ['Choose the carrier.'] });
  const held = openHolds.filter((h) => h.severity === 'out_of_service');
  if (input.kind === 'hook' && held.length) {
    throw new HandoffError(
      'conflict',
      `Trailer ${trailer.unitNumber} is out of service and may not leave the gate.`,
      undefined,
      held.map((h) => ({ reason: h.reason, severity: h.severity, caution: null })),
    );
  }

  const checklist = buildChecklist({
    kind: trailer.kind,
    hingesPerDoor: trailer.hingesPerDoor === 5 ? 5 : 4,
    axles: trailer.axleCount,
    tireLayout: trailer.tireLayout,
    fuelTankGallons: trailer.fuelTankGallons || undefined,
  });
  const items = normalizeItems(checklist, input.items);
  if (Object.keys(items.fieldErrors).length)
    throw new HandoffError('invalid', 'Some items need attention.', items.fieldErrors);

  const history = await listTimeline(trailer.id, tx);
  const last = history.at(-1);
  if (last && last.at.getTime() > now.getTime())
    throw new HandoffError('conflict', 'A later record of this trailer exists already.');

  const id = randomUUID();
  const isReefer = trailer.kind === 'reefer';
  const r = isReefer ? input.reefer : null;
  const event: HandoffEvent = {
    type: input.kind,
    id,
    at: now,
    party: {
      carrierId: carrier.id,
      carrierName: carrier.name,
      ...(actor.role === 'driver' ? { driverId: actor.id } : {}),
      driverName: input.driverName,
    },
    items: items.observations,
    fuelEighths: isReefer ? input.fuelEighths : null,
    reefer: r
      ? {
          isUnitOn: r.isUnitOn,
          setpointF: r.setpointF,
          returnAirF: r.returnAirF,
          engineHours: r.engineHours,
          preTrip:
            r.preTripResult !== 'not_run' && r.preTripAt
              ? { result: r.preTripResult === 'pass' ? 'passed' : 'failed', at: new Date(r.preTripAt) }
              : null,
        }
      : null,
    isLoaded: input.isLoaded,
    sealNumber: input.sealNumber ?? null,
  };
  const policy = makePolicy(
    Object.fromEntries(
      POLICY_KEYS.filter((k) => k in (policyRow?.data ?? {})).map((k) => [k, policyRow!.data[k]]),
    ),
  );
  const ev = evaluateHandoff({
    checklist,
    history,
    current: event,
    policy,
    now,
    timeZone: terminal.timeZone,
    terminalName: terminal.name,
  });

  if (input.kind === 'hook' && blocksHook(ev.holds)) {
    throw new HandoffError(
      'conflict',
      `What you recorded puts trailer ${trailer.unitNumber} out of service: it may not leave the gate. The trailer is now on hold; tell the terminal clerk.`,
      undefined,
      ev.holds.filter((h) => h.severity === 'out_of_service'),
      ev.holds,
    );
  }
  const evidence = damageEvidenceErrors(ev.damageKeys, items.rows, items.photoIds);
  if (Object.keys(evidence).length)
    throw new HandoffError('invalid', 'New or worse damage needs a photo and a note.', evidence);

  const photoIds = [...items.photoIds.values()].flat();
  const photoRows = photoIds.length
    ? await tx
        .select({ id: photos.id, sha256: photos.sha256 })
        .from(photos)
        .where(
          and(
            inArray(photos.id, photoIds),
            eq(photos.trailerId, trailer.id),
            eq(photos.status, 'stored'),
            isNull(photos.handoffId),
            eq(photos.uploadedById, actor.id),
          ),
        )
    : [];
  if (photoRows.length !== photoIds.length) {
    throw new HandoffError(
      'invalid',
      'A photo is missing, still uploading, or belongs to another record. Take it again.',
    );
  }

  const spotId = input.kind === 'drop' ? await chooseSpot(tx, terminalId, input.spotId) : null;
  const [prev] = await tx
    .select({ contentHash: handoffs.contentHash })
    .from(handoffs)
    .where(eq(handoffs.trailerId, trailer.id))
    .orderBy(desc(handoffs.occurredAt), desc(handoffs.createdAt))
    .limit(1);
  const row = {
    id,
    trailerId: trailer.id,
    terminalId,
    kind: input.kind,
    level: 'full' as const,
    carrierId: carrier.id,
    driverId: actor.role === 'driver' ? actor.id : null,
    driverName: input.driverName,
    tractorNumber: input.tractorNumber,
    recordedById: actor.id,
    isLoaded: input.isLoaded,
    sealNumber: input.sealNumber ?? null,
    fuelEighths: event.fuelEighths ?? null,
    isReeferOn: r?.isUnitOn ?? null,
    setpointTenthsF: r?.setpointF == null ? null : Math.round(r.setpointF * 10),
    returnAirTenthsF: r?.returnAirF == null ? null : Math.round(r.returnAirF * 10),
    engineHoursTenths: r?.engineHours == null ? null : Math.round(r.engineHours * 10),
    pretripResult: r?.preTripResult ?? null,
    pretripAt: r?.preTripAt ? new Date(r.preTripAt) : null,
    note: input.note ?? null,
    occurredAt: now,
    idempotencyKey: input.idempotencyKey,
    correctsHandoffId: input.correctsHandoffId ?? null,
    verificationCode: newVerificationCode(),
    prevHash: prev?.contentHash ?? null,
  };
  const contentHash = handoffContentHash(
    hashableFromRows(
      row,
      items.rows,
      photoRows.map((p) => p.sha256),
    ),
  );
  await tx.insert(handoffs).values({ ...row, contentHash });
  if (items.rows.length)
    await tx.insert(handoffItems).values(items.rows.map((i) => ({ ...i, handoffId: id })));
  for (const [itemKey, ids] of items.photoIds) {
    await tx.update(photos).set({ handoffId: id, itemKey }).where(inArray(photos.id, ids));
  }

  let caseId: string | null = null;
  if (ev.damageKeys.length) {
    const [c] = await tx
      .insert(cases)
      .values({
        handoffId: id,
        trailerId: trailer.id,
        terminalId,
        proposedCarrierId: ev.proposedCarrierId,
        state: 'open',
        estimateCents: 0,
        openedAt: now,
      })
      .returning({ id: cases.id });
    caseId = c.id;
    await tx.insert(caseEvents).values({
      caseId,
      kind: 'opened',
      toState: 'open',
      actorId: actor.id,
      note: `Opened by the ${input.kind} of ${trailer.unitNumber}.`,
    });
  }
  const handoffIds = new Set(history.filter((e) => e.type === 'drop' || e.type === 'hook').map((e) => e.id));
  if (ev.rows.length) {
    await tx.insert(findings).values(
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
        caseId: f.isDamage ? caseId : null,
      })),
    );
  }
  // the repair estimate from the rate card, in the same transaction as the case
  if (caseId) await priceCase(tx, caseId, now);
  const already = new Set(openHolds.map((h) => `${h.ruleKey}|${h.itemKey ?? ''}`));
  const newHolds = ev.holds.filter((h) => !already.has(`${h.ruleKey}|${h.itemKey ?? ''}`));
  if (newHolds.length) {
    await tx.insert(holds).values(
      newHolds.map((h) => ({
        trailerId: trailer.id,
        handoffId: id,
        severity: h.severity,
        restriction: h.restriction,
        ruleKey: h.ruleKey,
        itemKey: h.itemKey,
        reason: h.reason,
        source: h.source,
        placedById: actor.id,
        placedAt: now,
      })),
    );
  }

  await tx
    .update(trailers)
    .set(
      input.kind === 'drop'
        ? {
            status: 'in_yard',
            currentTerminalId: terminalId,
            currentSpotId: spotId,
            gateInAt: now,
            lastSeenAt: now,
            isLoaded: input.isLoaded,
            fuelEighths: row.fuelEighths,
            isReeferOn: row.isReeferOn,
            setpointTenthsF: row.setpointTenthsF,
          }
        : {
            status: 'on_road',
            currentTerminalId: null,
            currentSpotId: null,
            gateInAt: null,
            lastSeenAt: now,
            isLoaded: input.isLoaded,
            fuelEighths: row.fuelEighths,
            isReeferOn: row.isReeferOn,
            setpointTenthsF: row.setpointTenthsF,
          },
    )
    .where(eq(trailers.id, trailer.id));
  await recordAuditRow(
    {
      actorId: actor.id,
      action: `handoff.${input.kind}`,
      entityType: 'handoff',
      entityId: id,
      detail: { trailerId: trailer.id, findings: ev.rows.length, holds: newHolds.length, caseId },
    },
    tx,
  );

  if (opts.sendReceipt !== false) {
    const [driver] = row.driverId
      ? await tx.select({ email: users.email }).from(users).where(eq(users.id, row.driverId))
      : [];
    const [spot] = spotId
      ? await tx.select({ label: yardSpots.label }).from(yardSpots).where(eq(yardSpots.id, spotId))
      : [];
    await enqueueReceiptEmail(
      tx,
      driver?.email ?? carrier.contactEmail,
      {
        handoffId: id,
        unitNumber: trailer.unitNumber,
        kind: input.kind,
        occurredAt: now,
        terminalName: terminal.name,
        timeZone: terminal.timeZone,
        carrierName: carrier.name,
        driverName: input.driverName,
        tractorNumber: input.tractorNumber,
        isLoaded: input.isLoaded,
        sealNumber: row.sealNumber,
        fuelEighths: row.fuelEighths,
        spotLabel: spot?.label ?? null,
        verificationCode: row.verificationCode,
        contentHash,
        findings: ev.rows,
        holds: [
          ...openHolds.map((h) => ({ severity: h.severity, restriction: h.restriction, reason: h.reason })),
          ...newHolds,
        ],
        photos: photoRows.map((p) => ({ id: p.id, itemKey: null })),
      },
      opts.appUrl,
    );
  }
  return { handoffId: id, verificationCode: row.verificationCode, isReplay: false };
}
