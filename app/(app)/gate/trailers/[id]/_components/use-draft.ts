'use client';

import { useCallback, useEffect, useState, useSyncExternalStore, type SetStateAction } from 'react';
import type { Draft } from '@/lib/handoffs/draft';

export type StoredDraft = Draft & { isQueued?: boolean };

/** A random draft key made once per draft: it makes a retried or queued submit idempotent. */
export function newDraftKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return [...crypto.getRandomValues(new Uint8Array(16))].map((b) => b.toString(16).padStart(2, '0')).join('');
}

function readSaved(storageKey: string, trailerId: string): StoredDraft | null {
  try {
    const raw = localStorage.getItem(storageKey);
    const parsed = raw ? (JSON.parse(raw) as StoredDraft) : null;
    const isOurs =
      parsed && typeof parsed.idempotencyKey === 'string' && parsed.trailerId === trailerId && parsed.items;
    return isOurs ? parsed : null;
  } catch {
    return null;
  }
}

const subscribeToNothing = () => () => {};

/** False on the server and while hydrating (so both render the same), true in the browser after. */
function useIsBrowser(): boolean {
  return useSyncExternalStore(
    subscribeToNothing,
    () => true,
    () => false,
  );
}

/** The form's draft, kept in localStorage per trailer so it survives a reload or a lost connection. */
export function useDraft(trailerId: string, kind: 'drop' | 'hook', make: () => Draft) {
  const storageKey = `hm-draft:${trailerId}`;
  const openedFor = `${storageKey}|${kind}`;
  const isBrowser = useIsBrowser();
  const [state, setState] = useState<{ openedFor: string; draft: StoredDraft } | null>(null);
  // read once per trailer and kind, in the first browser render: the saved draft, or a new one
  if (isBrowser && state?.openedFor !== openedFor) {
    const saved = readSaved(storageKey, trailerId);
    setState({ openedFor, draft: saved ? { ...saved, kind } : make() });
  }
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
    if (draft) localStorage.setItem(storageKey, JSON.stringify(draft));
  }, [draft, storageKey]);
  return {
    draft,
    setDraft,
    discard: () => {
      localStorage.removeItem(storageKey);
      setDraft(make());
    },
    forget: () => localStorage.removeItem(storageKey),
  };
}
