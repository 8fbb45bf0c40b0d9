'use client';

import { useEffect } from 'react';
import { cachesToClear } from '@/lib/offline/sign-out';

/** Deletes the service worker's caches of pages and API answers (the precache stays). */
export async function clearCachedPages(): Promise<void> {
  if (typeof caches === 'undefined') return;
  for (const name of cachesToClear(await caches.keys())) await caches.delete(name);
}

/**
 * On the sign-in page nobody is signed in, so nothing private may stay cached. Sign-out clears the
 * caches before it leaves, but a page that was still loading then (the receipt the form opens when
 * the outbox has just sent its handoff) can land in the cache afterwards; this clears it again.
 */
export function ForgetCachedPages() {
  useEffect(() => {
    clearCachedPages().catch(() => {
      // a browser that refuses storage access keeps nothing to clear
    });
  }, []);
  return null;
}
