import 'server-only';
import { db, type Tx } from '@/db';
import { isUniqueViolation } from '@/db/errors';
import { recordAudit } from '@/db/queries/audit';
import {
  insertRow,
  insertSpot,
  isRowOf,
  setSpotRetired,
  updateRowName,
  updateSpotLabel,
} from '@/db/queries/yard-layout';
import { lockOccupant, lockSpot } from '@/db/queries/yard-moves';
import { abort, done, refuse, refuseField, settle, type Refusal, type Result } from '@/lib/result';
import { NO_TERMINAL, type YardActor } from './actor';

// Unique indexes of db/tables/core.ts: a row name and a spot label are each used once per terminal.
const ROW_NAME = 'yard_rows_terminal_name';
const SPOT_LABEL = 'yard_spots_terminal_label';

type Edited = {
  id: string;
  action: string;
  entityType: 'yard_row' | 'yard_spot';
  detail: Record<string, unknown>;
};
type Taken = { index: string; refusal: Refusal };

/** Runs one layout edit in a transaction with its audit entry; a name already used comes back as `taken`. */
async function edit(
  actor: YardActor,
  work: (tx: Tx, terminalId: string) => Promise<Edited>,
  taken?: Taken,
): Promise<Result<{ id: string }>> {
  const terminalId = actor.terminalId;
  if (!terminalId) return NO_TERMINAL;
  try {
    return await settle(() =>
      db.transaction(async (tx) => {
        const { id, ...entry } = await work(tx, terminalId);
        await recordAudit({ actorId: actor.id, entityId: id, ...entry }, tx);
        return done({ id });
      }),
    );
  } catch (e) {
    if (taken && isUniqueViolation(e, taken.index)) return taken.refusal;
    throw e;
  }
}

const rowTaken = (name: string): Taken => ({
  index: ROW_NAME,
  refusal: refuseField('conflict', 'name', `A row named ${name} already exists.`),
});
const labelTaken = (label: string, field: string): Taken => ({
  index: SPOT_LABEL,
  refusal: refuseField('conflict', field, `A slot or door labelled ${label} already exists.`),
});

export function addRow(actor: YardActor, input: { name: string }) {
  return edit(
    actor,
    async (tx, terminalId) => {
      const id = await insertRow(tx, terminalId, input.name);
      return { id, action: 'yard.row_created', entityType: 'yard_row', detail: { name: input.name } };
    },
    rowTaken(input.name),
  );
}

export function renameRow(actor: YardActor, input: { id: string; name: string }) {
  return edit(
    actor,
    async (tx, terminalId) => {
      if (!(await updateRowName(tx, terminalId, input.id, input.name)))
        abort(refuse('not_found', 'No such row in this yard.'));
      return {
        id: input.id,
        action: 'yard.row_renamed',
        entityType: 'yard_row',
        detail: { name: input.name },
      };
    },
    rowTaken(input.name),
  );
}

/** A slot goes into a row of this yard; a door belongs to no row. */
export function addSpot(actor: YardActor, input: { kind: 'slot' | 'door'; rowId?: string; label: string }) {
  const rowId = input.kind === 'slot' ? (input.rowId ?? null) : null;
  return edit(
    actor,
    async (tx, terminalId) => {
      if (rowId && !(await isRowOf(tx, terminalId, rowId)))
        abort(refuseField('not_found', 'rowId', 'No such row in this yard.'));
      const id = await insertSpot(tx, { terminalId, rowId, kind: input.kind, label: input.label });
      const detail = { label: input.label, kind: input.kind };
      return { id, action: 'yard.spot_created', entityType: 'yard_spot', detail };
    },
    labelTaken(input.label, 'label'),
  );
}

/** The rename form names its field `name` for rows and spots alike. */
export function renameSpot(actor: YardActor, input: { id: string; name: string }) {
  return edit(
    actor,
    async (tx, terminalId) => {
      if (!(await updateSpotLabel(tx, terminalId, input.id, input.name)))
        abort(refuse('not_found', 'No such slot or door in this yard.'));
      const detail = { label: input.name };
      return { id: input.id, action: 'yard.spot_renamed', entityType: 'yard_spot', detail };
    },
    labelTaken(input.name, 'name'),
  );
}

/** Retires an empty slot or door. One that still holds a trailer is refused with the occupant named. */
export function retireSpot(actor: YardActor, input: { id: string }) {
  return edit(actor, async (tx, terminalId) => {
    const spot = await lockSpot(tx, terminalId, input.id);
    if (!spot) abort(refuse('not_found', 'No such slot or door in this yard.'));
    if (spot.retiredAt) abort(refuse('conflict', `${spot.label} is already retired.`));
    const occupant = await lockOccupant(tx, spot.id);
    if (occupant)
      abort(refuse('conflict', `${spot.label} still holds ${occupant.unitNumber}: move it first.`));
    await setSpotRetired(tx, spot.id, new Date());
    return {
      id: spot.id,
      action: 'yard.spot_retired',
      entityType: 'yard_spot',
      detail: { label: spot.label },
    };
  });
}
