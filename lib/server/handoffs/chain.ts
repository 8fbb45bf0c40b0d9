import 'server-only';
import { listChainRecords } from '@/db/queries/handoff-chain';
import { checkTrailerChain, type TrailerChain } from '@/lib/handoffs/chain';

/** Whether the trailer's stored handoffs still hash to what was stored, and the time of the first that does not. */
export async function verifyTrailerChain(trailerId: string): Promise<TrailerChain> {
  return checkTrailerChain(await listChainRecords(trailerId));
}
