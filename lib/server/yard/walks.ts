import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import {
  findScanByClientKey,
  insertWalkScan,
  isLiveSpotOf,
  nextScanSeq,
  recordSighting,
  trailerBasics,
} from '@/db/queries/yard-walk-scans';
import { insertWalk, lockWalk, rowIdsOfTerminal } from '@/db/queries/yard-walks';
import { abort, done, refuseField, settle, refuse, type Result } from '@/lib/result';
import type { WalkScanInput } from '@/lib/validation/yard';
import { NO_TERMINAL, type YardActor } from './actor';
import { identifyTrailer } from './identify';

/** Starts a walk of some rows of the actor's yard. */
export async function startWalk(
  actor: YardActor,
  input: { rowIds: string[] },
): Promise<Result<{ id: string }>> {
  const terminalId = actor.terminalId;
  if (!terminalId) return NO_TERMINAL;
  const rowIds = [...new Set(input.rowIds)];
  const ours = await rowIdsOfTerminal(terminalId, rowIds);
  if (ours.length !== rowIds.length) return refuseField('invalid', 'rowIds', 'Choose rows of this yard.');
  return db.transaction(async (tx) => {
    const id = await insertWalk(tx, { terminalId, startedById: actor.id, rowIds });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'yard.walk_started',
        entityType: 'yard_walk',
        entityId: id,
        detail: { rowIds },
      },
      tx,
    );
    return done({ id });
  });
}

export type ScanStored = { seq: number; isRepeat: boolean; unitNumber: string | null };

/**
 * Stores one walk scan, idempotent by `clientKey`: a re-send of a stored scan answers it again.
 * A known trailer takes the scan's last-seen time, and a reefer its readings, unless a later
 * sighting is stored.
 */
export async function addWalkScan(
  actor: YardActor,
  walkId: string,
  input: WalkScanInput,
): Promise<Result<ScanStored>> {
  const terminalId = actor.terminalId;
  if (!terminalId) return NO_TERMINAL;
  return settle(() =>
    db.transaction(async (tx) => {
      const walk = await lockWalk(tx, walkId, terminalId);
      if (!walk) abort(refuse('not_found', 'No such walk in this yard.'));
      const existing = await findScanByClientKey(tx, input.clientKey);
      if (existing) {
        if (existing.walkId !== walkId)
          abort(refuseField('conflict', 'clientKey', 'This scan key belongs to another walk.'));
        const named = existing.trailerId ? await trailerBasics(tx, existing.trailerId) : null;
        return done({ seq: existing.seq, isRepeat: true, unitNumber: named?.unitNumber ?? null });
      }
      if (walk.status !== 'in_progress')
        abort(refuse('conflict', 'This walk is finished; the scan was not added.'));
      if (!(await isLiveSpotOf(tx, terminalId, input.spotId)))
        abort(refuseField('invalid', 'spotId', 'That slot is not in this yard.'));
      const trailerId = await identifyTrailer(input.scannedText, tx);
      const seq = await nextScanSeq(tx, walkId);
      const scannedAt = new Date(input.scannedAt);
      await insertWalkScan(tx, { ...input, walkId, seq, trailerId, scannedAt });
      const trailer = trailerId ? await trailerBasics(tx, trailerId) : null;
      if (trailerId && trailer)
        await recordSighting(tx, trailerId, scannedAt, readingsFor(trailer.kind, input));
      return done({ seq, isRepeat: false, unitNumber: trailer?.unitNumber ?? null });
    }),
  );
}

/** A dry van has no reefer unit, so only a reefer takes the fuel and unit readings; unread ones stay. */
function readingsFor(kind: 'reefer' | 'dry_van', scan: WalkScanInput) {
  if (kind !== 'reefer') return {};
  return {
    ...(scan.fuelEighths !== null ? { fuelEighths: scan.fuelEighths } : {}),
    ...(scan.isUnitRunning !== null ? { isReeferOn: scan.isUnitRunning } : {}),
    ...(scan.setpointTenthsF !== null ? { setpointTenthsF: scan.setpointTenthsF } : {}),
  };
}
