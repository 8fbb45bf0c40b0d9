'use client';

import { useCallback, useMemo, useSyncExternalStore } from 'react';
import { addToOutbox } from '@/app/_components/offline/outbox-client';
import { useOutboxItems } from '@/app/_components/offline/offline-provider';
import type { OutboxItem } from '@/lib/offline/outbox';
import type { QueuedScan } from '@/lib/yard/scan-queue';

function toScan(item: OutboxItem): QueuedScan {
  const body = item.body as unknown as Omit<QueuedScan, 'state' | 'spotLabel'>;
  const unit = item.answer?.unitNumber;
  return {
    ...body,
    spotLabel: item.meta?.spotLabel ?? '',
    state: item.state,
    error: item.error,
    result: typeof unit === 'string' ? unit : undefined,
  };
}

function subscribeOnline(cb: () => void) {
  window.addEventListener('online', cb);
  window.addEventListener('offline', cb);
  return () => {
    window.removeEventListener('online', cb);
    window.removeEventListener('offline', cb);
  };
}

/**
 * The scans of one walk on this phone: kept in the phone's outbox (IndexedDB), sent in scan
 * order by the shell's sender, re-sent when the signal returns (the clientKey makes it harmless).
 */
export function useScanQueue(walkId: string) {
  const items = useOutboxItems();
  const isOnline = useSyncExternalStore(
    subscribeOnline,
    () => navigator.onLine,
    () => true,
  );
  const queue = useMemo(
    () => items.filter((i) => i.kind === 'scan' && i.group === walkId).map(toScan),
    [items, walkId],
  );

  const add = useCallback(
    (scan: QueuedScan) => {
      const { state: _s, error: _e, result: _r, spotLabel, ...body } = scan;
      void addToOutbox({
        key: scan.clientKey,
        kind: 'scan',
        group: walkId,
        url: `/api/yard/walks/${walkId}/scans`,
        body: { ...body },
        meta: { spotLabel },
      });
    },
    [walkId],
  );

  return { queue, isOnline, add };
}
