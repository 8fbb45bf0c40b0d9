import type { QuickChecks } from './walk';

/** A scan kept on the device until the server has it. `clientKey` makes a re-send harmless. */
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

export type SendOutcome =
  { kind: 'sent'; result?: string } | { kind: 'rejected'; error: string } | { kind: 'offline' };

/**
 * Sends pending scans oldest first, one at a time, so the server sees them in scan order.
 * Stops at the first network failure (the rest wait for the next try); a rejected scan is kept
 * with its error so nothing typed is lost. Returns the new queue; the input is not changed.
 */
export async function flushQueue(
  queue: readonly QueuedScan[],
  send: (scan: QueuedScan) => Promise<SendOutcome>,
): Promise<QueuedScan[]> {
  const next = queue.map((q) => ({ ...q }));
  for (const item of next) {
    if (item.state !== 'pending') continue;
    const outcome = await send(item);
    if (outcome.kind === 'offline') break;
    if (outcome.kind === 'sent') {
      item.state = 'sent';
      item.result = outcome.result;
    } else {
      item.state = 'rejected';
      item.error = outcome.error;
    }
  }
  return next;
}

export function pendingCount(queue: readonly QueuedScan[]): number {
  return queue.filter((q) => q.state === 'pending').length;
}

const KEY = (walkId: string) => `hitchmark.walk.${walkId}.scans`;

/** Reads the device queue of one walk; a damaged entry reads as empty rather than crashing the walk. */
export function loadQueue(storage: Pick<Storage, 'getItem'>, walkId: string): QueuedScan[] {
  try {
    const raw = storage.getItem(KEY(walkId));
    const parsed: unknown = raw ? JSON.parse(raw) : [];
    return Array.isArray(parsed) ? (parsed as QueuedScan[]) : [];
  } catch {
    return [];
  }
}

export function saveQueue(storage: Pick<Storage, 'setItem'>, walkId: string, queue: readonly QueuedScan[]) {
  storage.setItem(KEY(walkId), JSON.stringify(queue));
}
