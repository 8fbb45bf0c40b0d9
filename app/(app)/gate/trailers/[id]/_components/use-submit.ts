'use client';

import { useRouter } from 'next/navigation';
import { useTranslations } from 'next-intl';
import { useCallback, useEffect, useRef, useState, type Dispatch, type SetStateAction } from 'react';
import { addToOutbox, removeFromOutbox, snapshot } from '@/app/_components/offline/outbox-client';
import { useIsOnline, useOutboxItems } from '@/app/_components/offline/offline-provider';
import { waitingPhotoIds } from '@/lib/offline/outbox';
import { errorsByField } from '@/lib/handoffs/steps';
import type { TrailerCondition } from '@/lib/server/handoffs/condition';
import { precheck } from './precheck';
import type { StoredDraft } from './use-draft';

type SayRefusal = ReturnType<typeof useTranslations<'Refusals'>>;

/**
 * The refusal sentences in the reader's language (the Refusals catalogue). The English templates
 * load only when there is something to say, not with the form's first page (scripts/js-budget.mjs);
 * if they cannot load, the sentences stay as sent.
 */
async function inReadersWords(
  r: SayRefusal,
  message: string | undefined,
  fieldErrors: Record<string, string[]>,
) {
  const say = await import('@/lib/i18n/refusals').then(
    ({ localizeRefusal }) =>
      (m: string) =>
        localizeRefusal(m, (k, v) => r(k, v)),
    () => (m: string) => m,
  );
  return {
    message: message === undefined ? undefined : say(message),
    fieldErrors: Object.fromEntries(Object.entries(fieldErrors).map(([k, ms]) => [k, ms.map(say)])),
  };
}

export type SubmitRefusal = { message: string; holds?: { reason: string }[]; cautions?: string[] };
/** `behindPhoto`: queued with signal, because a photo it holds still waits to send. */
export type SubmitStatus = 'idle' | 'sending' | 'queued' | 'behindPhoto';

const photoIdsOf = (d: StoredDraft) =>
  Object.values(d.items).flatMap((it) => it.photos?.map((p) => p.id) ?? []);

type Answer = {
  handoff?: { receiptUrl?: string };
  message?: string;
  fieldErrors?: Record<string, string[]>;
  holds?: { reason: string }[];
  cautions?: string[];
};

/**
 * Sends the draft to POST /api/handoffs. Without signal (or when the request cannot leave the
 * phone) the submit goes into the phone's outbox (IndexedDB) under the draft's idempotency key;
 * the outbox sends it when the signal returns, from whatever screen is open, and this form
 * follows it: to the receipt once sent, or back to the answers if the server refused it. With
 * signal, a handoff holding a photo that still waits in the outbox is queued behind that photo
 * (the outbox sends items in order), rather than sent at once and refused for a missing photo.
 */
export function useSubmit(
  draft: StoredDraft | null,
  setDraft: Dispatch<SetStateAction<StoredDraft | null>>,
  forget: () => void,
  check: { isReefer: boolean; last: TrailerCondition['last']; itemKeys: readonly string[] },
) {
  const router = useRouter();
  const t = useTranslations('Handoff.send');
  const r = useTranslations('Refusals');
  const { isReefer, last, itemKeys } = check;
  const [shownErrors, setShownErrors] = useState<{ errors: Record<string, string[]>; round: number }>({
    errors: {},
    round: 0,
  });
  // every message under the field it concerns; `round` counts sends that came back with messages
  const setErrors = useCallback(
    (found: Record<string, string[]>) =>
      setShownErrors((prev) => {
        const errors = errorsByField(found, itemKeys);
        return { errors, round: Object.keys(errors).length ? prev.round + 1 : prev.round };
      }),
    [itemKeys],
  );
  const [refusal, setRefusal] = useState<SubmitRefusal | null>(null);
  const [status, setStatus] = useState<SubmitStatus>('idle');
  const outbox = useOutboxItems();
  const isOnline = useIsOnline();

  const refused = useCallback(
    async (d: StoredDraft, answer: Answer) => {
      const said = await inReadersWords(r, answer.message, answer.fieldErrors ?? {});
      setStatus('idle');
      setDraft({ ...d, isQueued: false });
      setErrors(said.fieldErrors);
      setRefusal({
        message: said.message ?? t('notRecorded'),
        holds: answer.holds,
        cautions: answer.cautions,
      });
    },
    [setDraft, setErrors, t, r],
  );

  const queue = useCallback(
    async (d: StoredDraft, body: Record<string, unknown>) => {
      setDraft({ ...d, isQueued: true });
      setStatus('queued');
      await addToOutbox({
        key: d.idempotencyKey,
        kind: 'handoff',
        group: d.trailerId,
        url: '/api/handoffs',
        body,
      });
    },
    [setDraft],
  );

  // one submit at a time: a second tap must not send twice at once
  const inFlight = useRef(false);
  const send = useCallback(
    async (d: StoredDraft) => {
      if (inFlight.current) return;
      inFlight.current = true;
      const { body, errors: found } = await precheck(d, isReefer, last).finally(() => {
        inFlight.current = false;
      });
      if (!Object.keys(found).length) setErrors({});
      setRefusal(null);
      if (Object.keys(found).length) {
        setErrors((await inReadersWords(r, undefined, found)).fieldErrors);
        setRefusal({ message: t('needsAttention') });
        return;
      }
      if (!navigator.onLine) return queue(d, body as Record<string, unknown>);
      if (waitingPhotoIds(snapshot(), photoIdsOf(d)).length) return queue(d, body as Record<string, unknown>);
      setStatus('sending');
      let res: Response;
      inFlight.current = true;
      try {
        res = await fetch('/api/handoffs', {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify(body),
        });
      } catch {
        inFlight.current = false;
        return queue(d, body as Record<string, unknown>);
      }
      inFlight.current = false;
      const answer = (await res.json().catch(() => ({}))) as Answer;
      if (res.ok && answer.handoff?.receiptUrl) {
        forget();
        router.push(answer.handoff.receiptUrl);
        return;
      }
      // the server was reached but could not answer: the outbox retries with the same key
      if (res.status >= 500) return queue(d, body as Record<string, unknown>);
      await refused(d, answer);
    },
    [isReefer, last, forget, router, queue, refused, setErrors, t, r],
  );

  // a queued draft follows its outbox item: sent → receipt, refused → back to the answers;
  // a queued draft with no item (moved from an older version of the app) is queued again
  const key = draft?.isQueued ? draft.idempotencyKey : null;
  const item = key ? outbox.find((i) => i.key === key) : undefined;
  const requeued = useRef<string | null>(null);
  const finished = useRef<string | null>(null);
  useEffect(() => {
    if (!draft?.isQueued || !key || finished.current === key) return;
    if (!item) {
      // enqueue is idempotent by key: this only adds the item when the outbox truly lacks it
      if (requeued.current === key) return;
      requeued.current = key;
      void precheck(draft, isReefer, last).then(({ body, errors: found }) => {
        if (Object.keys(found).length) return;
        return addToOutbox({
          key,
          kind: 'handoff',
          group: draft.trailerId,
          url: '/api/handoffs',
          body: body as Record<string, unknown>,
        });
      });
      return;
    }
    if (item.state === 'pending') return;
    finished.current = key;
    if (item.state === 'sent') {
      const url = (item.answer as Answer | undefined)?.handoff?.receiptUrl;
      forget();
      if (url) router.push(url);
    } else {
      // refused while the driver was away from the form: back to the answers, with the reason
      const answer = (item.answer ?? { message: item.error }) as Answer;
      void removeFromOutbox(item.key).then(() => refused(draft, answer));
    }
  }, [draft, key, item, isReefer, last, refused, forget, router]);

  // a draft queued before a reload shows as queued while its item waits; with signal, a queue
  // that holds one of its photos says it waits for the photo
  const isQueued = status === 'queued' || (status === 'idle' && item?.state === 'pending');
  const behindPhoto = isOnline && !!draft && waitingPhotoIds(outbox, photoIdsOf(draft)).length > 0;
  const shown: SubmitStatus = isQueued ? (behindPhoto ? 'behindPhoto' : 'queued') : status;
  return { send, errors: shownErrors.errors, errorRound: shownErrors.round, refusal, status: shown };
}
