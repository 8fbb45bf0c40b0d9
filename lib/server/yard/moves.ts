import 'server-only';
import { db, type Tx } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import {
  findSpotByLabel,
  hasOpenOutOfServiceHold,
  insertYardMove,
  lockOccupant,
  lockSpot,
  lockTrailerPlace,
  setTrailerSpot,
  spotLabel,
} from '@/db/queries/yard-moves';
import { abort, done, refuse, refuseField, settle, type FieldErrors, type Result } from '@/lib/result';
import type { MoveInput } from '@/lib/validation/yard';
import { NO_TERMINAL, type YardActor } from './actor';
import { identifyTrailer } from './identify';

export type Moved = {
  moveId: string;
  unitNumber: string;
  fromLabel: string | null;
  toLabel: string;
  isOutOfService: boolean;
};

type Move = {
  terminalId: string;
  actorId: string;
  trailerId: string;
  /** Null when the typed slot or door matched nothing (told together with the unit's own answer). */
  toSpotId: string | null;
  reason: string;
};

/**
 * Moves a trailer of this terminal's yard into a slot or door, inside the caller's transaction.
 * Locks the trailer, the target spot and any occupant; an occupied target is refused naming the
 * occupant (the refusal aborts the transaction). Custody stays with the terminal: a yard move,
 * not a handoff.
 */
export async function moveInTransaction(tx: Tx, move: Move, now: Date): Promise<Moved> {
  const trailer = await lockTrailerPlace(tx, move.trailerId);
  const target = move.toSpotId ? await lockSpot(tx, move.terminalId, move.toSpotId) : null;
  // a unit not in this yard and a slot that is not there are both told, each under its field
  const fieldErrors: FieldErrors = {};
  if (!trailer || trailer.terminalId !== move.terminalId || trailer.status !== 'in_yard')
    fieldErrors.unit = [`${trailer?.unitNumber ?? 'That trailer'} is not in this terminal's yard.`];
  if (!target || target.retiredAt) fieldErrors.target = ['No such slot or door in this yard.'];
  if (!trailer || !target || fieldErrors.unit || fieldErrors.target)
    abort(refuse('not_found', Object.values(fieldErrors).flat().join(' '), fieldErrors));
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
  });
  await setTrailerSpot(tx, move.trailerId, target.id, now);
  const isOutOfService = await hasOpenOutOfServiceHold(tx, move.trailerId);
  await recordAudit(
    {
      actorId: move.actorId,
      action: 'yard.move',
      entityType: 'trailer',
      entityId: move.trailerId,
      detail: { moveId, from: fromLabel, to: target.label, reason: move.reason },
    },
    tx,
  );
  return { moveId, unitNumber: trailer.unitNumber, fromLabel, toLabel: target.label, isOutOfService };
}

/** A jockey's move: the unit (number, VIN or label link) into the slot or door with that label. */
export async function recordMove(actor: YardActor, input: MoveInput): Promise<Result<Moved>> {
  const terminalId = actor.terminalId;
  if (!terminalId) return NO_TERMINAL;
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
  };
  return settle(() => db.transaction(async (tx) => done(await moveInTransaction(tx, move, new Date()))));
}
