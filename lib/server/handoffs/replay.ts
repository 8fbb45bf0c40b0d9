import 'server-only';
import type { HandoffByKey } from '@/db/queries/handoff-submit';
import { submissionHash } from '@/lib/handoffs/submission';
import { done, refuse, type Result } from '@/lib/result';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import type { HandoffActor, SubmitResult } from './types';

/**
 * A submit whose draft key is stored already: the same handoff again if it is the same draft
 * (same trailer, same recorder, same body). Anything else reusing the key is refused, so a retry
 * can never quietly stand for a record with other content.
 */
export function replay(
  row: HandoffByKey,
  input: HandoffSubmitInput,
  actor: HandoffActor,
): Result<SubmitResult> {
  if (row.trailerId !== input.trailerId || row.recordedById !== actor.id) {
    return refuse('conflict', 'This draft key was already used for another handoff. Start a new draft.');
  }
  // rows stored before bodies were fingerprinted have no hash: trailer and recorder are all they can compare
  if (row.requestHash && row.requestHash !== submissionHash(input)) {
    return refuse(
      'conflict',
      'This draft key was already used for a handoff with different content. The first one stands; to change it, record a correction.',
    );
  }
  return done({ handoffId: row.id, verificationCode: row.code, isReplay: true });
}
