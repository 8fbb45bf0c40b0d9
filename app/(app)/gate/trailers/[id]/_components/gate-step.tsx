'use client';

import type { Dispatch, SetStateAction } from 'react';
import dynamic from 'next/dynamic';
import { useTranslations } from 'next-intl';
import { Caution } from '@/app/_components/caution';
import { FieldError, Textarea } from '@/app/_components/field';
import type { ChecklistItem, SafetyGroup } from '@/lib/engine';
import { sameAsLastForZone, type Draft, type DraftItem } from '@/lib/handoffs/draft';
import { HANDOFF_LIMITS } from '@/lib/handoffs/limits';
import type { StepKey } from '@/lib/handoffs/steps';
import type { TrailerCondition } from '@/lib/server/handoffs/condition';
import { Choice } from './choice';
import type { HandoffFormProps } from './handoff-form';
import { FuelButtons, ReeferFields } from './readings-fields';
import { SubmitBar } from './submit-bar';
import type { StoredDraft } from './use-draft';
import type { SubmitRefusal, SubmitStatus } from './use-submit';
import { WhoFields } from './who-fields';

// The safety checks and the rest of the box (with their item rows) load after the first steps, not
// with the page: the phone pages' first-load JavaScript budget (scripts/js-budget.mjs).
const SafetyStep = dynamic(() => import('./safety-step').then((m) => m.SafetyStep));
const ZoneSection = dynamic(() => import('./zone-section').then((m) => m.ZoneSection));

type Props = {
  step: StepKey;
  form: HandoffFormProps;
  condition: TrailerCondition;
  draft: Draft;
  set: (p: Partial<Draft>) => void;
  setDraft: Dispatch<SetStateAction<StoredDraft | null>>;
  setItem: (key: string, v: DraftItem | undefined) => void;
  groups: SafetyGroup[];
  items: ChecklistItem[];
  errors: Record<string, string[]>;
  submit: { status: SubmitStatus; refusal: SubmitRefusal | null; discard: () => void };
};

/** The questions of one step of the gate form. */
export function GateStep({
  step,
  form,
  condition,
  draft,
  set,
  setDraft,
  setItem,
  groups,
  items,
  errors,
  submit,
}: Props) {
  const { trailer, checklist, last } = condition;
  const t = useTranslations('Handoff');
  const c = useTranslations('Cautions');
  switch (step) {
    case 'who':
      return (
        <>
          <Caution title={c('titles.inspection')}>{c('inspection')}</Caution>
          {form.kind === 'hook' ? <Caution title={t('couplingTitle')}>{c('coupling')}</Caution> : null}
          <WhoFields
            draft={draft}
            set={set}
            carriers={form.carriers}
            isDriver={form.defaults.isDriver}
            carrierName={form.defaults.carrierName ?? null}
            errors={errors}
          />
          {form.asksPerishable || errors.isLoadPerishable ? (
            <div>
              <Choice
                label={t('hold.perishableQuestion')}
                options={[
                  { value: true, label: t('who.perishableYes'), tone: 'warn' },
                  { value: false, label: t('who.perishableNo'), tone: 'ok' },
                ]}
                value={draft.isLoadPerishable ?? null}
                onChange={(v) => set({ isLoadPerishable: v })}
                errorId={errors.isLoadPerishable?.length ? 'isLoadPerishable-error' : undefined}
              />
              <FieldError id="isLoadPerishable-error" messages={errors.isLoadPerishable} />
            </div>
          ) : null}
        </>
      );
    case 'fuel':
      return (
        <FuelButtons
          value={draft.fuelEighths}
          onChange={(v) => set({ fuelEighths: v })}
          last={condition.lastReadings?.fuelEighths}
          error={errors.fuelEighths}
        />
      );
    case 'reefer':
      return (
        <>
          <Caution title={c('titles.reefer')}>{c('reefer')}</Caution>
          <ReeferFields
            reefer={draft.reefer}
            set={(p) => setDraft((prev) => prev && { ...prev, reefer: { ...prev.reefer, ...p } })}
            errors={errors}
          />
        </>
      );
    case 'safety':
      return (
        <SafetyStep
          groups={groups}
          items={items.filter((i) => i.isSafety)}
          draft={draft}
          last={last}
          setItem={setItem}
          trailerId={trailer.id}
          errors={errors}
          timeZone={form.timeZone}
        />
      );
    case 'rest':
      return (
        <>
          {Object.keys(last).length ? (
            <button
              type="button"
              onClick={() => {
                for (const z of checklist.zones) {
                  for (const [key, v] of Object.entries(sameAsLastForZone(z.items, draft, last)))
                    setItem(key, v);
                }
              }}
              className="min-h-tap-lg w-full rounded-lg bg-brand px-3 text-gate-lg font-bold text-on-fill"
              data-testid="same-as-last-all"
            >
              {t('safety.sameAsLastAll')}
            </button>
          ) : null}
          {checklist.zones.map((z) => (
            <ZoneSection
              key={z.key}
              zone={z}
              draft={draft}
              last={last}
              setItem={setItem}
              trailerId={trailer.id}
              fieldErrors={errors}
              timeZone={form.timeZone}
            />
          ))}
        </>
      );
    case 'confirm':
      return (
        <>
          <Textarea
            label={t('confirm.note')}
            name="note"
            value={draft.note}
            onChange={(e) => set({ note: e.target.value })}
            rows={2}
            maxLength={HANDOFF_LIMITS.note}
            error={errors.note}
          />
          <SubmitBar kind={form.kind} status={submit.status} refusal={submit.refusal} />
          <button
            type="button"
            onClick={submit.discard}
            className="min-h-tap w-full text-gate-sm text-ink-soft underline"
          >
            {t('confirm.discard')}
          </button>
        </>
      );
  }
}
