import 'server-only';
import { getLabelStanding } from '@/db/queries/labels';
import { signLabelToken, verifyLabelToken } from '@/lib/engine/identity/label-token';
import { appUrl, labelSecret } from './env';

export function labelToken(label: { id: string; trailerId: string }): string {
  return signLabelToken({ labelId: label.id, trailerId: label.trailerId }, labelSecret());
}

export function labelLink(label: { id: string; trailerId: string }): string {
  return `${appUrl()}/l/${labelToken(label)}`;
}

export type LabelResolution =
  | { ok: true; trailerId: string; labelId: string }
  | { ok: false; error: 'not_ours' }
  | { ok: false; error: 'revoked'; replacedAt: Date | null };

/**
 * Checks a scanned token: signature first (forged or damaged → not_ours), then that the label
 * exists for that trailer and is still its current label (otherwise revoked, with the date).
 */
export async function resolveLabelToken(token: string): Promise<LabelResolution> {
  const verified = verifyLabelToken(token, labelSecret());
  if (!verified.ok) return { ok: false, error: 'not_ours' };
  const standing = await getLabelStanding(verified.labelId);
  if (!standing || standing.trailerId !== verified.trailerId) return { ok: false, error: 'not_ours' };
  if (!standing.isCurrent) return { ok: false, error: 'revoked', replacedAt: standing.replacedAt };
  return { ok: true, trailerId: verified.trailerId, labelId: verified.labelId };
}
