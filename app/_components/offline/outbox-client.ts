'use client';
// The outbox on this phone: one sender for every screen (the shell starts it), a snapshot that
// React reads through useSyncExternalStore, and a lock so two tabs never send the same item at once.
import {
  enqueue,
  flushOutbox,
  outcomeOf,
  sortBySeq,
  type OutboxItem,
  type SendOutcome,
} from '@/lib/offline/outbox';
import { PhotoRefused, sendPhoto, type PreparedPhoto } from './photo-send';
import { moveLocalStorageOnce, outboxStore } from './store';

let items: OutboxItem[] = [];
let userId: string | null = null;
let flushing: Promise<void> | null = null;
let again = false;
let wokenUp = false;
const listeners = new Set<() => void>();
const EMPTY: OutboxItem[] = [];

async function refresh() {
  items = sortBySeq(await outboxStore().all());
  listeners.forEach((l) => l());
}

export function subscribe(listener: () => void) {
  listeners.add(listener);
  return () => void listeners.delete(listener);
}
export const snapshot = () => items;
export const serverSnapshot = () => EMPTY;

/** A photo taken without signal: announce, PUT and complete, each safe to repeat under its id. */
async function sendQueuedPhoto(item: OutboxItem): Promise<SendOutcome> {
  const photo = item.body as unknown as PreparedPhoto;
  try {
    await sendPhoto(photo, { announce: 'The photo was not accepted.', refused: 'The photo was refused.' });
    return { kind: 'sent', answer: { photoId: photo.photoId } };
  } catch (err) {
    if (err instanceof PhotoRefused) return { kind: 'rejected', error: err.message, answer: {} };
    return { kind: 'offline' };
  }
}

async function send(item: OutboxItem): Promise<SendOutcome> {
  if (item.kind === 'photo') return sendQueuedPhoto(item);
  try {
    const res = await fetch(item.url, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(item.body),
    });
    const answer = (await res.json().catch(() => ({}))) as Record<string, unknown>;
    return outcomeOf(res.status, answer);
  } catch {
    return { kind: 'offline' };
  }
}

async function runOnce(user: string, ignoreBackoff: boolean) {
  const store = outboxStore();
  const run = () =>
    flushOutbox(
      store,
      user,
      Date.now,
      async (item) => {
        const outcome = await send(item);
        // show each outcome as it comes, not only at the end of the run
        queueMicrotask(() => void refresh());
        return outcome;
      },
      ignoreBackoff,
    );
  const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
  if (locks) await locks.request('hitchmark-outbox', run);
  else await run();
}

/** Sends what waits, oldest first; a call during a run asks for one more run after it. */
export function flush(): Promise<void> {
  const user = userId;
  if (!user) return Promise.resolve();
  if (flushing) {
    again = true;
    return flushing;
  }
  flushing = (async () => {
    try {
      do {
        again = false;
        // the 'online' event may come while a try that failed offline is still running: the
        // run after it then ignores the backoff that failure set
        const ignoreBackoff = wokenUp;
        wokenUp = false;
        await runOnce(user, ignoreBackoff);
        await refresh();
      } while (again);
    } catch {
      // IndexedDB refused or the lock was lost: the next online event or timer tries again
    } finally {
      flushing = null;
    }
  })();
  return flushing;
}

/** Queues a submit (once per key) and tries to send it straight away. */
export async function addToOutbox(
  item: Omit<OutboxItem, 'seq' | 'state' | 'attempts' | 'nextTryAt' | 'createdAt' | 'userId'>,
): Promise<OutboxItem | null> {
  if (!userId) return null;
  const stored = await enqueue(outboxStore(), { ...item, userId }, Date.now());
  await refresh();
  void flush();
  return stored;
}

/** Drops one finished item (a refusal the driver has read). */
export async function removeFromOutbox(key: string) {
  await outboxStore().del(key);
  await refresh();
}

/** Starts the sender for the signed-in user: at once, on 'online', and every 15 s (backoff decides). */
export function startOutbox(user: string): () => void {
  userId = user;
  void moveLocalStorageOnce(user).then(refresh).then(flush);
  const online = () => {
    wokenUp = true;
    void flush();
  };
  window.addEventListener('online', online);
  const timer = window.setInterval(() => void flush(), 15_000);
  return () => {
    window.removeEventListener('online', online);
    window.clearInterval(timer);
  };
}

export function currentOutboxUser() {
  return userId;
}
