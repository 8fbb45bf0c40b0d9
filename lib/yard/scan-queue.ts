import type { QuickChecks } from './walk';

/**
 * A scan kept on the device until the server has it (in the phone's outbox, lib/offline/outbox.ts).
 * `clientKey` makes a re-send harmless.
 */
export interface QueuedScan extends QuickChecks {
  clientKey: string;
  scannedText: string;
  spotId: string;
  spotLabel: string;
  scannedAt: string;
  state: 'pending' | 'sent' | 'rejected';
  error?: string;
  /** What the server answered for a sent scan, e.g. the unit it resolved to. */
  result?: string;
}

export function pendingCount(queue: readonly QueuedScan[]): number {
  return queue.filter((q) => q.state === 'pending').length;
}
