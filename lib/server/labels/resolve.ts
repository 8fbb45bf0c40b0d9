import 'server-only';
import { getCurrentLabel, getLabel } from '@/db/queries/labels';
import { verifyLabelToken } from '@/lib/engine/identity/label-token';
import { labelStanding } from '@/lib/labels/standing';
import { labelSecret } from '../env';

export type LabelResolution =
  | { ok: true; trailerId: string; labelId: string }
  | { ok: false; error: 'not_ours' }
  | { ok: false; error: 'revoked'; replacedAt: Date | null };

/**
 * Checks a scanned token: signature first (forged or damaged → not_ours), then that the label
 * exists for that trailer and is still its current label (otherwise revoked, with the date).
 * Each caller words the answer for its own reader (the scan page, the lookup API, a yard walk).
 */
export async function resolveLabelToken(token: string): Promise<LabelResolution> {
  const verified = verifyLabelToken(token, labelSecret());
  if (!verified.ok) return { ok: false, error: 'not_ours' };
  const label = await getLabel(verified.labelId);
  if (!label || label.trailerId !== verified.trailerId) return { ok: false, error: 'not_ours' };
  const standing = labelStanding(label, await getCurrentLabel(label.trailerId));
  if (!standing.isCurrent) return { ok: false, error: 'revoked', replacedAt: standing.replacedAt };
  return { ok: true, trailerId: label.trailerId, labelId: label.id };
}
