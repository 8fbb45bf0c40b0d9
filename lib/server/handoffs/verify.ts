// The public receipt check: a verification code → the record, recomputed from what is stored now.
// Vouches for the receipt only when the record's keyed link still matches its content and every
// record of the trailer before it does too; otherwise says so and shows none of the stored values.
import 'server-only';
import { findHandoffByCode, getReceiptByCode } from '@/db/queries/handoffs';
import type { RecordCheck } from '@/lib/handoffs/chain';
import type { ReceiptView } from '@/lib/handoffs/receipt';
import { verifyOneHandoff } from './chain';

export type ReceiptCheck =
  { status: 'genuine'; receipt: ReceiptView } | { status: Exclude<RecordCheck, 'matches'>; message: string };

export const NOT_MATCHING = 'This record does not match what was receipted.';

const WHY: Record<Exclude<RecordCheck, 'matches'>, string> = {
  altered: `${NOT_MATCHING} It was changed after the receipt was issued, so Hitchmark does not vouch for what it holds now. Keep your copy of the receipt and tell the terminal's clerk.`,
  earlier_broken: `${NOT_MATCHING} An earlier record of this trailer was changed after the fact, so Hitchmark cannot vouch for this one either. Keep your copy of the receipt and tell the terminal's clerk.`,
  unkeyed: `${NOT_MATCHING} It carries no keyed seal, so Hitchmark cannot vouch for it. Keep your copy of the receipt and tell the terminal's clerk.`,
};

/** Null when no handoff has this code. */
export async function checkReceipt(code: string): Promise<ReceiptCheck | null> {
  const ref = await findHandoffByCode(code);
  if (!ref) return null;
  const status = await verifyOneHandoff(ref.trailerId, ref.id);
  if (status !== 'matches') return { status, message: WHY[status] };
  const receipt = await getReceiptByCode(code);
  return receipt ? { status: 'genuine', receipt } : null;
}
