'use client';

import { useState } from 'react';
import { useTranslations } from 'next-intl';
import { Caution } from '@/app/_components/caution';
import type { ChecklistItem, SafetyGroup } from '@/lib/engine';
import type { Draft, DraftItem } from '@/lib/handoffs/draft';
import type { LastSeen } from '@/lib/handoffs/last-condition';
import { ItemRow } from './item-row';
import { SafetyGroupAnswer } from './safety-group';

type Props = {
  groups: SafetyGroup[];
  items: ChecklistItem[];
  draft: Draft;
  last: Record<string, LastSeen>;
  setItem: (key: string, v: DraftItem | undefined) => void;
  trailerId: string;
  errors: Record<string, string[]>;
  timeZone: string;
};

/**
 * The safety checks: one explicit statement per group, each item of a group behind "Change one
 * item" (open by itself when one of its items has a message or is not ok), so the step stays short.
 */
export function SafetyStep({ groups, items, draft, last, setItem, trailerId, errors, timeZone }: Props) {
  const [opened, setOpened] = useState<Record<string, boolean>>({});
  const c = useTranslations('Cautions');
  const t = useTranslations('Handoff.safety');
  const byKey = new Map(items.map((i) => [i.key, i]));
  const grouped = new Set(groups.flatMap((g) => g.itemKeys));
  const loose = items.filter((i) => !grouped.has(i.key));
  const row = (i: ChecklistItem) => (
    <ItemRow
      key={i.key}
      item={i}
      value={draft.items[i.key]}
      last={last[i.key]}
      trailerId={trailerId}
      errors={errors[`items.${i.key}`]}
      onChange={(v) => setItem(i.key, v)}
      timeZone={timeZone}
    />
  );
  return (
    <div className="space-y-3">
      <Caution title={c('titles.underTrailer')}>{c('underTrailer')}</Caution>
      <p className="text-gate-sm">{t('explain')}</p>
      {groups.map((g) => {
        const needsLook = g.itemKeys.some(
          (k) => errors[`items.${k}`]?.length || (draft.items[k] && draft.items[k].condition !== 'ok'),
        );
        const isOpen = opened[g.key] ?? needsLook;
        return (
          <div key={g.key} className="space-y-2">
            <SafetyGroupAnswer group={g} items={items} answered={draft.items} setItem={setItem} />
            <button
              type="button"
              aria-expanded={isOpen}
              onClick={() => setOpened((o) => ({ ...o, [g.key]: !isOpen }))}
              className="min-h-tap w-full rounded-lg border-2 border-paper-line px-3 text-left text-gate-sm font-bold"
            >
              {t(isOpen ? 'hideItems' : 'showItems', { group: t(`groups.${g.key}`) })}
            </button>
            {isOpen ? <ul className="space-y-3">{g.itemKeys.map((k) => row(byKey.get(k)!))}</ul> : null}
          </div>
        );
      })}
      {loose.length ? <ul className="space-y-3">{loose.map(row)}</ul> : null}
    </div>
  );
}
