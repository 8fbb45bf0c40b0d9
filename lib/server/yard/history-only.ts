import 'server-only';
import type { Tx } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { hasOpenOutOfServiceHold, insertYardMove, spotLabel } from '@/db/queries/yard-moves';
import type { Move, Moved } from './moves';

/**
 * A move that reached the server after a move made later (queued on a phone without signal):
 * recorded in the trailer's history at the time it was made, from where the later move found the
 * trailer, without touching where the trailer stands now, the later move's slot being newer
 * news. The target's occupant is not checked: the board of that moment is gone.
 */
export async function historyOnly(
  tx: Tx,
  move: Move,
  at: {
    unitNumber: string;
    spotId: string | null;
    target: { id: string; label: string };
    movedAt: Date;
    fromSpotId: string | null;
  },
): Promise<Moved> {
  const moveId = await insertYardMove(tx, {
    trailerId: move.trailerId,
    terminalId: move.terminalId,
    fromSpotId: at.fromSpotId,
    toSpotId: at.target.id,
    movedById: move.actorId,
    clientKey: move.clientKey ?? null,
    movedAt: at.movedAt,
  });
  const [fromLabel, laterSpotLabel] = await Promise.all([
    at.fromSpotId ? spotLabel(tx, at.fromSpotId) : null,
    at.spotId ? spotLabel(tx, at.spotId) : null,
  ]);
  await recordAudit(
    {
      actorId: move.actorId,
      action: 'yard.move',
      entityType: 'trailer',
      entityId: move.trailerId,
      detail: {
        moveId,
        from: fromLabel,
        to: at.target.label,
        reason: move.reason,
        madeAt: at.movedAt.toISOString(),
        historyOnly: true,
        standsIn: laterSpotLabel,
      },
    },
    tx,
  );
  const isOutOfService = await hasOpenOutOfServiceHold(tx, move.trailerId);
  return {
    moveId,
    unitNumber: at.unitNumber,
    fromLabel,
    toLabel: at.target.label,
    isOutOfService,
    laterSpotLabel,
  };
}
