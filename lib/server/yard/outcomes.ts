import 'server-only';
import { db } from '@/db';
import { recordAudit } from '@/db/queries/audit';
import { lockOutcome, markTrailerGone, setOutcomeResolution } from '@/db/queries/yard-outcomes';
import { abort, done, refuse, settle, type Result } from '@/lib/result';
import type { WalkResolution } from '@/lib/yard/walk';
import { NO_TERMINAL, type YardActor } from './actor';
import { moveInTransaction } from './moves';

/**
 * What the clerk or jockey does about one walk outcome. `accepted` (wrong slot only) moves the
 * trailer to where it was seen, as a yard move; `marked_gone` (missing only) sets it gone and
 * frees the slot; `investigating` flags any outcome but a match. Each is written once and audited.
 */
export async function resolveOutcome(
  actor: YardActor,
  input: { outcomeId: string; resolution: WalkResolution },
): Promise<Result> {
  const terminalId = actor.terminalId;
  if (!terminalId) return NO_TERMINAL;
  const { outcomeId, resolution } = input;
  return settle(() =>
    db.transaction(async (tx) => {
      const o = await lockOutcome(tx, outcomeId, terminalId);
      if (!o) abort(refuse('not_found', 'No such walk outcome in this yard.'));
      if (o.resolution) abort(refuse('conflict', 'This outcome is already resolved.'));
      if (o.outcome === 'matched') abort(refuse('invalid', 'A matched trailer needs nothing done.'));
      const now = new Date();
      if (resolution === 'accepted') {
        if (o.outcome !== 'wrong_slot' || !o.trailerId || !o.spotId)
          abort(refuse('invalid', 'Only a trailer seen in the wrong slot can be corrected on the board.'));
        const move = { terminalId, actorId: actor.id, trailerId: o.trailerId, toSpotId: o.spotId };
        await moveInTransaction(tx, { ...move, reason: 'walk correction' }, now);
      } else if (resolution === 'marked_gone') {
        if (o.outcome !== 'missing' || !o.trailerId)
          abort(refuse('invalid', 'Only a missing trailer can be marked gone.'));
        await markTrailerGone(tx, o.trailerId, terminalId);
      }
      await setOutcomeResolution(tx, o.id, resolution, actor.id, now);
      await recordAudit(
        {
          actorId: actor.id,
          action: `yard.walk_outcome_${resolution}`,
          entityType: 'walk_outcome',
          entityId: o.id,
          detail: { walkId: o.walkId, outcome: o.outcome, trailerId: o.trailerId },
        },
        tx,
      );
      return done(undefined);
    }),
  );
}
