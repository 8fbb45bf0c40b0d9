import 'server-only';
import { listChainRecords } from '@/db/queries/handoff-chain';
import { checkOneRecord, checkTrailerChain, type RecordCheck, type TrailerChain } from '@/lib/handoffs/chain';
import { chainKey } from '@/lib/server/env';

/** Whether the trailer's stored handoffs still hash to what was stored, and the time of the first that does not. */
export async function verifyTrailerChain(trailerId: string): Promise<TrailerChain> {
  return checkTrailerChain(await listChainRecords(trailerId), chainKey());
}

/** Whether one handoff, as stored now, is still what its receipt vouched for (the public verify page). */
export async function verifyOneHandoff(trailerId: string, handoffId: string): Promise<RecordCheck> {
  return checkOneRecord(await listChainRecords(trailerId), handoffId, chainKey());
}
