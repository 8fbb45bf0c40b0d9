// The seed records handoffs through the real submit service. A refusal means the demo scenario
// itself is wrong, so it stops the seed with the reason.
import { submitHandoff, type SubmitResult } from '@/lib/server/handoffs/submit';

export type { HandoffActor } from '@/lib/server/handoffs/submit';

export async function recordSeedHandoff(...args: Parameters<typeof submitHandoff>): Promise<SubmitResult> {
  const result = await submitHandoff(...args);
  if (!result.ok) throw new Error(`The demo seed's handoff was refused (${result.code}): ${result.message}`);
  return result.value;
}
