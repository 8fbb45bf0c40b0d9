'use client';

import { useTranslations } from 'next-intl';
import { useRef, useState } from 'react';
import { clearCachedPages } from '@/app/_components/offline/forget-cached-pages';
import { flush } from '@/app/_components/offline/outbox-client';
import { useOfflineUser, useOutboxItems } from '@/app/_components/offline/offline-provider';
import { deleteDraftsOf } from '@/app/_components/offline/store';
import { waitingCount } from '@/lib/offline/outbox';
import { signOutAction } from './sign-out-action';

/**
 * Clears this user's traces on the phone: the pages the service worker kept and their drafts (the
 * sign-in page clears the pages once more, for one that was still loading).
 */
async function clearPhone(userId: string | null) {
  try {
    await clearCachedPages();
    if (userId) await deleteDraftsOf(userId);
  } catch {
    // a browser that refuses storage access must still sign out
  }
}

/**
 * The shell's Sign out. With submits still waiting in the outbox it asks first: send them now,
 * or sign out and leave them on the phone (they go when the same user signs in again; another
 * user's session never sends them).
 */
export function SignOutButton({ label }: { label: string }) {
  const t = useTranslations('Offline');
  const userId = useOfflineUser();
  const items = useOutboxItems();
  const waiting = userId ? waitingCount(items, userId) : 0;
  const form = useRef<HTMLFormElement>(null);
  const confirmed = useRef(false);
  const [asking, setAsking] = useState(false);
  const [sending, setSending] = useState(false);

  async function leave() {
    confirmed.current = true;
    await clearPhone(userId);
    form.current?.requestSubmit();
  }

  return (
    <form
      ref={form}
      action={signOutAction}
      onSubmit={(e) => {
        if (confirmed.current) return;
        e.preventDefault();
        if (waiting > 0) setAsking(true);
        else void leave();
      }}
    >
      <button
        type="submit"
        className="min-h-tap whitespace-nowrap rounded-lg border-2 border-on-fill px-3 font-bold"
      >
        {label}
      </button>
      {asking ? (
        <div
          role="alertdialog"
          aria-labelledby="sign-out-waiting"
          className="fixed inset-x-2 top-16 z-50 mx-auto max-w-md space-y-3 rounded-xl border-2 border-warn bg-paper p-4 text-ink shadow-lg"
        >
          <p id="sign-out-waiting" className="text-gate font-bold">
            {t('signOutWaiting', { count: waiting })}
          </p>
          <button
            type="button"
            disabled={sending || waiting === 0}
            className="min-h-tap w-full rounded-lg bg-brand px-3 font-bold text-on-fill"
            onClick={async () => {
              setSending(true);
              await flush();
              setSending(false);
            }}
          >
            {sending ? t('sending') : waiting === 0 ? t('allSent') : t('sendFirst')}
          </button>
          <button
            type="button"
            className="min-h-tap w-full rounded-lg border-2 border-brand px-3 font-bold text-brand"
            onClick={() => void leave()}
          >
            {waiting === 0 ? label : t('signOutAnyway')}
          </button>
          <button
            type="button"
            className="min-h-tap w-full rounded-lg px-3 font-bold text-ink"
            onClick={() => setAsking(false)}
          >
            {t('stay')}
          </button>
        </div>
      ) : null}
    </form>
  );
}
