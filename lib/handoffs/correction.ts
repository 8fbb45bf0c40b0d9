// Who may correct a stored handoff, and when. Pure: the submit service loads the original and
// the terminal's policy and asks here once. A correction is its own append-only record; the
// original stays stored (and in the trailer file, marked as corrected).
import type { Role } from '@/lib/auth/roles';
import { refuse, type Refusal } from '@/lib/result';

export type CorrectionOriginal = {
  id: string;
  trailerId: string;
  kind: 'drop' | 'hook';
  recordedById: string;
  /** When the original was recorded (for a correction, when the correction was). */
  occurredAt: Date;
};

export type CorrectionAsk = {
  original: CorrectionOriginal | null;
  actor: { id: string; role: Role };
  input: { trailerId: string; kind: 'drop' | 'hook'; correctionReason?: string | null };
  now: Date;
  windowMinutes: number;
  /** The verification code of a record that corrects the original already, if any. */
  correctedByCode: string | null;
};

const FIELD = 'correctsHandoffId';
const isClerk = (role: Role) => role === 'clerk' || role === 'admin';

/**
 * Null when the correction may be recorded. Otherwise: an unknown original → invalid (422);
 * someone else's record, or the recorder after the terminal's window → forbidden (403); another
 * trailer or kind, or a clerk without a reason → invalid (422); already corrected → conflict (409).
 * A clerk (or admin) may correct any record at any time, with a reason.
 */
export function correctionRefusal(a: CorrectionAsk): Refusal | null {
  const { original, actor, input } = a;
  if (!original) {
    return refuse('invalid', 'No handoff has this id, so there is nothing to correct.', {
      [FIELD]: ['No handoff has this id.'],
    });
  }
  const clerk = isClerk(actor.role);
  if (!clerk && original.recordedById !== actor.id) {
    return refuse(
      'forbidden',
      'You may correct only a handoff you recorded yourself. Ask the terminal clerk to correct this one.',
      { [FIELD]: ['Someone else recorded this handoff.'] },
    );
  }
  if (original.trailerId !== input.trailerId) {
    return refuse('invalid', 'A correction is of the same trailer as the record it corrects.', {
      [FIELD]: ['That handoff is of another trailer.'],
    });
  }
  if (original.kind !== input.kind) {
    return refuse(
      'invalid',
      `The record you correct is a ${original.kind}; record the correction as a ${original.kind}.`,
      {
        kind: [`Choose ${original.kind}.`],
      },
    );
  }
  if (clerk && !input.correctionReason) {
    return refuse('invalid', 'Say why the record is corrected.', {
      correctionReason: ['Give the reason for the correction.'],
    });
  }
  if (!clerk) {
    const ageMinutes = (a.now.getTime() - original.occurredAt.getTime()) / 60_000;
    if (ageMinutes > a.windowMinutes) {
      return refuse(
        'forbidden',
        `Handoffs can be corrected by their driver for ${a.windowMinutes} minutes. Ask the terminal clerk to correct this one.`,
        { [FIELD]: ['The time to correct this handoff yourself has passed.'] },
      );
    }
  }
  if (a.correctedByCode) {
    return refuse(
      'conflict',
      `This handoff was corrected already (receipt ${a.correctedByCode}). Correct that record instead.`,
      { [FIELD]: ['Already corrected.'] },
    );
  }
  return null;
}
