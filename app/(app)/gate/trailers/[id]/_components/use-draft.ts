'use client';

import { useCallback, useEffect, useRef, useState, type SetStateAction } from 'react';
import { useOfflineUser } from '@/app/_components/offline/offline-provider';
import { deleteDraft, readDraft, writeDraft } from '@/app/_components/offline/store';
import type { Draft } from '@/lib/handoffs/draft';

export type StoredDraft = Draft & { isQueued?: boolean };

/** A random draft key made once per draft: it makes a retried or queued submit idempotent. */
export function newDraftKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return [...crypto.getRandomValues(new Uint8Array(16))].map((b) => b.toString(16).padStart(2, '0')).join('');
}

function isOurs(saved: unknown, trailerId: string): saved is StoredDraft {
  if (!saved || typeof saved !== 'object') return false;
  const d = saved as Partial<StoredDraft>;
  return typeof d.idempotencyKey === 'string' && d.trailerId === trailerId && Boolean(d.items);
}

/**
 * The form's draft, kept in IndexedDB per user and trailer (app/_components/offline/store.ts) so
 * it survives a reload, a lost connection or a closed browser. `null` until it has been read.
 */
export function useDraft(trailerId: string, kind: 'drop' | 'hook', make: () => Draft) {
  const userId = useOfflineUser() ?? 'anonymous';
  const openedFor = `${userId}|${trailerId}|${kind}`;
  const [state, setState] = useState<{ openedFor: string; draft: StoredDraft } | null>(null);
  const makeRef = useRef(make);
  useEffect(() => {
    makeRef.current = make;
  });

  // read once per user, trailer and kind: the saved draft, or a new one
  useEffect(() => {
    let live = true;
    readDraft<unknown>(userId, trailerId)
      .catch(() => undefined)
      .then((saved) => {
        if (!live) return;
        setState({
          openedFor,
          draft: isOurs(saved, trailerId) ? { ...saved, kind } : makeRef.current(),
        });
      });
    return () => {
      live = false;
    };
  }, [userId, trailerId, kind, openedFor]);

  const draft = state?.openedFor === openedFor ? state.draft : null;
  const setDraft = useCallback(
    (next: SetStateAction<StoredDraft | null>) =>
      setState((prev) => {
        if (!prev) return prev;
        const d = typeof next === 'function' ? next(prev.draft) : next;
        return d ? { ...prev, draft: d } : prev;
      }),
    [],
  );
  useEffect(() => {
    if (draft) void writeDraft(userId, trailerId, draft).catch(() => undefined);
  }, [draft, userId, trailerId]);
  return {
    draft,
    setDraft,
    discard: () => {
      void deleteDraft(userId, trailerId);
      setDraft(makeRef.current());
    },
    forget: () => void deleteDraft(userId, trailerId),
  };
}
