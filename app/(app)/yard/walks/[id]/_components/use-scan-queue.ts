'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import { flushQueue, loadQueue, saveQueue, type QueuedScan, type SendOutcome } from '@/lib/yard/scan-queue';

async function send(walkId: string, scan: QueuedScan): Promise<SendOutcome> {
  const { state: _s, error: _e, result: _r, spotLabel: _l, ...body } = scan;
  try {
    const res = await fetch(`/api/yard/walks/${walkId}/scans`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify(body),
    });
    if (res.status >= 500) return { kind: 'offline' }; // the server had trouble: keep it and retry
    const json = await res.json().catch(() => ({}));
    if (!res.ok) return { kind: 'rejected', error: json.message ?? `Refused (${res.status}).` };
    return { kind: 'sent', result: json.unitNumber ?? undefined };
  } catch {
    return { kind: 'offline' };
  }
}

/** The device queue of one walk: kept in localStorage, sent in order, re-sent when back online. */
export function useScanQueue(walkId: string) {
  const [queue, setQueue] = useState<QueuedScan[]>([]);
  const [isOnline, setIsOnline] = useState(true);
  const queueRef = useRef<QueuedScan[]>([]);
  const flushing = useRef(false);

  const commit = useCallback(
    (next: QueuedScan[]) => {
      queueRef.current = next;
      saveQueue(window.localStorage, walkId, next);
      setQueue(next);
    },
    [walkId],
  );

  const flush = useCallback(async () => {
    if (flushing.current) return;
    flushing.current = true;
    try {
      const before = queueRef.current;
      const sent = await flushQueue(before, (s) => send(walkId, s));
      // scans added while sending stay behind the ones just sent
      const added = queueRef.current.slice(before.length);
      commit([...sent, ...added]);
      if (added.some((a) => a.state === 'pending') && navigator.onLine) queueMicrotask(() => void flush());
    } finally {
      flushing.current = false;
    }
  }, [walkId, commit]);

  useEffect(() => {
    queueRef.current = loadQueue(window.localStorage, walkId);
    setQueue(queueRef.current);
    setIsOnline(navigator.onLine);
    const online = () => {
      setIsOnline(true);
      void flush();
    };
    const offline = () => setIsOnline(false);
    window.addEventListener('online', online);
    window.addEventListener('offline', offline);
    const timer = window.setInterval(() => void flush(), 10_000);
    void flush();
    return () => {
      window.removeEventListener('online', online);
      window.removeEventListener('offline', offline);
      window.clearInterval(timer);
    };
  }, [walkId, flush]);

  const add = useCallback(
    (scan: QueuedScan) => {
      commit([...queueRef.current, scan]);
      void flush();
    },
    [commit, flush],
  );

  return { queue, isOnline, add };
}
