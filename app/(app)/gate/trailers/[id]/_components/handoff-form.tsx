'use client';

import { useCallback, useMemo, useRef } from 'react';
import { useTranslations } from 'next-intl';
import useSWR from 'swr';
import { safetyGroups } from '@/lib/engine/safety';
import { newDraft, type Draft, type DraftItem } from '@/lib/handoffs/draft';
import {
  firstStepWithError,
  gateSteps,
  isStepComplete,
  type StepContext,
  type StepKey,
} from '@/lib/handoffs/steps';
import type { TrailerCondition } from '@/lib/server/handoffs/condition';
import { useFocusFirstError } from './focus-first-error';
import { GateStep } from './gate-step';
import { StepCard } from './step-card';
import { stepSummary } from './step-summary';
import { newDraftKey, useDraft } from './use-draft';
import { useSteps } from './use-steps';
import { useSubmit } from './use-submit';

export type HandoffFormProps = {
  condition: TrailerCondition;
  kind: 'drop' | 'hook';
  /** A hook of a "no perishable loads" trailer asks whether the load is perishable. */
  asksPerishable?: boolean;
  /** The terminal's IANA zone: the form's "Last:" times are read in it. */
  timeZone: string;
  carriers: { id: string; name: string; scac: string }[];
  defaults: {
    carrierId: string;
    driverName: string;
    isDriver: boolean;
    carrierName?: string | null;
    /** The tractor of this driver's latest handoff, prefilled. */
    tractorNumber?: string | null;
  };
};
const fetcher = (url: string) => fetch(url).then((r) => r.json());

/** The gate form in steps: who and what, fuel and reefer readings (reefers), safety, the rest, confirm. */
export function HandoffForm(props: HandoffFormProps) {
  const { condition: initial, kind, asksPerishable = false, defaults } = props;
  const t = useTranslations('Handoff');
  const { data } = useSWR<TrailerCondition>(`/api/trailers/${initial.trailer.id}/condition`, fetcher, {
    fallbackData: initial,
    revalidateOnMount: false,
  });
  const condition = data ?? initial;
  const { trailer, checklist, last } = condition;
  const isReefer = trailer.kind === 'reefer';
  const groups = useMemo(() => safetyGroups(checklist), [checklist]);
  const items = useMemo(
    () => checklist.zones.flatMap((z) => z.items).filter((i) => i.kind !== 'reading'),
    [checklist],
  );
  const itemKeys = useMemo(() => items.map((i) => i.key), [items]);
  const ctx: StepContext = useMemo(
    () => ({
      isReefer,
      asksPerishable,
      safetyKeys: items.filter((i) => i.isSafety).map((i) => i.key),
      otherKeys: items.filter((i) => !i.isSafety).map((i) => i.key),
    }),
    [isReefer, asksPerishable, items],
  );
  const steps = useMemo(() => gateSteps(isReefer), [isReefer]);
  const make = useCallback(
    () => ({
      ...newDraft({
        idempotencyKey: newDraftKey(),
        trailerId: trailer.id,
        kind,
        carrierId: defaults.carrierId,
        driverName: defaults.driverName,
      }),
      tractorNumber: defaults.tractorNumber ?? '',
    }),
    [trailer.id, kind, defaults.carrierId, defaults.driverName, defaults.tractorNumber],
  );
  const { draft, setDraft, discard, forget } = useDraft(trailer.id, kind, make);
  const { send, errors, errorRound, refusal, status } = useSubmit(draft, setDraft, forget, {
    isReefer,
    last,
    itemKeys,
  });
  const { open, setOpen, inputHandlers } = useSteps(steps, draft, ctx, errors, errorRound);
  const formRef = useRef<HTMLFormElement>(null);
  useFocusFirstError(formRef, errorRound, open === firstStepWithError(steps, errors, ctx));

  if (!draft) return <p className="text-gate">{t('opening')}</p>;
  const title = (s: StepKey) => t(`steps.${s}`);
  const say = (key: string, values?: Record<string, string | number>) => t(`summary.${key}`, values);
  // functional updates: several taps (or one zone-wide "Same as last") may land before the next render
  const set = (p: Partial<Draft>) => setDraft((prev) => prev && { ...prev, ...p });
  const setItem = (key: string, v: DraftItem | undefined) =>
    setDraft((prev) => {
      if (!prev) return prev;
      const next = { ...prev.items };
      if (v) next[key] = v;
      else delete next[key];
      return { ...prev, items: next };
    });
  const count = (keys: readonly string[]) =>
    [keys.filter((k) => draft.items[k]?.condition).length, keys.length] as [number, number];
  const counts = { safety: count(ctx.safetyKeys), rest: count(ctx.otherKeys) };
  const at = steps.indexOf(open);

  return (
    <form
      ref={formRef}
      className="space-y-3"
      noValidate
      {...inputHandlers}
      onSubmit={(e) => {
        e.preventDefault();
        void send(draft);
      }}
    >
      <p aria-live="polite" className="text-gate font-bold text-ink-soft">
        {t('progress', { number: at + 1, total: steps.length, title: title(open) })}
      </p>
      {steps.map((step, i) => (
        <StepCard
          key={step}
          id={step}
          number={i + 1}
          title={title(step)}
          summary={stepSummary(step, draft, counts, say)}
          isOpen={open === step}
          isComplete={isStepComplete(step, draft, ctx)}
          onOpen={() => setOpen(step)}
          onNext={step === 'confirm' ? undefined : () => setOpen(steps[i + 1])}
          nextLabel={step === 'confirm' ? undefined : t('next', { title: title(steps[i + 1]) })}
        >
          <GateStep
            step={step}
            form={props}
            condition={condition}
            draft={draft}
            set={set}
            setDraft={setDraft}
            setItem={setItem}
            groups={groups}
            items={items}
            errors={errors}
            submit={{ status, refusal, discard }}
          />
        </StepCard>
      ))}
    </form>
  );
}
