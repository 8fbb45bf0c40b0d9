// A handoff sent with signal while one of its photos still waits in the outbox is queued behind
// that photo: the outbox sends oldest first, so the photo is stored before the handoff arrives.
import { describe, expect, it } from 'vitest';
import { enqueue, flushOutbox, memoryStore, waitingPhotoIds, type SendOutcome } from '@/lib/offline/outbox';

const T0 = Date.parse('2026-12-02T23:00:00Z');
const photo = (key: string) => ({
  key,
  userId: 'u-driver',
  kind: 'photo' as const,
  group: 'trailer-1',
  url: '/api/uploads',
  body: { photoId: key },
});

describe('waitingPhotoIds', () => {
  it('names the handoff’s photos that are still pending, not sent or refused ones, nor other photos', async () => {
    const store = memoryStore();
    for (const key of ['p-sent', 'p-refused', 'p-wait', 'p-other']) await enqueue(store, photo(key), T0);
    await flushOutbox(
      store,
      'u-driver',
      () => T0,
      async (item): Promise<SendOutcome> => {
        if (item.key === 'p-sent') return { kind: 'sent', answer: {} };
        if (item.key === 'p-refused')
          return { kind: 'rejected', error: 'The photo was refused.', answer: {} };
        return { kind: 'offline' };
      },
    );
    // the run stopped at the first photo without an answer (p-wait); p-other was not tried
    const items = await store.all();
    expect(waitingPhotoIds(items, ['p-wait', 'p-sent', 'p-refused', 'p-wait'])).toEqual(['p-wait']);
    expect(waitingPhotoIds(items, [])).toEqual([]);
    expect(waitingPhotoIds(items, ['p-unknown'])).toEqual([]);
  });

  it('a handoff queued behind its photo leaves only after it, in one run', async () => {
    const store = memoryStore();
    await enqueue(store, photo('p-1'), T0);
    await enqueue(
      store,
      { key: 'h-1', userId: 'u-driver', kind: 'handoff', group: 'trailer-1', url: '/api/handoffs', body: {} },
      T0 + 1,
    );
    const order: string[] = [];
    await flushOutbox(
      store,
      'u-driver',
      () => T0 + 2,
      async (item) => {
        order.push(item.key);
        return { kind: 'sent', answer: {} };
      },
    );
    expect(order).toEqual(['p-1', 'h-1']);
    expect(waitingPhotoIds(await store.all(), ['p-1'])).toEqual([]);
  });
});
