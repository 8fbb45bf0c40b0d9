'use client';

import { useRouter } from 'next/navigation';
import { useCallback, useEffect, useRef, useState, type Dispatch, type SetStateAction } from 'react';
import type { TrailerCondition } from '@/lib/server/handoffs/condition';
import { precheck } from './precheck';
import type { StoredDraft } from './use-draft';

export type SubmitRefusal = { message: string; holds?: { reason: string }[]; cautions?: string[] };
export type SubmitStatus = 'idle' | 'sending' | 'queued';

/**
 * Sends the draft to POST /api/handoffs. Offline (or when the request cannot leave the phone)
 * the draft is queued and goes as soon as the connection is back, also after a reload.
 */
export function useSubmit(
  draft: StoredDraft | null,
  setDraft: Dispatch<SetStateAction<StoredDraft | null>>,
  forget: () => void,
  check: { isReefer: boolean; last: TrailerCondition['last'] },
) {
  const router = useRouter();
  const { isReefer, last } = check;
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [refusal, setRefusal] = useState<SubmitRefusal | null>(null);
  const [status, setStatus] = useState<SubmitStatus>('idle');

  // one submit at a time: the 'online' event and a re-queued draft must not send twice at once
  const inFlight = useRef(false);
  const send = useCallback(
    async (d: StoredDraft) => {
      if (inFlight.current) return;
      inFlight.current = true;
      const { body, errors: found } = await precheck(d, isReefer, last).finally(() => {
        inFlight.current = false;
      });
      setErrors(found);
      setRefusal(null);
      if (Object.keys(found).length) {
        setRefusal({ message: 'Some answers need attention (marked in red).' });
        return;
      }
      if (!navigator.onLine) {
        setDraft({ ...d, isQueued: true });
        setStatus('queued');
        return;
      }
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
        setDraft({ ...d, isQueued: true });
        setStatus('queued');
        return;
      }
      inFlight.current = false;
      const answer = await res.json().catch(() => ({}));
      if (res.ok) {
        forget();
        router.push(answer.handoff.receiptUrl);
        return;
      }
      setStatus('idle');
      setDraft({ ...d, isQueued: false });
      setErrors(answer.fieldErrors ?? {});
      setRefusal({
        message: answer.message ?? 'The handoff was not recorded.',
        holds: answer.holds,
        cautions: answer.cautions,
      });
    },
    [isReefer, last, setDraft, forget, router],
  );

  // a queued submit goes as soon as the connection is back (and on reload, if it is back already)
  useEffect(() => {
    if (!draft?.isQueued) return;
    const go = () => void send(draft);
    if (navigator.onLine) go();
    window.addEventListener('online', go);
    return () => window.removeEventListener('online', go);
  }, [draft, send]);

  return { send, errors, refusal, status };
}
