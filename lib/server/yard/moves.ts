import 'server-only';
import { db, type Tx } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import {
  findSpotByLabel,
  getMoveByClientKey,
  hasOpenOutOfServiceHold,
  firstMoveAfter,
  insertYardMove,
  lockOccupant,
  lockSpot,
  lockTrailerPlace,
  setTrailerSpot,
  spotLabel,
} from '@/db/queries/yard-moves';
import { abort, done, refuse, refuseField, settle, type FieldErrors, type Result } from '@/lib/result';
import type { MoveInput } from '@/lib/validation/yard';
import { madeAtProblem } from '@/lib/yard/move-time';
import { NO_TERMINAL, type YardActor } from './actor';
import { historyOnly } from './history-only';
import { identifyTrailer } from './identify';

export type Moved = {
  moveId: string;
  unitNumber: string;
  fromLabel: string | null;
  toLabel: string;
  isOutOfService: boolean;
  /** True when the phone's key named a move already recorded: nothing new was written. */
  isReplay?: boolean;
  /**
   * Set when a move made later already reached the server (a move queued without signal arrives
   * after another phone's newer one): this move is kept in the history only, and the trailer
   * stays where the later move put it, in this slot or door.
   */
  laterSpotLabel?: string | null;
};

export type Move = {
  terminalId: string;
  actorId: string;
  trailerId: string;
  /** Null when the typed slot or door matched nothing (told together with the unit's own answer). */
  toSpotId: string | null;
  reason: string;
  /** The phone's key: the same key twice records one move (a queued move sent again). */
  clientKey?: string;
  /** When the move was made (the phone's time of a queued move); the transaction's `now` if absent. */
  madeAt?: Date;
};

/** The move already recorded under this person's key, as the first answer gave it. */
async function replayOf(tx: Tx, actorId: string, clientKey: string): Promise<Moved | null> {
  const row = await getMoveByClientKey(tx, actorId, clientKey);
  if (!row) return null;
  const [fromLabel, toLabel] = await Promise.all([
    row.fromSpotId ? spotLabel(tx, row.fromSpotId) : null,
    spotLabel(tx, row.toSpotId),
  ]);
  const isOutOfService = await hasOpenOutOfServiceHold(tx, row.trailerId);
  return {
    moveId: row.moveId,
    unitNumber: row.unitNumber,
    fromLabel,
    toLabel: toLabel ?? '',
    isOutOfService,
    isReplay: true,
  };
}

/**
 * Moves a trailer of this terminal's yard into a slot or door, inside the caller's transaction.
 * Locks the trailer, the target spot and any occupant; an occupied target is refused naming the
 * occupant (the refusal aborts the transaction). Custody stays with the terminal: a yard move,
 * not a handoff.
 */
export async function moveInTransaction(tx: Tx, move: Move, now: Date): Promise<Moved> {
  const trailer = await lockTrailerPlace(tx, move.trailerId);
  // checked under the trailer's lock: a second send of the same key waits here for the first
  const replay = move.clientKey ? await replayOf(tx, move.actorId, move.clientKey) : null;
  if (replay) return replay;
  const target = move.toSpotId ? await lockSpot(tx, move.terminalId, move.toSpotId) : null;
  // a unit not in this yard and a slot that is not there are both told, each under its field
  const fieldErrors: FieldErrors = {};
  if (!trailer || trailer.terminalId !== move.terminalId || trailer.status !== 'in_yard')
    fieldErrors.unit = [`${trailer?.unitNumber ?? 'That trailer'} is not in this terminal's yard.`];
  if (!target || target.retiredAt) fieldErrors.target = ['No such slot or door in this yard.'];
  if (!trailer || !target || fieldErrors.unit || fieldErrors.target)
    abort(refuse('not_found', Object.values(fieldErrors).flat().join(' '), fieldErrors));
  // the move's time is when it was made; the row's created_at keeps when it reached the server
  const movedAt = move.madeAt ?? now;
  const later = move.madeAt ? await firstMoveAfter(tx, move.trailerId, movedAt) : null;
  if (later) return historyOnly(tx, move, { ...trailer, target, movedAt, fromSpotId: later.fromSpotId });
  if (trailer.spotId === target.id)
    abort(refuseField('invalid', 'target', `${trailer.unitNumber} is already in ${target.label}.`));
  const occupant = await lockOccupant(tx, target.id);
  if (occupant) {
    const unit = occupant.unitNumber;
    abort(
      refuseField(
        'conflict',
        'target',
        `${target.label} is occupied by ${unit}. Move ${unit} out first or choose another spot.`,
      ),
    );
  }
  const fromLabel = trailer.spotId ? await spotLabel(tx, trailer.spotId) : null;
  const moveId = await insertYardMove(tx, {
    trailerId: move.trailerId,
    terminalId: move.terminalId,
    fromSpotId: trailer.spotId,
    toSpotId: target.id,
    movedById: move.actorId,
    clientKey: move.clientKey ?? null,
    movedAt,
  });
  await setTrailerSpot(tx, move.trailerId, target.id, movedAt);
  const isOutOfService = await hasOpenOutOfServiceHold(tx, move.trailerId);
  await recordAudit(
    {
      actorId: move.actorId,
      action: 'yard.move',
      entityType: 'trailer',
      entityId: move.trailerId,
      detail: {
        moveId,
        from: fromLabel,
        to: target.label,
        reason: move.reason,
        madeAt: movedAt.toISOString(),
      },
    },
    tx,
  );
  return { moveId, unitNumber: trailer.unitNumber, fromLabel, toLabel: target.label, isOutOfService };
}

/** A jockey's move: the unit (number, VIN or label link) into the slot or door with that label. */
export async function recordMove(actor: YardActor, input: MoveInput): Promise<Result<Moved>> {
  const terminalId = actor.terminalId;
  if (!terminalId) return NO_TERMINAL;
  const { clientKey } = input;
  const now = new Date();
  const madeAt = input.madeAt ? new Date(input.madeAt) : undefined;
  // the schema checked the bounds when it parsed; checked again against this request's clock
  const problem = madeAt ? madeAtProblem(madeAt, now) : null;
  if (clientKey) {
    // sent again after a lost answer or from the outbox: answer the move already recorded, even if
    // the trailer has been moved on since (the unit or the target may no longer match)
    const replay = await db.transaction((tx) => replayOf(tx, actor.id, clientKey));
    if (replay) return done(replay);
  }
  if (problem) return refuseField('invalid', 'madeAt', problem);
  const [trailerId, spot] = await Promise.all([
    identifyTrailer(input.unit),
    findSpotByLabel(terminalId, input.target),
  ]);
  if (!trailerId) {
    // both answers at once, so a jockey with two typos fixes them in one go
    const messages = [`No trailer matches ${input.unit}.`];
    const fieldErrors: FieldErrors = { unit: ['No trailer with that unit number, VIN or label.'] };
    if (!spot) {
      messages.push(`No slot or door ${input.target} in this yard.`);
      fieldErrors.target = ['No such slot or door in this yard.'];
    }
    return refuse('not_found', messages.join(' '), fieldErrors);
  }
  const move = {
    terminalId,
    actorId: actor.id,
    trailerId,
    toSpotId: spot?.id ?? null,
    reason: 'jockey move',
    clientKey,
    madeAt,
  };
  return settle(() => db.transaction(async (tx) => done(await moveInTransaction(tx, move, now))));
}
