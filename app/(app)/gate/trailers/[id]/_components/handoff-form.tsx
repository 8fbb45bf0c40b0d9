'use client';

import { useRouter } from 'next/navigation';
import { useCallback, useEffect, useRef, useState } from 'react';
import useSWR from 'swr';
import { Button } from '@/app/_components/button';
import { CAUTIONS, Caution } from '@/app/_components/caution';
import { FormError } from '@/app/_components/field';
import {
  draftToInput,
  itemChange,
  needsEvidence,
  newDraft,
  type Draft,
  type DraftItem,
} from '@/lib/handoffs/draft';
import type { TrailerCondition } from '@/lib/server/handoffs/condition';
import { handoffSubmitSchema } from '@/lib/validation/handoffs';
import { FuelButtons, ReeferFields } from './readings-fields';
import { newDraftKey, useDraft, type StoredDraft } from './use-draft';
import { WhoFields } from './who-fields';
import { ZoneSection } from './zone-section';

type Props = {
  condition: TrailerCondition;
  kind: 'drop' | 'hook';
  carriers: { id: string; name: string; scac: string }[];
  defaults: { carrierId: string; driverName: string; isDriver: boolean; carrierName?: string | null };
};
type Refusal = { message: string; holds?: { reason: string }[]; cautions?: string[] };

const fetcher = (url: string) => fetch(url).then((r) => r.json());

/** Client-side check with the shared schema, and the photo-and-note rule, before anything is sent. */
function precheck(d: Draft, isReefer: boolean, last: TrailerCondition['last']) {
  const body = draftToInput(d, isReefer);
  const errors: Record<string, string[]> = {};
  const parsed = handoffSubmitSchema.safeParse(body);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const key =
        issue.path[0] === 'items' ? `items.${String(issue.path[1])}` : issue.path.map(String).join('.');
      (errors[key] ??= []).push(issue.message);
    }
  }
  for (const [key, it] of Object.entries(d.items)) {
    if (needsEvidence(itemChange(it, last[key]), it) && (!it.photos?.length || !it.note?.trim())) {
      (errors[`items.${key}`] ??= []).push('New or worse damage needs a photo and a note.');
    }
  }
  return { body: parsed.success ? parsed.data : body, errors };
}

export function HandoffForm({ condition: initial, kind, carriers, defaults }: Props) {
  const router = useRouter();
  const { data } = useSWR<TrailerCondition>(`/api/trailers/${initial.trailer.id}/condition`, fetcher, {
    fallbackData: initial,
    revalidateOnMount: false,
  });
  const condition = data ?? initial;
  const { trailer, checklist, last } = condition;
  const isReefer = trailer.kind === 'reefer';
  const make = useCallback(
    () =>
      newDraft({
        idempotencyKey: newDraftKey(),
        trailerId: trailer.id,
        kind,
        carrierId: defaults.carrierId,
        driverName: defaults.driverName,
      }),
    [trailer.id, kind, defaults.carrierId, defaults.driverName],
  );
  const { draft, setDraft, discard, forget } = useDraft(trailer.id, kind, make);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [refusal, setRefusal] = useState<Refusal | null>(null);
  const [status, setStatus] = useState<'idle' | 'sending' | 'queued'>('idle');

  // one submit at a time: the 'online' event and a re-queued draft must not send twice at once
  const inFlight = useRef(false);
  const send = useCallback(
    async (d: StoredDraft) => {
      if (inFlight.current) return;
      const { body, errors: found } = precheck(d, isReefer, last);
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

  if (!draft) return <p className="text-gate">Opening the form…</p>;
  // functional updates: several taps (or one zone-wide "Same as last") may land before the next render
  const set = (p: Partial<Draft>) => setDraft((prev) => prev && { ...prev, ...p });
  const setItem = (key: string, v: DraftItem | undefined) =>
    setDraft((prev) => {
      if (!prev) return prev;
      const items = { ...prev.items };
      if (v) items[key] = v;
      else delete items[key];
      return { ...prev, items };
    });

  return (
    <form
      className="space-y-6"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        void send(draft);
      }}
    >
      <Caution title="Your inspection">{CAUTIONS.inspection}</Caution>
      <WhoFields
        draft={draft}
        set={set}
        carriers={carriers}
        isDriver={defaults.isDriver}
        carrierName={defaults.carrierName ?? null}
        errors={errors}
      />
      {isReefer ? (
        <FuelButtons
          value={draft.fuelEighths}
          onChange={(v) => set({ fuelEighths: v })}
          last={condition.lastReadings?.fuelEighths}
        />
      ) : null}
      {isReefer ? (
        <ReeferFields
          reefer={draft.reefer}
          set={(p) => setDraft((prev) => prev && { ...prev, reefer: { ...prev.reefer, ...p } })}
          errors={errors}
        />
      ) : null}
      {checklist.zones
        .filter((z) => z.key !== 'readings')
        .map((z) => (
          <ZoneSection
            key={z.key}
            zone={z}
            draft={draft}
            last={last}
            setItem={setItem}
            trailerId={trailer.id}
            fieldErrors={errors}
          />
        ))}
      <label className="block text-gate font-bold">
        Note for the record (optional)
        <textarea
          value={draft.note}
          onChange={(e) => set({ note: e.target.value })}
          rows={2}
          className="mt-1 block w-full rounded-lg border-2 border-paper-line p-2 text-gate"
        />
      </label>
      <div className="sticky bottom-0 space-y-2 border-t-2 border-paper-line bg-paper py-2">
        {status === 'queued' ? (
          <p role="status" className="rounded-lg bg-warn-bg p-3 text-gate font-bold text-warn">
            No connection: the handoff is saved on this phone and will be sent when the connection returns.
          </p>
        ) : null}
        {refusal ? (
          <div role="alert" className="space-y-1">
            <FormError message={refusal.message} />
            {refusal.holds?.length ? (
              <ul className="list-disc pl-6 text-gate text-danger">
                {refusal.holds.map((h) => (
                  <li key={h.reason}>{h.reason}</li>
                ))}
              </ul>
            ) : null}
            {refusal.cautions?.map((c) => (
              <Caution key={c}>{c}</Caution>
            ))}
          </div>
        ) : null}
        <Button type="submit" className="w-full min-h-tap-lg text-gate-lg" disabled={status === 'sending'}>
          {status === 'sending' ? 'Sending…' : `Record the ${kind}`}
        </Button>
      </div>
      <button
        type="button"
        onClick={discard}
        className="min-h-tap w-full text-gate-sm text-ink-soft underline"
      >
        Discard this draft
      </button>
    </form>
  );
}
