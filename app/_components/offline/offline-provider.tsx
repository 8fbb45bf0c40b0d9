'use client';

import { useTranslations } from 'next-intl';
import { createContext, useContext, useEffect, useSyncExternalStore } from 'react';
import { waitingCount, type OutboxItem } from '@/lib/offline/outbox';
import { serverSnapshot, snapshot, startOutbox, subscribe } from './outbox-client';

const UserContext = createContext<string | null>(null);

/** The signed-in user on this phone: drafts and outbox items are kept under their id. */
export function useOfflineUser(): string | null {
  return useContext(UserContext);
}

/** Every outbox item on this phone (all users; callers filter), live. */
export function useOutboxItems(): OutboxItem[] {
  return useSyncExternalStore(subscribe, snapshot, serverSnapshot);
}

/** Whether the phone says it has signal, live. */
export function useIsOnline(): boolean {
  return useSyncExternalStore(
    (cb) => {
      window.addEventListener('online', cb);
      window.addEventListener('offline', cb);
      return () => {
        window.removeEventListener('online', cb);
        window.removeEventListener('offline', cb);
      };
    },
    () => navigator.onLine,
    () => true,
  );
}

/** Starts the outbox's sender for the signed-in user; the shell wraps every screen in it. */
export function OfflineProvider({ userId, children }: { userId: string; children: React.ReactNode }) {
  useEffect(() => startOutbox(userId), [userId]);
  return <UserContext.Provider value={userId}>{children}</UserContext.Provider>;
}

/** "3 waiting to send" and the no-signal line, on every screen of the shell. */
export function OutboxLine() {
  const t = useTranslations('Offline');
  const userId = useOfflineUser();
  const items = useOutboxItems();
  const waiting = userId ? waitingCount(items, userId) : 0;
  const online = useIsOnline();
  const show = waiting > 0 || !online;
  return (
    <div role="status" aria-live="polite" data-testid="outbox-line">
      {show ? (
        <p className="bg-warn-bg px-3 py-2 text-center text-gate-sm font-bold text-warn">
          {online ? null : <span>{t('offline')} </span>}
          {waiting > 0 ? <span>{t('waiting', { count: waiting })}</span> : null}
        </p>
      ) : null}
    </div>
  );
}
