'use client';

import { CAUTIONS, Caution } from '@/app/_components/caution';
import type { ChecklistZone } from '@/lib/engine';
import { unanswered, type Draft, type DraftItem } from '@/lib/handoffs/draft';
import type { LastSeen } from '@/lib/handoffs/last-condition';
import { ItemRow } from './item-row';

export function ZoneSection({
  zone,
  draft,
  last,
  setItem,
  trailerId,
  fieldErrors,
}: {
  zone: ChecklistZone;
  draft: Draft;
  last: Record<string, LastSeen>;
  setItem: (key: string, v: DraftItem | undefined) => void;
  trailerId: string;
  fieldErrors: Record<string, string[]>;
}) {
  const items = zone.items.filter((i) => i.kind !== 'reading');
  const withLast = items.filter((i) => last[i.key]);
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
            for (const i of withLast) if (!draft.items[i.key]) setItem(i.key, { ...last[i.key].observation });
          }}
          className="min-h-tap-lg w-full rounded-lg bg-brand px-3 text-gate-lg font-bold text-white"
        >
          Same as last for {zone.label.toLowerCase()}
        </button>
      ) : (
        <p className="text-gate-sm text-ink-soft">No earlier record of this zone: check each item.</p>
      )}
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
          />
        ))}
      </ul>
    </section>
  );
}
