'use client';

import { useTranslations } from 'next-intl';
import { useState } from 'react';
import { SLOT_WORDS, slotFlags, type SlotTone } from '@/lib/yard/map-signal';
import { firstRows } from '@/lib/yard/row-window';
import type { Board, BoardSpot, YardPolicy } from '@/lib/yard/types';
import './yard-map.css';

const TONE_CLASS: Record<NonNullable<SlotTone> | 'none', string> = {
  out_of_service: ' x',
  reefer_off: ' o',
  restricted: ' h',
  low_fuel: ' f',
  none: '',
};
const WORD_CLASS = (w: string) =>
  w === SLOT_WORDS.out_of_service
    ? 'x'
    : w === SLOT_WORDS.restricted
      ? 'h'
      : w === SLOT_WORDS.reefer_off
        ? 'o'
        : 'f';

/**
 * One slot or door: unit number, loaded/empty and the flags in words as well as colour. A plain
 * function, not a component: thousands of cells hydrate faster without a fiber each.
 */
type T = ReturnType<typeof useTranslations<'Yard'>>;

/** A slot's flag in the reader's language (the rule returns the English words of map-signal). */
function flagWord(tr: T, cls: string, fuelEighths: number | null) {
  if (cls === 'x') return tr('map.outOfService');
  if (cls === 'h') return tr('map.restricted');
  if (cls === 'o') return tr('map.reeferOff');
  return tr('map.fuel', { eighths: String(fuelEighths) });
}

function spotCell(tr: T, spot: BoardSpot, policy: YardPolicy, isDimmed: boolean) {
  const t = spot.trailer;
  const dim = isDimmed ? ' d' : '';
  if (!t)
    return (
      <li key={spot.id} data-spot={spot.label} className={`ym-s e${dim}`}>
        <b>{spot.label}</b>
        {tr('map.free')}
      </li>
    );
  const { tone, words } = slotFlags(t, policy);
  return (
    <li key={spot.id} data-spot={spot.label} className={`ym-s${TONE_CLASS[tone ?? 'none']}${dim}`}>
      <b>{spot.label}</b>
      <strong>{t.unitNumber}</strong>
      {t.isLoaded ? tr('cell.loaded') : tr('cell.empty')}
      {words.length ? <br /> : null}
      {words.map((w) => (
        <i key={w} className={WORD_CLASS(w)}>
          {flagWord(tr, WORD_CLASS(w), t.fuelEighths)}
        </i>
      ))}
    </li>
  );
}

/**
 * The yard drawn as rows of slots, then the dock doors (CSS grid; wraps on a phone). A big yard
 * draws its first rows (lib/yard/row-window.ts) and lists the others, each opened on demand.
 */
export function YardMap({
  board,
  highlight,
  policy,
  isPartial = false,
}: {
  board: Board;
  highlight: Set<string> | null;
  policy: YardPolicy;
  isPartial?: boolean;
}) {
  const tr = useTranslations('Yard');
  const t = useTranslations('YardRows');
  const [opened, setOpened] = useState<Set<string> | 'all'>(() => firstRows(board));
  const isOpen = (key: string) => key === 'doors' || opened === 'all' || opened.has(key);
  const byRow = new Map<string, BoardSpot[]>();
  for (const s of board.spots) {
    const key = s.kind === 'door' ? 'doors' : (s.rowId ?? 'doors');
    const list = byRow.get(key);
    if (list) list.push(s);
    else byRow.set(key, [s]);
  }
  const groups = [
    ...board.rows.map((r) => ({ key: r.id, name: r.name })),
    { key: 'doors', name: tr('map.doors') },
  ].flatMap((g) =>
    byRow.get(g.key)?.length || (isPartial && g.key !== 'doors')
      ? [{ ...g, spots: byRow.get(g.key) ?? [] }]
      : [],
  );
  const closed = groups.filter((g) => !isOpen(g.key)).length;
  return (
    <div id="yard-map" className="space-y-3" data-testid="yard-map">
      {groups.map((g) =>
        isOpen(g.key) ? (
          <section key={g.key} aria-label={g.name} className="ym-row">
            <h2 className="text-gate font-bold">{g.name}</h2>
            {g.spots.length ? (
              <ul className="ym-grid">
                {g.spots.map((s) =>
                  spotCell(tr, s, policy, highlight !== null && !(s.trailer && highlight.has(s.trailer.id))),
                )}
              </ul>
            ) : (
              <p className="text-gate-sm text-ink-soft">{t('loading')}</p>
            )}
          </section>
        ) : (
          <section key={g.key} aria-label={g.name} className="ym-row flex flex-wrap items-center gap-3">
            <h2 className="text-gate font-bold">{g.name}</h2>
            {g.spots.length ? (
              <span className="text-gate-sm text-ink-soft">
                {t('summary', {
                  slots: g.spots.length,
                  trailers: g.spots.filter((s) => s.trailer).length,
                  flagged: g.spots.filter((s) => s.trailer && slotFlags(s.trailer, policy).tone).length,
                })}
              </span>
            ) : null}
            <button
              type="button"
              onClick={() => setOpened((o) => (o === 'all' ? o : new Set([...o, g.key])))}
              className="min-h-tap rounded-lg border-2 border-brand px-3 text-gate-sm font-bold text-brand"
            >
              {t('show', { row: g.name })}
            </button>
          </section>
        ),
      )}
      {closed > 1 ? (
        <button
          type="button"
          onClick={() => setOpened('all')}
          className="min-h-tap rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
        >
          {t('showAll', { count: closed })}
        </button>
      ) : null}
      <p className="text-gate-sm text-ink-soft">{tr('map.legend', { eighths: policy.lowFuelEighths })}</p>
    </div>
  );
}
