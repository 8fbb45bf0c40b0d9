'use client';

import { CAUTIONS, Caution } from '@/app/_components/caution';
import type { ChecklistZone, SafetyGroup } from '@/lib/engine';
import { sameAsLastForZone, unanswered, type Draft, type DraftItem } from '@/lib/handoffs/draft';
import type { LastSeen } from '@/lib/handoffs/last-condition';
import { ItemRow } from './item-row';
import { SafetyGroupAnswer } from './safety-group';
import { SAFETY_WORDS } from './safety-words';

export function ZoneSection({
  zone,
  draft,
  last,
  setItem,
  trailerId,
  fieldErrors,
  groups,
  timeZone,
}: {
  timeZone: string;
  groups: SafetyGroup[];
  zone: ChecklistZone;
  draft: Draft;
  last: Record<string, LastSeen>;
  setItem: (key: string, v: DraftItem | undefined) => void;
  trailerId: string;
  fieldErrors: Record<string, string[]>;
}) {
  const items = zone.items.filter((i) => i.kind !== 'reading');
  const withLast = items.filter((i) => last[i.key] && !i.isSafety);
  const keys = new Set(items.map((i) => i.key));
  const here = groups.filter((g) => keys.has(g.itemKeys[0]));
  const left = unanswered(items, draft);
  return (
    <section aria-labelledby={`zone-${zone.key}`} className="space-y-3">
      <div className="sticky top-0 z-10 flex items-center justify-between gap-2 bg-paper py-2">
        <h2 id={`zone-${zone.key}`} className="text-gate-xl font-bold">
          {zone.label}
        </h2>
        <span className="text-gate-sm text-ink-soft">{left ? `${left} to check` : 'All checked'}</span>
      </div>
      {zone.key === 'undercarriage' || zone.key === 'tires' ? (
        <Caution title="Before going under the trailer">{CAUTIONS.underTrailer}</Caution>
      ) : null}
      {zone.key === 'reefer_unit' ? <Caution title="Reefer unit">{CAUTIONS.reefer}</Caution> : null}
      {withLast.length ? (
        <button
          type="button"
          onClick={() => {
            for (const [key, v] of Object.entries(sameAsLastForZone(items, draft, last))) setItem(key, v);
          }}
          className="min-h-tap-lg w-full rounded-lg bg-brand px-3 text-gate-lg font-bold text-on-fill"
        >
          Same as last for {zone.label.toLowerCase()}
        </button>
      ) : (
        <p className="text-gate-sm text-ink-soft">No earlier record of this zone: check each item.</p>
      )}
      {here.length ? (
        <div className="space-y-2">
          <h3 className="text-gate-lg font-bold">{SAFETY_WORDS.heading}</h3>
          <p className="text-gate-sm">{SAFETY_WORDS.explain}</p>
          {here.map((g) => (
            <SafetyGroupAnswer key={g.key} group={g} items={items} answered={draft.items} setItem={setItem} />
          ))}
        </div>
      ) : null}
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
    </section>
  );
}
