// The phone's outbox: submits made without signal (handoffs, walk scans, yard moves, photos), each with the
// idempotency key the server already honours, sent oldest first when the signal returns.
// Pure: the storage, the clock and the network are passed in, so the order, the backoff and the
// exactly-once rule are tested without a browser (tests/unit/offline/outbox.test.ts).

export type OutboxKind = 'handoff' | 'scan' | 'move' | 'photo';
export type OutboxState = 'pending' | 'sent' | 'rejected';

export interface OutboxItem {
  /** The submit's own idempotency key (handoff) or client key (scan): a re-send is harmless. */
  key: string;
  /** Place in the queue: items go out in this order. */
  seq: number;
  /** Who made it: only that user's session may send it. */
  userId: string;
  kind: OutboxKind;
  /** What it belongs to (the trailer of a handoff, the walk of a scan). */
  group: string;
  url: string;
  body: Record<string, unknown>;
  /** Words the phone shows beside it (e.g. the slot label of a scan); never sent. */
  meta?: Record<string, string>;
  state: OutboxState;
  attempts: number;
  /** Epoch ms before which the item is not tried again (backoff after a failed try). */
  nextTryAt: number;
  createdAt: number;
  /** The server's answer: the JSON of a sent item, or of a refusal. */
  answer?: Record<string, unknown>;
  error?: string;
}

export type SendOutcome =
  | { kind: 'sent'; answer: Record<string, unknown> }
  | { kind: 'rejected'; error: string; answer: Record<string, unknown> }
  | { kind: 'offline' };

/** Storage of the outbox, one entry per item (idb-keyval in the browser, a Map in tests). */
export interface OutboxStore {
  get(key: string): Promise<OutboxItem | undefined>;
  set(key: string, item: OutboxItem): Promise<void>;
  del(key: string): Promise<void>;
  all(): Promise<OutboxItem[]>;
}

const BACKOFF_FIRST_MS = 2_000;
const BACKOFF_MAX_MS = 5 * 60_000;
/** Sent and refused items are kept a day so the screen that made them can show the outcome. */
export const KEEP_DONE_MS = 24 * 60 * 60_000;

/**
 * Wait after the n-th failed try: 2 s, 4 s, 8 s … at most 5 minutes (exponential backoff,
 * common practice for retrying over a flaky network). The 'online' event skips the wait.
 */
export function backoffMs(attempts: number): number {
  if (attempts <= 0) return 0;
  return Math.min(BACKOFF_MAX_MS, BACKOFF_FIRST_MS * 2 ** (attempts - 1));
}

/** Reads a server answer: 2xx sent, 5xx / 401 / 408 / 429 kept for a retry, other 4xx refused. */
export function outcomeOf(status: number, answer: Record<string, unknown>): SendOutcome {
  if (status >= 200 && status < 300) return { kind: 'sent', answer };
  if (status >= 500 || status === 401 || status === 408 || status === 429) return { kind: 'offline' };
  const message = typeof answer.message === 'string' ? answer.message : `Refused (${status}).`;
  return { kind: 'rejected', error: message, answer };
}

export function sortBySeq(items: readonly OutboxItem[]): OutboxItem[] {
  return [...items].sort((a, b) => a.seq - b.seq);
}

/** Items waiting to leave this phone for one user. */
export function waitingCount(items: readonly OutboxItem[], userId: string): number {
  return items.filter((i) => i.userId === userId && i.state === 'pending').length;
}

/**
 * Of `photoIds`, those still waiting in the outbox (taken without signal, not yet sent). A handoff
 * that holds one is queued behind it, not sent at once: the server would not find the photo yet.
 */
export function waitingPhotoIds(items: readonly OutboxItem[], photoIds: Iterable<string>): string[] {
  const waiting = new Set(items.filter((i) => i.kind === 'photo' && i.state === 'pending').map((i) => i.key));
  return [...new Set(photoIds)].filter((id) => waiting.has(id));
}

/**
 * Adds a submit to the outbox once: an item already there under the same key is left as it is
 * (a second tap, or a queued draft read again after a reload, does not queue it twice).
 */
export async function enqueue(
  store: OutboxStore,
  item: Omit<OutboxItem, 'seq' | 'state' | 'attempts' | 'nextTryAt' | 'createdAt'>,
  now: number,
): Promise<OutboxItem> {
  const existing = await store.get(item.key);
  if (existing) return existing;
  const all = await store.all();
  const seq = all.reduce((max, i) => Math.max(max, i.seq), 0) + 1;
  const full: OutboxItem = { ...item, seq, state: 'pending', attempts: 0, nextTryAt: 0, createdAt: now };
  await store.set(item.key, full);
  return full;
}

/**
 * Sends one user's pending items oldest first, one at a time. A refused item keeps its answer
 * (nothing typed is lost) and the next goes on; a network failure stops the run and backs off,
 * so a later item never overtakes an earlier one. Each state change is written before the next
 * send, so a reload in the middle re-sends at most the one item in flight, under its same key.
 */
export async function flushOutbox(
  store: OutboxStore,
  userId: string,
  now: () => number,
  send: (item: OutboxItem) => Promise<SendOutcome>,
  /** The signal just came back: try now, whatever the backoff said. */
  ignoreBackoff = false,
): Promise<{ sent: number; stopped: boolean }> {
  let sent = 0;
  for (const item of sortBySeq(await store.all())) {
    if (item.userId !== userId) continue;
    if (item.state !== 'pending') {
      if (now() - item.createdAt > KEEP_DONE_MS) await store.del(item.key);
      continue;
    }
    if (!ignoreBackoff && item.nextTryAt > now()) return { sent, stopped: true };
    const outcome = await send(item);
    if (outcome.kind === 'offline') {
      const attempts = item.attempts + 1;
      await store.set(item.key, { ...item, attempts, nextTryAt: now() + backoffMs(attempts) });
      return { sent, stopped: true };
    }
    if (outcome.kind === 'sent') {
      sent++;
      await store.set(item.key, { ...item, state: 'sent', answer: outcome.answer, error: undefined });
    } else {
      await store.set(item.key, { ...item, state: 'rejected', answer: outcome.answer, error: outcome.error });
    }
  }
  return { sent, stopped: false };
}

/** In-memory store (tests, and a phone whose browser refuses IndexedDB). */
export function memoryStore(): OutboxStore & { map: Map<string, OutboxItem> } {
  const map = new Map<string, OutboxItem>();
  return {
    map,
    get: async (k) => map.get(k),
    set: async (k, v) => void map.set(k, structuredClone(v)),
    del: async (k) => void map.delete(k),
    all: async () => [...map.values()].map((v) => structuredClone(v)),
  };
}
