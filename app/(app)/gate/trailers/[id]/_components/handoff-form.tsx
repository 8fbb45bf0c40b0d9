'use client';

import { useCallback, useMemo, useRef } from 'react';
import useSWR from 'swr';
import { CAUTIONS, Caution } from '@/app/_components/caution';
import { FieldError, Textarea } from '@/app/_components/field';
import { safetyGroups } from '@/lib/engine/safety';
import { newDraft, sameAsLastForZone, type Draft, type DraftItem } from '@/lib/handoffs/draft';
import { HOOK_WORDS } from '@/lib/handoffs/hook-words';
import { HANDOFF_LIMITS } from '@/lib/handoffs/limits';
import type { TrailerCondition } from '@/lib/server/handoffs/condition';
import { Choice } from './choice';
import { FuelButtons, ReeferFields } from './readings-fields';
import { SAFETY_WORDS } from './safety-words';
import { useFocusFirstError } from './focus-first-error';
import { SubmitBar } from './submit-bar';
import { newDraftKey, useDraft } from './use-draft';
import { useSubmit } from './use-submit';
import { WhoFields } from './who-fields';
import { ZoneSection } from './zone-section';

type Props = {
  condition: TrailerCondition;
  kind: 'drop' | 'hook';
  /** A hook of a "no perishable loads" trailer asks whether the load is perishable. */
  asksPerishable?: boolean;
  /** The terminal's IANA zone: the form's "Last:" times are read in it. */
  timeZone: string;
  carriers: { id: string; name: string; scac: string }[];
  defaults: { carrierId: string; driverName: string; isDriver: boolean; carrierName?: string | null };
};
const fetcher = (url: string) => fetch(url).then((r) => r.json());

export function HandoffForm({
  condition: initial,
  kind,
  asksPerishable = false,
  timeZone,
  carriers,
  defaults,
}: Props) {
  const { data } = useSWR<TrailerCondition>(`/api/trailers/${initial.trailer.id}/condition`, fetcher, {
    fallbackData: initial,
    revalidateOnMount: false,
  });
  const condition = data ?? initial;
  const { trailer, checklist, last } = condition;
  const isReefer = trailer.kind === 'reefer';
  const groups = safetyGroups(checklist);
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
  const itemKeys = useMemo(() => checklist.zones.flatMap((z) => z.items.map((i) => i.key)), [checklist]);
  const { send, errors, errorRound, refusal, status } = useSubmit(draft, setDraft, forget, {
    isReefer,
    last,
    itemKeys,
  });
  const formRef = useRef<HTMLFormElement>(null);
  useFocusFirstError(formRef, errorRound, Boolean(draft));

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
      ref={formRef}
      className="space-y-6"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        void send(draft);
      }}
    >
      <Caution title="Your inspection">{CAUTIONS.inspection}</Caution>
      {kind === 'hook' ? <Caution title="Coupling checks">{CAUTIONS.coupling}</Caution> : null}
      <WhoFields
        draft={draft}
        set={set}
        carriers={carriers}
        isDriver={defaults.isDriver}
        carrierName={defaults.carrierName ?? null}
        errors={errors}
      />
      {asksPerishable || errors.isLoadPerishable ? (
        <div>
          <Choice
            label={HOOK_WORDS.perishableQuestion}
            options={[
              { value: true, label: 'Yes, perishable', tone: 'warn' },
              { value: false, label: 'No, not perishable', tone: 'ok' },
            ]}
            value={draft.isLoadPerishable ?? null}
            onChange={(v) => set({ isLoadPerishable: v })}
          />
          <FieldError id="isLoadPerishable-error" messages={errors.isLoadPerishable} />
        </div>
      ) : null}
      {isReefer ? (
        <FuelButtons
          value={draft.fuelEighths}
          onChange={(v) => set({ fuelEighths: v })}
          last={condition.lastReadings?.fuelEighths}
          error={errors.fuelEighths}
        />
      ) : null}
      {isReefer ? (
        <ReeferFields
          reefer={draft.reefer}
          set={(p) => setDraft((prev) => prev && { ...prev, reefer: { ...prev.reefer, ...p } })}
          errors={errors}
        />
      ) : null}
      {Object.keys(last).length ? (
        <button
          type="button"
          onClick={() => {
            for (const z of checklist.zones) {
              for (const [key, v] of Object.entries(sameAsLastForZone(z.items, draft, last))) setItem(key, v);
            }
          }}
          className="min-h-tap-lg w-full rounded-lg bg-brand px-3 text-gate-lg font-bold text-on-fill"
        >
          {SAFETY_WORDS.sameAsLastAll}
        </button>
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
            groups={groups}
            timeZone={timeZone}
          />
        ))}
      <Textarea
        label="Note for the record (optional)"
        name="note"
        value={draft.note}
        onChange={(e) => set({ note: e.target.value })}
        rows={2}
        maxLength={HANDOFF_LIMITS.note}
        error={errors.note}
      />
      <SubmitBar kind={kind} status={status} refusal={refusal} />
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
