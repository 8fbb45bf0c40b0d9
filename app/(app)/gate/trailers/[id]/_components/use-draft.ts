'use client';

import { useEffect, useState } from 'react';
import type { Draft } from '@/lib/handoffs/draft';

export type StoredDraft = Draft & { isQueued?: boolean };

/** A random draft key made once per draft: it makes a retried or queued submit idempotent. */
export function newDraftKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  return [...crypto.getRandomValues(new Uint8Array(16))].map((b) => b.toString(16).padStart(2, '0')).join('');
}

/** The form's draft, kept in localStorage per trailer so it survives a reload or a lost connection. */
export function useDraft(trailerId: string, kind: 'drop' | 'hook', make: () => Draft) {
  const storageKey = `hm-draft:${trailerId}`;
  const [draft, setDraft] = useState<StoredDraft | null>(null);
  useEffect(() => {
    let saved: StoredDraft | null = null;
    try {
      const raw = localStorage.getItem(storageKey);
      const parsed = raw ? (JSON.parse(raw) as StoredDraft) : null;
      if (
        parsed &&
        typeof parsed.idempotencyKey === 'string' &&
        parsed.trailerId === trailerId &&
        parsed.items
      )
        saved = parsed;
    } catch {
      saved = null;
    }
    setDraft(saved ? { ...saved, kind } : make());
    // make() is stable enough for a mount-time default; re-running on every render would reset the draft
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [storageKey, kind]);
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
