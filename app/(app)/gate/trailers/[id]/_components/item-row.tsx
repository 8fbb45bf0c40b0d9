'use client';

import dynamic from 'next/dynamic';
import { useLocale, useTranslations } from 'next-intl';
import type { ChecklistItem, Condition } from '@/lib/engine';
import { itemChange, needsEvidence, type DraftItem } from '@/lib/handoffs/draft';
import type { LastSeen } from '@/lib/handoffs/last-condition';
import { Choice } from './choice';
import { ItemFields } from './item-fields';
import { formatTime } from '@/lib/format/time';
import { HANDOFF_LIMITS } from '@/lib/handoffs/limits';

// the camera and its upload code load when an item first asks for a photo, not with the form
const PhotoCapture = dynamic(() => import('@/app/_components/photo-capture').then((m) => m.PhotoCapture));

const CONDITION_OPTIONS = [
  { value: 'ok', tone: 'ok' },
  { value: 'minor', tone: 'warn' },
  { value: 'damaged', tone: 'danger' },
  { value: 'unsafe', tone: 'danger' },
  { value: 'missing', tone: 'danger' },
] as const satisfies { value: Exclude<Condition, 'not_checked'>; tone: 'ok' | 'warn' | 'danger' }[];

type Say = ReturnType<typeof useTranslations<'Handoff.item'>>;

/** An observation in words ("Damaged, insulation showing") in the reader's language. */
export function describeObservation(t: Say, o: DraftItem | LastSeen['observation']): string {
  const parts = [t(`condition.${o.condition}`)];
  if (o.isEngaged !== undefined) parts.push(t(o.isEngaged ? 'engaged' : 'notEngaged'));
  if (o.isMounted !== undefined) parts.push(t(o.isMounted ? 'mounted' : 'notMounted'));
  if (o.treadThirtySeconds !== undefined) parts.push(t('tread', { tread: o.treadThirtySeconds }));
  if (o.isHoldingAir !== undefined) parts.push(t(o.isHoldingAir ? 'holdsAir' : 'notHoldingAir'));
  if (o.isLocking !== undefined) parts.push(t(o.isLocking ? 'locks' : 'doesNotLock'));
  if (o.isInsulationShowing) parts.push(t('insulationShowing'));
  if (o.isLeaking) parts.push(t('leaking'));
  if (o.cleanliness) parts.push(t(`cleanliness.${o.cleanliness}`));
  return parts.join(', ');
}

export function ItemRow({
  item,
  value,
  last,
  onChange,
  trailerId,
  errors,
  timeZone,
}: {
  /** The terminal's zone: every time on the form is read in it (lib/format/time.ts). */
  timeZone: string;
  item: ChecklistItem;
  value: DraftItem | undefined;
  last: LastSeen | undefined;
  onChange: (next: DraftItem | undefined) => void;
  trailerId: string;
  errors?: string[];
}) {
  const t = useTranslations('Handoff.item');
  const locale = useLocale();
  const safety = useTranslations('Handoff.safety');
  const describe = (o: DraftItem | LastSeen['observation']) => describeObservation(t, o);
  const change = itemChange(value, last);
  const isChanged = value && last && change !== 'unchanged' && change !== 'not_checked';
  const evidence = needsEvidence(change, value);
  const set = (patch: Partial<DraftItem>) =>
    onChange({ ...(value ?? { condition: 'ok' }), ...patch } as DraftItem);
  return (
    <li
      className={`space-y-2 rounded-lg border-2 p-3 ${evidence ? 'border-danger' : value ? 'border-ok' : 'border-paper-line'}`}
      aria-label={item.label}
      data-invalid={errors?.length ? true : undefined}
      tabIndex={errors?.length ? -1 : undefined}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="text-gate-lg font-bold">{item.label}</h3>
        <span className="text-gate-sm text-ink-soft">{value ? describe(value) : t('notCheckedYet')}</span>
      </div>
      {last && !isChanged ? (
        <p className="text-gate-sm text-ink-soft">
          {t('last', {
            observation: describe(last.observation),
            when: formatTime(last.at, timeZone, 'dateTime', locale),
            by: last.by,
          })}
        </p>
      ) : null}
      {item.isSafety && !value ? (
        <p className="text-gate-sm font-bold text-warn">{safety('notCopied')}</p>
      ) : null}
      {last && !item.isSafety && (!value || isChanged) ? (
        <button
          type="button"
          onClick={() => onChange({ ...last.observation })}
          className="min-h-tap w-full rounded-lg border-2 border-brand bg-brand-light px-3 text-gate font-bold text-brand"
        >
          {t('sameAsLast')}
        </button>
      ) : null}
      <Choice
        label={t('conditionOf', { item: item.label })}
        hideLabel
        options={CONDITION_OPTIONS.map((o) => ({ ...o, label: t(`condition.${o.value}`) }))}
        value={value?.condition}
        onChange={(c) => set({ condition: c })}
        columns={3}
      />
      {value && value.condition !== 'missing' ? (
        <ItemFields kind={item.kind} value={value} set={set} label={item.label} />
      ) : null}
      {isChanged ? (
        <div
          className="grid grid-cols-2 gap-2 text-gate-sm"
          aria-label={t('lastAndNow', { item: item.label })}
        >
          <div className="rounded bg-paper-dim p-2">
            <p className="font-bold">{t('lastRecord')}</p>
            <p>{describe(last.observation)}</p>
            <p className="text-ink-soft">
              {formatTime(last.at, timeZone, 'dateTime', locale)}, {last.by}
            </p>
          </div>
          <div className={`rounded p-2 ${evidence ? 'bg-danger-bg text-danger' : 'bg-ok-bg text-ok'}`}>
            <p className="font-bold">{t('now')}</p>
            <p>{describe(value)}</p>
            <p className="font-bold">
              {evidence
                ? change === 'new'
                  ? t('newDamage')
                  : t('worse')
                : change === 'repaired'
                  ? t('repaired')
                  : ''}
            </p>
          </div>
        </div>
      ) : null}
      {evidence ? <p className="text-gate-sm font-bold text-danger">{t('needsEvidence')}</p> : null}
      {value && value.condition !== 'ok' ? (
        <>
          <label className="block text-gate-sm font-bold" htmlFor={`note-${item.key}`}>
            {t('note')}
          </label>
          <textarea
            id={`note-${item.key}`}
            value={value.note ?? ''}
            onChange={(e) => set({ note: e.target.value })}
            rows={2}
            maxLength={HANDOFF_LIMITS.itemNote}
            className="block w-full rounded-lg border-2 border-paper-line p-2 text-gate"
          />
          <PhotoCapture
            trailerId={trailerId}
            itemKey={item.key}
            label={item.label}
            photos={value.photos ?? []}
            onAdd={(p) => set({ photos: [...(value.photos ?? []), p] })}
          />
        </>
      ) : null}
      {value ? (
        <button
          type="button"
          onClick={() => onChange(undefined)}
          className="min-h-tap text-gate-sm text-ink-soft underline"
        >
          {t('clear')}
        </button>
      ) : null}
      <p aria-live="polite" className="text-gate-sm font-bold text-danger">
        {errors?.join(' ') ?? ''}
      </p>
    </li>
  );
}
