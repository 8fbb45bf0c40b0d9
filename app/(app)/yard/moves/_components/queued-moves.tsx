'use client';

import { useTranslations } from 'next-intl';
import { useOfflineUser, useOutboxItems } from '@/app/_components/offline/offline-provider';
import { removeFromOutbox } from '@/app/_components/offline/outbox-client';
import { useRefusalText } from '@/app/_components/use-refusal-text';

/** Moves this jockey made without signal, as the outbox holds them: waiting, sent or refused. */
export function QueuedMoves() {
  const t = useTranslations('Yard');
  const say = useRefusalText();
  const userId = useOfflineUser();
  const moves = useOutboxItems().filter((i) => i.kind === 'move' && i.userId === userId);
  if (!moves.length) return null;
  return (
    <section aria-labelledby="queued-moves" className="space-y-2 rounded-xl bg-paper p-4 shadow">
      <h2 id="queued-moves" className="text-gate-lg font-bold">
        {t('move.queueTitle')}
      </h2>
      <ul className="space-y-2">
        {moves.map((m) => {
          const words = { unit: m.meta?.unit ?? '', to: m.meta?.target ?? '' };
          const answer = m.answer ?? {};
          return (
            <li key={m.key} className="flex flex-wrap items-center justify-between gap-2 text-gate">
              {m.state === 'pending' ? (
                <span className="font-bold text-warn">{t('move.queueWaiting', words)}</span>
              ) : m.state === 'sent' ? (
                <span className="font-bold text-ok">{t('move.queueSent', words)}</span>
              ) : (
                <span role="alert" className="font-bold text-danger">
                  {t('move.queueRefused', {
                    ...words,
                    message: say(m.error ?? '', answer.messageKey, answer.messageValues),
                  })}
                </span>
              )}
              {m.state !== 'pending' ? (
                <button
                  type="button"
                  className="min-h-tap rounded-lg border-2 border-brand px-3 font-bold text-brand"
                  onClick={() => void removeFromOutbox(m.key)}
                >
                  {t('move.dismiss')}
                </button>
              ) : null}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
