import { isLowFuel, isReeferOff } from '@/lib/yard/board';
import type { Board, BoardSpot, YardPolicy } from '@/lib/yard/types';
import './yard-map.css';

/**
 * One slot or door: unit number, loaded/empty and the flags in words as well as colour. A plain
 * function, not a component: thousands of cells hydrate faster without a fiber each.
 */
function spotCell(spot: BoardSpot, policy: YardPolicy, isDimmed: boolean) {
  const t = spot.trailer;
  const dim = isDimmed ? ' d' : '';
  if (!t)
    return (
      <li key={spot.id} data-spot={spot.label} className={`ym-s e${dim}`}>
        <b>{spot.label}</b>free
      </li>
    );
  const held = t.holds.some((h) => h.severity === 'out_of_service') ? 'OOS' : t.holds.length ? 'HOLD' : null;
  const low = isLowFuel(t, policy);
  // an empty reefer normally stands with its unit shut off (common practice); only a loaded one is a concern
  const off = isReeferOff(t) && t.isLoaded;
  // tones as in lib/theme/status.ts: out of service and reefer off red, restricted orange, low fuel amber
  const tone = held === 'OOS' ? ' x' : off ? ' o' : held ? ' h' : low ? ' f' : '';
  return (
    <li key={spot.id} data-spot={spot.label} className={`ym-s${tone}${dim}`}>
      <b>{spot.label}</b>
      <strong>{t.unitNumber}</strong>
      {t.isLoaded ? 'Loaded' : 'Empty'}
      {held || low || off ? <br /> : null}
      {held ? <i className={held === 'OOS' ? 'x' : 'h'}>{held}</i> : null}
      {low ? <i className="f">FUEL {t.fuelEighths}/8</i> : null}
      {off ? <i className="o">OFF</i> : null}
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
  const byRow = new Map<string, BoardSpot[]>();
  for (const s of board.spots) {
    const key = s.kind === 'door' ? 'doors' : (s.rowId ?? 'doors');
    const list = byRow.get(key);
    if (list) list.push(s);
    else byRow.set(key, [s]);
  }
  const groups = [
    ...board.rows.map((r) => ({ key: r.id, name: r.name })),
    { key: 'doors', name: 'Dock doors' },
  ].flatMap((g) => (byRow.get(g.key)?.length ? [{ ...g, spots: byRow.get(g.key)! }] : []));
  return (
    <div id="yard-map" className="space-y-3" data-testid="yard-map">
      {groups.map((g) => (
        <section key={g.key} aria-label={g.name} className="ym-row">
          <h2 className="text-gate font-bold">{g.name}</h2>
          <ul className="ym-grid">
            {g.spots.map((s) =>
              spotCell(s, policy, highlight !== null && !(s.trailer && highlight.has(s.trailer.id))),
            )}
          </ul>
        </section>
      ))}
      <p className="text-gate-sm text-ink-soft">
        OOS: out of service · HOLD: restricted · FUEL: at or below {policy.lowFuelEighths}/8 · OFF: reefer
        unit not running on a loaded trailer
      </p>
    </div>
  );
}
