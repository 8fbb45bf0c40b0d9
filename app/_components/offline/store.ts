'use client';
// IndexedDB on the phone (idb-keyval): one database for drafts, one for the outbox. Drafts are
// keyed `<userId>:<trailerId>` so signing out clears that user's drafts and nobody else's.
import { clear, createStore, del, entries, get, set, type UseStore } from 'idb-keyval';
import { memoryStore, type OutboxItem, type OutboxStore } from '@/lib/offline/outbox';

let drafts: UseStore | null = null;
let outbox: UseStore | null = null;
let fallback: ReturnType<typeof memoryStore> | null = null;

function hasIdb() {
  return typeof indexedDB !== 'undefined';
}
function draftStore() {
  drafts ??= createStore('hitchmark-drafts', 'drafts');
  return drafts;
}
function outboxDb() {
  outbox ??= createStore('hitchmark-outbox', 'items');
  return outbox;
}

/** The outbox as the pure queue (lib/offline/outbox.ts) expects it. */
export function outboxStore(): OutboxStore {
  if (!hasIdb()) return (fallback ??= memoryStore());
  const s = outboxDb();
  return {
    get: (k) => get<OutboxItem>(k, s),
    set: (k, v) => set(k, v, s),
    del: (k) => del(k, s),
    all: async () => (await entries<string, OutboxItem>(s)).map(([, v]) => v),
  };
}

const draftKey = (userId: string, trailerId: string) => `${userId}:${trailerId}`;

export async function readDraft<T>(userId: string, trailerId: string): Promise<T | undefined> {
  if (!hasIdb()) return undefined;
  await moveLocalStorageOnce(userId);
  return get<T>(draftKey(userId, trailerId), draftStore());
}
export async function writeDraft(userId: string, trailerId: string, draft: unknown): Promise<void> {
  if (hasIdb()) await set(draftKey(userId, trailerId), draft, draftStore());
}
export async function deleteDraft(userId: string, trailerId: string): Promise<void> {
  if (hasIdb()) await del(draftKey(userId, trailerId), draftStore());
}
/** Sign-out: every draft of this user on this phone. */
export async function deleteDraftsOf(userId: string): Promise<number> {
  if (!hasIdb()) return 0;
  const mine = (await entries<string, unknown>(draftStore())).filter(([k]) => k.startsWith(`${userId}:`));
  for (const [k] of mine) await del(k, draftStore());
  return mine.length;
}
/** Tests and a full reset: everything in the drafts database. */
export async function clearAllDrafts(): Promise<void> {
  if (hasIdb()) await clear(draftStore());
}

// Earlier versions kept drafts (`hm-draft:<trailerId>`) and walk queues
// (`hitchmark.walk.<walkId>.scans`) in localStorage. Moved once, to the user signed in now.
const OLD_DRAFT = /^hm-draft:(.+)$/;
const OLD_WALK = /^hitchmark\.walk\.(.+)\.scans$/;
let moving: Promise<void> | null = null;

export function moveLocalStorageOnce(userId: string): Promise<void> {
  moving ??= moveLocalStorage(userId).catch(() => undefined);
  return moving;
}

async function moveLocalStorage(userId: string) {
  if (typeof localStorage === 'undefined' || !hasIdb()) return;
  const { enqueue } = await import('@/lib/offline/outbox');
  const keys = Array.from({ length: localStorage.length }, (_, i) => localStorage.key(i) ?? '');
  for (const key of keys) {
    const raw = localStorage.getItem(key);
    if (raw === null) continue;
    const draft = OLD_DRAFT.exec(key);
    const walk = OLD_WALK.exec(key);
    if (!draft && !walk) continue;
    try {
      const value: unknown = JSON.parse(raw);
      if (draft && value && typeof value === 'object') {
        const existing = await get(draftKey(userId, draft[1]), draftStore());
        if (!existing) await set(draftKey(userId, draft[1]), value, draftStore());
      }
      if (walk && Array.isArray(value)) {
        for (const scan of value as Record<string, unknown>[]) {
          if (scan.state !== 'pending' || typeof scan.clientKey !== 'string') continue;
          const { state: _s, error: _e, result: _r, spotLabel, ...body } = scan;
          await enqueue(
            outboxStore(),
            {
              key: scan.clientKey,
              userId,
              kind: 'scan',
              group: walk[1],
              url: `/api/yard/walks/${walk[1]}/scans`,
              body,
              meta: { spotLabel: String(spotLabel ?? '') },
            },
            Date.now(),
          );
        }
      }
    } catch {
      // a damaged entry is dropped rather than blocking the phone
    }
    localStorage.removeItem(key);
  }
}
