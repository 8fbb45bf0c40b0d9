'use client';

import dynamic from 'next/dynamic';
import type { ChecklistItem, Condition } from '@/lib/engine';
import { itemChange, needsEvidence, type DraftItem } from '@/lib/handoffs/draft';
import type { LastSeen } from '@/lib/handoffs/last-condition';
import { Choice } from './choice';
import { ItemFields } from './item-fields';
import { SAFETY_WORDS } from './safety-words';
import { formatTime } from '@/lib/format/time';
import { HANDOFF_LIMITS } from '@/lib/handoffs/limits';

// the camera and its upload code load when an item first asks for a photo, not with the form
const PhotoCapture = dynamic(() => import('@/app/_components/photo-capture').then((m) => m.PhotoCapture));

const CONDITION_OPTIONS: {
  value: Exclude<Condition, 'not_checked'>;
  label: string;
  tone: 'ok' | 'warn' | 'danger';
}[] = [
  { value: 'ok', label: 'OK', tone: 'ok' },
  { value: 'minor', label: 'Minor', tone: 'warn' },
  { value: 'damaged', label: 'Damaged', tone: 'danger' },
  { value: 'unsafe', label: 'Unsafe', tone: 'danger' },
  { value: 'missing', label: 'Missing', tone: 'danger' },
];
const WORDS: Record<string, string> = {
  ok: 'OK',
  minor: 'Minor',
  damaged: 'Damaged',
  unsafe: 'Unsafe',
  missing: 'Missing',
  not_checked: 'Not checked',
};

export function describeObservation(o: DraftItem | LastSeen['observation']): string {
  const parts = [WORDS[o.condition]];
  if (o.isEngaged !== undefined) parts.push(o.isEngaged ? 'engaged' : 'NOT engaged');
  if (o.isMounted !== undefined) parts.push(o.isMounted ? 'mounted' : 'not mounted');
  if (o.treadThirtySeconds !== undefined) parts.push(`${o.treadThirtySeconds}/32 in`);
  if (o.isHoldingAir !== undefined) parts.push(o.isHoldingAir ? 'holds air' : 'NOT holding air');
  if (o.isLocking !== undefined) parts.push(o.isLocking ? 'locks' : 'does not lock');
  if (o.isInsulationShowing) parts.push('insulation showing');
  if (o.isLeaking) parts.push('leaking');
  if (o.cleanliness) parts.push(o.cleanliness);
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
        <span className="text-gate-sm text-ink-soft">
          {value ? describeObservation(value) : 'Not checked yet'}
        </span>
      </div>
      {last && !isChanged ? (
        <p className="text-gate-sm text-ink-soft">
          Last: {describeObservation(last.observation)} · {formatTime(last.at, timeZone)}, {last.by}
        </p>
      ) : null}
      {item.isSafety && !value ? (
        <p className="text-gate-sm font-bold text-warn">{SAFETY_WORDS.notCopied}</p>
      ) : null}
      {last && !item.isSafety && (!value || isChanged) ? (
        <button
          type="button"
          onClick={() => onChange({ ...last.observation })}
          className="min-h-tap w-full rounded-lg border-2 border-brand bg-brand-light px-3 text-gate font-bold text-brand"
        >
          Same as last
        </button>
      ) : null}
      <Choice
        label={`${item.label}: condition`}
        hideLabel
        options={CONDITION_OPTIONS}
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
          aria-label={`${item.label}: last record and now`}
        >
          <div className="rounded bg-paper-dim p-2">
            <p className="font-bold">Last record</p>
            <p>{describeObservation(last.observation)}</p>
            <p className="text-ink-soft">
              {formatTime(last.at, timeZone)}, {last.by}
            </p>
          </div>
          <div className={`rounded p-2 ${evidence ? 'bg-danger-bg text-danger' : 'bg-ok-bg text-ok'}`}>
            <p className="font-bold">Now</p>
            <p>{describeObservation(value)}</p>
            <p className="font-bold">
              {evidence
                ? change === 'new'
                  ? 'New damage'
                  : 'Worse than before'
                : change === 'repaired'
                  ? 'Repaired'
                  : ''}
            </p>
          </div>
        </div>
      ) : null}
      {evidence ? (
        <p className="text-gate-sm font-bold text-danger">New or worse damage: add a photo and a note.</p>
      ) : null}
      {value && value.condition !== 'ok' ? (
        <>
          <label className="block text-gate-sm font-bold" htmlFor={`note-${item.key}`}>
            Note: what do you see?
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
          Clear (not checked)
        </button>
      ) : null}
      <p aria-live="polite" className="text-gate-sm font-bold text-danger">
        {errors?.join(' ') ?? ''}
      </p>
    </li>
  );
}
