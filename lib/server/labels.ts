import 'server-only';
import { getLabelStanding } from '@/db/queries/labels';
import { signLabelToken, verifyLabelToken } from '@/lib/engine/identity/label-token';

const MISSING_SECRET =
  'LABEL_SECRET is not set. scripts/env.sh sets it for local runs; production must set it (32+ characters).';

/** The label signing secret, read in this one place. Missing in production is a clear startup-time error. */
export function labelSecret(): string {
  const secret = process.env.LABEL_SECRET;
  if (!secret || secret.length < 32) throw new Error(MISSING_SECRET);
  return secret;
}

/** Where links point: APP_URL without a trailing slash (kept short so the QR stays a small version). */
export function appUrl(): string {
  return (process.env.APP_URL ?? 'http://localhost:3000').replace(/\/+$/, '');
}

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
