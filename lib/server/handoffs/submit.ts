// The one way a handoff is recorded: POST /api/handoffs and the demo seed both call submitHandoff.
import 'server-only';
import { db } from '@/db';
import { isLockNotAvailable, isUniqueViolation } from '@/db/errors';
import { findHandoffByKey } from '@/db/queries/handoff-submit';
import { done, isRefusal, refuse, settle, type Result } from '@/lib/result';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import { recordHandoff } from './record';
import { isRefusedHook, settleRefusedHook } from './refused-hook';
import { replay } from './replay';
import type { HandoffActor, SubmitOptions, SubmitResult } from './types';

export type { HandoffActor, SubmitResult } from './types';

/**
 * Records a drop or hook in one transaction (record.ts, store.ts). Idempotent by
 * `input.idempotencyKey`: a retry answers the same handoff. A concurrent submit for the same
 * trailer is refused as a conflict. A refused hook carries `detail.holds`, the reasons.
 */
export async function submitHandoff(
  input: HandoffSubmitInput,
  actor: HandoffActor,
  opts: SubmitOptions = {},
): Promise<Result<SubmitResult>> {
  const now = opts.now ?? new Date();
  const earlier = await findHandoffByKey(db, input.idempotencyKey);
  if (earlier) return replay(earlier, input, actor);
  let outcome;
  try {
    outcome = await settle(() => db.transaction((tx) => recordHandoff(tx, input, actor, now, opts)));
  } catch (error) {
    if (isLockNotAvailable(error)) {
      return refuse(
        'conflict',
        'Another handoff of this trailer is being recorded right now. Wait a moment, then submit again.',
      );
    }
    // the same draft submitted twice at once: the second insert loses the race on the key
    if (isUniqueViolation(error, 'handoffs_idempotency_key_unique')) {
      const row = await findHandoffByKey(db, input.idempotencyKey);
      if (row) return replay(row, input, actor);
    }
    // the last wall behind slots.ts's locks: a slot filled under us is a conflict to retry, never a 500
    if (isUniqueViolation(error, 'trailers_current_spot')) {
      return refuse('conflict', 'That slot was taken a moment ago. Submit again to get another slot.', {
        spotId: ['That slot was taken a moment ago.'],
      });
    }
    throw error;
  }
  if (!isRefusal(outcome)) return done(outcome);
  if (input.kind === 'hook' && isRefusedHook(outcome)) return settleRefusedHook(outcome, input, actor, now);
  return outcome;
}
