import 'server-only';
import type { HandoffByKey } from '@/db/queries/handoff-submit';
import { done, refuse, type Result } from '@/lib/result';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import type { HandoffActor, SubmitResult } from './types';

/** A submit whose draft key is stored already: the same handoff again, if it is the same draft. */
export function replay(
  row: HandoffByKey,
  input: HandoffSubmitInput,
  actor: HandoffActor,
): Result<SubmitResult> {
  if (row.trailerId !== input.trailerId || row.recordedById !== actor.id) {
    return refuse('conflict', 'This draft key was already used for another handoff. Start a new draft.');
  }
  return done({ handoffId: row.id, verificationCode: row.code, isReplay: true });
}
