import { useTranslations } from 'next-intl';
import { SLOT_WORDS, slotFlags, type SlotTone } from '@/lib/yard/map-signal';
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

/** The yard drawn as rows of slots, then the dock doors (CSS grid; wraps on a phone). */
export function YardMap({
  board,
  highlight,
  policy,
}: {
  board: Board;
  highlight: Set<string> | null;
  policy: YardPolicy;
}) {
  const tr = useTranslations('Yard');
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
  ].flatMap((g) => (byRow.get(g.key)?.length ? [{ ...g, spots: byRow.get(g.key)! }] : []));
  return (
    <div id="yard-map" className="space-y-3" data-testid="yard-map">
      {groups.map((g) => (
        <section key={g.key} aria-label={g.name} className="ym-row">
          <h2 className="text-gate font-bold">{g.name}</h2>
          <ul className="ym-grid">
            {g.spots.map((s) =>
              spotCell(tr, s, policy, highlight !== null && !(s.trailer && highlight.has(s.trailer.id))),
            )}
          </ul>
        </section>
      ))}
      <p className="text-gate-sm text-ink-soft">{tr('map.legend', { eighths: policy.lowFuelEighths })}</p>
    </div>
  );
}
