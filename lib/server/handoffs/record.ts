// The submit's transaction: checks the trailer and the record, runs the engine once, then hands
// the outcome to store.ts. Every expected refusal aborts, so nothing is written.
import 'server-only';
import { randomUUID } from 'node:crypto';
import type { Tx } from '@/db';
import {
  findHandoffByKey,
  getCarrier,
  latestHandoffId,
  getPolicyData,
  getTerminal,
  listOpenHoldRows,
  listUnattachedPhotos,
  lockTrailer,
} from '@/db/queries/handoff-submit';
import { skipCommitFlush } from '@/db/queries/handoff-writes';
import { decideHook, safetyGaps } from '@/lib/engine';
import { evaluateHandoff } from '@/lib/handoffs/evaluation';
import { HOOK_WORDS, holdReasons } from '@/lib/handoffs/holds';
import { damageEvidenceErrors, normalizeItems } from '@/lib/handoffs/items';
import { handoffEvent, submissionHash } from '@/lib/handoffs/submission';
import { abort, refuse } from '@/lib/result';
import { terminalPolicyOf } from '@/lib/terminal/policy';
import { checklistOf } from '@/lib/trailers/checklist';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import { replay } from './replay';
import { correctionTarget } from './correction';
import { storeHandoff } from './store';
import { loadTimeline } from './timeline';
import type { HandoffActor, SubmitOptions, SubmitResult } from './types';

/**
 * Holds a NOWAIT row lock on the trailer for the whole transaction, so a concurrent submit for
 * the same trailer fails fast (55P03) instead of recording against a stale timeline.
 */
export async function recordHandoff(
  tx: Tx,
  input: HandoffSubmitInput,
  actor: HandoffActor,
  now: Date,
  opts: SubmitOptions,
): Promise<SubmitResult> {
  if (opts.isBulk) await skipCommitFlush(tx);
  const trailer = await lockTrailer(tx, input.trailerId, { noWait: true });
  if (!trailer) abort(refuse('not_found', 'No such trailer.'));
  const again = await findHandoffByKey(tx, input.idempotencyKey);
  if (again) {
    const r = replay(again, input, actor);
    return r.ok ? r.value : abort(r);
  }

  // a correction stands in for an earlier record: it neither moves the trailer nor follows its state
  const original = input.correctsHandoffId ? await correctionTarget(tx, input, actor, now) : null;

  if (!original && input.kind === 'drop' && trailer.status === 'in_yard') {
    abort(
      refuse(
        'conflict',
        `Trailer ${trailer.unitNumber} is already in the yard; record a hook to take it out.`,
      ),
    );
  }
  if (!original && input.kind === 'hook' && trailer.status !== 'in_yard') {
    abort(
      refuse('conflict', `Trailer ${trailer.unitNumber} is not in the yard; record a drop to bring it in.`),
    );
  }
  const terminalId = original
    ? original.terminalId
    : input.kind === 'drop'
      ? actor.terminalId
      : trailer.currentTerminalId;
  if (!terminalId) abort(refuse('invalid', 'Your account has no home terminal; ask the terminal manager.'));
  if (actor.role === 'driver' && input.carrierId !== actor.carrierId) {
    abort(
      refuse('invalid', 'A driver records handoffs for their own carrier.', {
        carrierId: ['Choose your own carrier.'],
      }),
    );
  }
  const terminal = (await getTerminal(tx, terminalId))!;
  const carrier = await getCarrier(tx, input.carrierId);
  const policy = terminalPolicyOf(await getPolicyData(tx, terminalId)).engine;
  const openHolds = await listOpenHoldRows(tx, trailer.id);
  if (!carrier) abort(refuse('invalid', 'Unknown carrier.', { carrierId: ['Choose the carrier.'] }));
  const before = !original && input.kind === 'hook' ? decideHook(openHolds, input.isLoadPerishable) : null;
  if (before?.outcome === 'refused') {
    abort(
      refuse('conflict', HOOK_WORDS.refused(trailer.unitNumber, before.because, false), undefined, {
        holds: holdReasons(before.holds, terminal.timeZone),
      }),
    );
  }
  if (before?.outcome === 'ask_perishable') {
    abort(
      refuse('invalid', HOOK_WORDS.perishableAsk(trailer.unitNumber), {
        isLoadPerishable: [HOOK_WORDS.perishableField],
      }),
    );
  }

  const checklist = checklistOf(trailer);
  const items = normalizeItems(checklist, input.items);
  const gaps = safetyGaps(checklist, {
    items: items.observations,
    isLoaded: input.isLoaded,
    isUnitOn: trailer.kind === 'reefer' ? input.reefer?.isUnitOn : null,
  });
  for (const g of gaps) items.fieldErrors[g.field] ??= [g.message];
  if (Object.keys(items.fieldErrors).length) {
    const message = gaps.length
      ? `${gaps.length === 1 ? 'One safety item is' : `${gaps.length} safety items are`} not answered: look at each and answer it.`
      : 'Some items need attention.';
    abort(refuse('invalid', message, items.fieldErrors));
  }

  const timeline = await loadTimeline(trailer.id, tx);
  const last = timeline.at(-1);
  if (!original && last && last.at.getTime() > now.getTime())
    abort(refuse('conflict', 'A later record of this trailer exists already.'));
  // a correction is compared with what came before the record it corrects, at that record's time
  const standing = original ? timeline.findIndex((e) => e.id === original.id) : -1;
  const history = original && standing >= 0 ? timeline.slice(0, standing) : timeline;
  const at = original && standing >= 0 ? timeline[standing].at : now;

  const event = handoffEvent(input, {
    id: randomUUID(),
    at,
    party: {
      carrierId: carrier.id,
      carrierName: carrier.name,
      driverId: actor.role === 'driver' ? actor.id : null,
    },
    isReefer: trailer.kind === 'reefer',
    observations: items.observations,
  });
  const ev = evaluateHandoff({
    checklist,
    history,
    current: original ? { ...event, correctedAt: now } : event,
    policy,
    now: at,
    timeZone: terminal.timeZone,
    terminalName: terminal.name,
  });

  const found = !original && input.kind === 'hook' ? decideHook(ev.holds, input.isLoadPerishable) : null;
  if (found?.outcome === 'refused') {
    // the holds this record found travel with the refusal: submit.ts places them on the trailer
    abort(
      refuse('conflict', HOOK_WORDS.refused(trailer.unitNumber, found.because, true), undefined, {
        holds: holdReasons(found.holds, terminal.timeZone),
        found: ev.holds,
        timeZone: terminal.timeZone,
      }),
    );
  }
  if (found?.outcome === 'ask_perishable') {
    abort(
      refuse('invalid', HOOK_WORDS.perishableAsk(trailer.unitNumber), {
        isLoadPerishable: [HOOK_WORDS.perishableField],
      }),
    );
  }
  const askedPerishable =
    (before?.outcome === 'allowed' && before.askedPerishable) ||
    (found?.outcome === 'allowed' && found.askedPerishable);
  const evidence = damageEvidenceErrors(ev.damageKeys, items.rows, items.photoIds);
  if (Object.keys(evidence).length)
    abort(refuse('invalid', 'New or worse damage needs a photo and a note.', evidence));

  const photoIds = [...items.photoIds.values()].flat();
  const photos = await listUnattachedPhotos(tx, photoIds, { trailerId: trailer.id, uploadedById: actor.id });
  if (photos.length !== photoIds.length) {
    abort(
      refuse('invalid', 'A photo is missing, still uploading, or belongs to another record. Take it again.'),
    );
  }

  return storeHandoff(tx, {
    input,
    actor,
    trailer,
    terminal,
    carrier,
    event,
    evaluation: ev,
    items,
    photos,
    openHolds,
    history,
    sendReceipt: opts.sendReceipt !== false,
    requestHash: submissionHash(input),
    recordedAt: now,
    correction: original ? { isOfLatest: (await latestHandoffId(tx, trailer.id)) === original.id } : null,
    isLoadPerishable: askedPerishable ? (input.isLoadPerishable ?? null) : null,
  });
}
