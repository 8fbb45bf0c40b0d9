import 'server-only';
import type { db, Tx } from '@/db';
import { findTrailerIdByUnit, findTrailerIdByVin } from '@/db/queries/yard-identify';
import { classifyScanText } from '@/lib/yard/scan-text';
import { resolveLabelToken } from '../labels';

/**
 * The trailer a scanned or typed text names (current label link, VIN or unit number), or null.
 * A replaced or forged label names no trailer (it shows as unknown in a walk).
 */
export async function identifyTrailer(text: string, tx?: Tx | typeof db): Promise<string | null> {
  const target = classifyScanText(text);
  if (target.kind === 'label') {
    const label = await resolveLabelToken(target.token);
    return label.ok ? label.trailerId : null;
  }
  return target.kind === 'vin'
    ? findTrailerIdByVin(target.vin, tx)
    : findTrailerIdByUnit(target.unitNumber, tx);
}
