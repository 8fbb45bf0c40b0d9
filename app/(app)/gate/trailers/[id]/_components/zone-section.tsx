'use client';

import { useState } from 'react';
import { useLocale, useTranslations } from 'next-intl';
import { Caution } from '@/app/_components/caution';
import type { ChecklistZone } from '@/lib/engine';
import { sameAsLastForZone, unanswered, type Draft, type DraftItem } from '@/lib/handoffs/draft';
import type { LastSeen } from '@/lib/handoffs/last-condition';
import { ItemRow } from './item-row';

/**
 * One zone of the rest of the box (safety items are in their own step). Its items stay folded
 * behind "Check each item" until asked for, or while one of them has a message or is not ok.
 */
export function ZoneSection({
  zone,
  draft,
  last,
  setItem,
  trailerId,
  fieldErrors,
  timeZone,
}: {
  timeZone: string;
  zone: ChecklistZone;
  draft: Draft;
  last: Record<string, LastSeen>;
  setItem: (key: string, v: DraftItem | undefined) => void;
  trailerId: string;
  fieldErrors: Record<string, string[]>;
}) {
  const [opened, setOpened] = useState<boolean | null>(null);
  const t = useTranslations('Handoff.zone');
  const c = useTranslations('Cautions');
  const name = zone.label.toLocaleLowerCase(useLocale());
  const items = zone.items.filter((i) => i.kind !== 'reading' && !i.isSafety);
  if (!items.length) return null;
  const withLast = items.filter((i) => last[i.key]);
  const left = unanswered(items, draft);
  const needsLook = items.some(
    (i) =>
      fieldErrors[`items.${i.key}`]?.length || (draft.items[i.key] && draft.items[i.key].condition !== 'ok'),
  );
  const isOpen = opened ?? (needsLook || !withLast.length);
  return (
    <section
      aria-labelledby={`zone-${zone.key}`}
      data-testid={`zone-${zone.key}`}
      className="space-y-2 rounded-lg border-2 border-paper-line p-2"
    >
      <div className="flex items-center justify-between gap-2">
        <h3 id={`zone-${zone.key}`} className="text-gate-lg font-bold">
          {zone.label}
        </h3>
        <span className="text-gate-sm text-ink-soft">
          {left ? t('toCheck', { count: left }) : t('allChecked')}
        </span>
      </div>
      {zone.key === 'reefer_unit' && isOpen ? (
        <Caution title={c('titles.reefer')}>{c('reefer')}</Caution>
      ) : null}
      {withLast.length && left ? (
        <button
          type="button"
          onClick={() => {
            for (const [key, v] of Object.entries(sameAsLastForZone(items, draft, last))) setItem(key, v);
          }}
          className="min-h-tap w-full rounded-lg bg-brand px-3 text-gate font-bold text-on-fill"
        >
          {t('sameAsLast', { zone: name })}
        </button>
      ) : null}
      {withLast.length ? null : <p className="text-gate-sm text-ink-soft">{t('noEarlier')}</p>}
      <button
        type="button"
        aria-expanded={isOpen}
        onClick={() => setOpened(!isOpen)}
        className="min-h-tap w-full rounded-lg border-2 border-paper-line px-3 text-left text-gate-sm font-bold"
      >
        {t(isOpen ? 'hideItems' : 'showItems', { zone: name })}
      </button>
      {isOpen ? (
        <ul className="space-y-3">
          {items.map((i) => (
            <ItemRow
              key={i.key}
              item={i}
              value={draft.items[i.key]}
              last={last[i.key]}
              trailerId={trailerId}
              errors={fieldErrors[`items.${i.key}`]}
              onChange={(v) => setItem(i.key, v)}
              timeZone={timeZone}
            />
          ))}
        </ul>
      ) : null}
    </section>
  );
}
