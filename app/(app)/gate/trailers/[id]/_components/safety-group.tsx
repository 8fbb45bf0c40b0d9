'use client';

import { useState } from 'react';
import { useTranslations } from 'next-intl';
import type { ChecklistItem } from '@/lib/engine';
import { statedObservation, type SafetyGroup } from '@/lib/engine/safety';
import type { DraftItem } from '@/lib/handoffs/draft';
import { TREAD_LIMITS } from '@/lib/handoffs/limits';

/** The number a group's statement says: hinges only, for the rear doors (their lock rods are two more). */
const statementCount = (g: SafetyGroup) =>
  g.key === 'rear_doors' ? g.itemKeys.length - 2 : g.itemKeys.length;

/**
 * One explicit statement for a safety group ("all four pins out and locked: I looked at each").
 * It answers the group's unanswered items; any item can then be changed on its own (an exception).
 */
export function SafetyGroupAnswer({
  group,
  items,
  answered,
  setItem,
}: {
  group: SafetyGroup;
  items: ChecklistItem[];
  answered: Record<string, DraftItem | undefined>;
  setItem: (key: string, v: DraftItem) => void;
}) {
  const t = useTranslations('Handoff.safety');
  const [tread, setTread] = useState('');
  const [error, setError] = useState<string | null>(null);
  const byKey = new Map(items.map((i) => [i.key, i]));
  const done = group.itemKeys.filter((k) => answered[k]).length;
  const id = `tread-${group.key}`;
  const label = t(`groups.${group.key}`);
  return (
    <div
      className="space-y-2 rounded-lg border-2 border-warn bg-warn-bg p-3"
      aria-label={label}
      role="group"
      data-testid={`safety-${group.key}`}
    >
      <p className="text-gate font-bold">{label}</p>
      {group.asksTread ? (
        <div>
          <label htmlFor={id} className="block text-gate-sm font-bold">
            {t('treadLabel')}
          </label>
          <input
            id={id}
            type="number"
            inputMode="numeric"
            min={TREAD_LIMITS.min}
            max={TREAD_LIMITS.max}
            step={1}
            value={tread}
            onChange={(e) => setTread(e.target.value)}
            aria-invalid={error ? true : undefined}
            aria-describedby={error ? `${id}-error` : undefined}
            className="mt-1 block min-h-tap w-32 rounded-lg border-2 border-paper-line bg-paper px-3 text-gate"
          />
          {error ? (
            <p id={`${id}-error`} className="text-gate-sm font-bold text-danger">
              {error}
            </p>
          ) : null}
        </div>
      ) : null}
      <button
        type="button"
        onClick={() => {
          let depth: number | undefined;
          if (group.asksTread) {
            depth = Number(tread);
            if (
              tread.trim() === '' ||
              !Number.isInteger(depth) ||
              depth < TREAD_LIMITS.min ||
              depth > TREAD_LIMITS.max
            ) {
              setError(t('treadNeeded'));
              return;
            }
          }
          setError(null);
          for (const key of group.itemKeys) {
            if (answered[key]) continue;
            setItem(key, statedObservation(byKey.get(key)!.kind, depth) as DraftItem);
          }
        }}
        className="min-h-tap-lg w-full rounded-lg bg-brand px-3 text-gate font-bold text-on-fill"
        data-testid="safety-statement"
      >
        {t(`statements.${group.key}`, { count: statementCount(group) })}
      </button>
      {done ? <p className="text-gate-sm text-ink-soft">{t('stated', { count: done })}</p> : null}
    </div>
  );
}
