import { describe, expect, it } from 'vitest';
import {
  backoffMs,
  enqueue,
  flushOutbox,
  KEEP_DONE_MS,
  memoryStore,
  outcomeOf,
  waitingCount,
  type OutboxItem,
  type SendOutcome,
} from '@/lib/offline/outbox';
import { cachesToClear } from '@/lib/offline/sign-out';

const T0 = Date.parse('2026-03-09T22:00:00Z');

function scanItem(n: number, userId = 'u-driver') {
  return {
    key: `key-000${n}`,
    userId,
    kind: 'scan' as const,
    group: 'walk-1',
    url: '/api/yard/walks/walk-1/scans',
    body: { clientKey: `key-000${n}`, scannedText: `R${n}` },
    meta: { spotLabel: 'A01' },
  };
}

async function filled(n: number, userId?: string) {
  const store = memoryStore();
  for (let i = 1; i <= n; i++) await enqueue(store, scanItem(i, userId), T0 + i);
  return store;
}

const states = async (store: ReturnType<typeof memoryStore>) =>
  (await store.all()).sort((a, b) => a.seq - b.seq).map((i) => `${i.key}:${i.state}`);

describe('the phone outbox', () => {
  it('queues a key once: a second tap or a re-read draft does not queue it twice', async () => {
    const store = await filled(2);
    const again = await enqueue(store, { ...scanItem(1), body: { changed: true } }, T0 + 99);
    expect(again.seq).toBe(1);
    expect(again.body).toEqual({ clientKey: 'key-0001', scannedText: 'R1' });
    expect(store.map.size).toBe(2);
  });

  it('sends oldest first and stops at the first network failure, the rest keep their place', async () => {
    const store = await filled(4);
    const sent: string[] = [];
    let online = true;
    const send = async (i: OutboxItem): Promise<SendOutcome> => {
      if (!online) return { kind: 'offline' };
      sent.push(i.key);
      if (i.key === 'key-0002') online = false;
      return { kind: 'sent', answer: { ok: true } };
    };
    let now = T0 + 10;
    const first = await flushOutbox(store, 'u-driver', () => now, send);
    expect(first).toEqual({ sent: 2, stopped: true });
    expect(await states(store)).toEqual([
      'key-0001:sent',
      'key-0002:sent',
      'key-0003:pending',
      'key-0004:pending',
    ]);
    expect(waitingCount(await store.all(), 'u-driver')).toBe(2);

    // backing off: 2 s after the first failure nothing is tried, not even a later item
    online = true;
    now += 1_000;
    await flushOutbox(store, 'u-driver', () => now, send);
    expect(sent).toEqual(['key-0001', 'key-0002']);
    now += 1_000;
    await flushOutbox(store, 'u-driver', () => now, send);
    expect(sent).toEqual(['key-0001', 'key-0002', 'key-0003', 'key-0004']);
    // exactly once: a further run sends nothing again
    await flushOutbox(store, 'u-driver', () => now, send);
    expect(sent).toHaveLength(4);
    expect(waitingCount(await store.all(), 'u-driver')).toBe(0);
  });

  it("keeps a refused item with the server's answer and goes on with the next", async () => {
    const store = await filled(2);
    await flushOutbox(
      store,
      'u-driver',
      () => T0 + 10,
      async (i) =>
        i.key === 'key-0001'
          ? { kind: 'rejected', error: 'Unknown slot.', answer: { message: 'Unknown slot.' } }
          : { kind: 'sent', answer: { unitNumber: 'R2' } },
    );
    const [a, b] = (await store.all()).sort((x, y) => x.seq - y.seq);
    expect(a).toMatchObject({ state: 'rejected', error: 'Unknown slot.', body: { scannedText: 'R1' } });
    expect(b).toMatchObject({ state: 'sent', answer: { unitNumber: 'R2' } });
  });

  it("never sends another user's items: they wait for that user's own session", async () => {
    const store = await filled(1, 'u-first');
    await enqueue(store, scanItem(2, 'u-second'), T0 + 5);
    const sent: string[] = [];
    await flushOutbox(
      store,
      'u-second',
      () => T0 + 10,
      async (i) => {
        sent.push(i.key);
        return { kind: 'sent', answer: {} };
      },
    );
    expect(sent).toEqual(['key-0002']);
    expect(waitingCount(await store.all(), 'u-first')).toBe(1);
  });

  it('backs off 2 s, 4 s, 8 s … up to 5 minutes, and the online event skips the wait', async () => {
    // exponential backoff with a cap: common practice for retries over a flaky network
    expect([1, 2, 3, 4].map(backoffMs)).toEqual([2_000, 4_000, 8_000, 16_000]);
    expect(backoffMs(20)).toBe(300_000);
    const store = await filled(1);
    await flushOutbox(
      store,
      'u-driver',
      () => T0,
      async () => ({ kind: 'offline' }),
    );
    await flushOutbox(
      store,
      'u-driver',
      () => T0 + 500,
      async () => ({ kind: 'offline' }),
      true,
    );
    expect(await store.get('key-0001')).toMatchObject({ attempts: 2, nextTryAt: T0 + 500 + 4_000 });
    const tried: string[] = [];
    const ok = async (i: OutboxItem): Promise<SendOutcome> => {
      tried.push(i.key);
      return { kind: 'sent', answer: {} };
    };
    await flushOutbox(store, 'u-driver', () => T0 + 600, ok);
    expect(tried).toEqual([]);
    await flushOutbox(store, 'u-driver', () => T0 + 600, ok, true);
    expect(tried).toEqual(['key-0001']);
  });

  it('forgets sent items after a day, never pending ones', async () => {
    const store = await filled(2);
    await flushOutbox(
      store,
      'u-driver',
      () => T0 + 10,
      async (i) => (i.key === 'key-0001' ? { kind: 'sent', answer: {} } : { kind: 'offline' }),
    );
    await flushOutbox(
      store,
      'u-driver',
      () => T0 + KEEP_DONE_MS + 100,
      async () => ({ kind: 'offline' }),
    );
    expect(await states(store)).toEqual(['key-0002:pending']);
  });

  it('reads HTTP answers: 2xx sent; 5xx, 401, 408 and 429 retried; other 4xx refused', () => {
    // status classes per RFC 9110 §15 (408 Request Timeout §15.5.9) and RFC 6585 §4 (429)
    expect(outcomeOf(201, { ok: true }).kind).toBe('sent');
    expect(outcomeOf(200, {}).kind).toBe('sent');
    for (const s of [500, 502, 503, 401, 408, 429]) expect(outcomeOf(s, {}).kind).toBe('offline');
    expect(outcomeOf(400, { message: 'Fuel level is missing.' })).toEqual({
      kind: 'rejected',
      error: 'Fuel level is missing.',
      answer: { message: 'Fuel level is missing.' },
    });
    expect(outcomeOf(409, {})).toMatchObject({ kind: 'rejected', error: 'Refused (409).' });
  });
});

describe('sign-out on a shared phone', () => {
  it("removes the service worker's page and API caches, keeps the app's own scripts", () => {
    // cache names as @serwist/next's defaultCache and the precache name them
    const names = [
      'serwist-precache-v2-http://localhost:3140/',
      'pages',
      'pages-rsc',
      'pages-rsc-prefetch',
      'apis',
      'others',
      'next-data',
      'static-js-assets',
      'next-static-js-assets',
      'static-image-assets',
    ];
    expect(cachesToClear(names)).toEqual([
      'pages',
      'pages-rsc',
      'pages-rsc-prefetch',
      'apis',
      'others',
      'next-data',
    ]);
  });
});
