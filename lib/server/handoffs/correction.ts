// The record a correction names, loaded in the submit's transaction and checked against the
// rules of lib/handoffs/correction.ts (who may correct what, within which window).
import 'server-only';
import type { Tx } from '@/db';
import { findCorrectionOf, getHandoffForCorrection, getPolicyData } from '@/db/queries/handoff-submit';
import { correctionRefusal } from '@/lib/handoffs/correction';
import { abort } from '@/lib/result';
import { terminalPolicyOf } from '@/lib/terminal/policy';
import type { HandoffSubmitInput } from '@/lib/validation/handoffs';
import type { HandoffActor } from './types';

/** The record a correction names, checked against the rules (lib/handoffs/correction.ts); aborts when refused. */
export async function correctionTarget(tx: Tx, input: HandoffSubmitInput, actor: HandoffActor, now: Date) {
  const original = await getHandoffForCorrection(tx, input.correctsHandoffId!);
  const policy = original ? terminalPolicyOf(await getPolicyData(tx, original.terminalId)) : null;
  const refused = correctionRefusal({
    original,
    actor,
    input,
    now,
    windowMinutes: policy?.gate.correctionWindowMinutes ?? 0,
    correctedByCode: original ? await findCorrectionOf(tx, original.id) : null,
  });
  if (refused) abort(refused);
  return original!;
}
