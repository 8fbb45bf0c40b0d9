import { memo } from 'react';
import { isLowFuel, isReeferOff } from '@/lib/yard/board';
import type { Board, BoardSpot, YardPolicy } from '@/lib/yard/types';

/** One slot or door: unit number, loaded/empty and the flags in words as well as colour. */
const SpotCell = memo(function SpotCell({ spot, policy, isDimmed }: { spot: BoardSpot; policy: YardPolicy; isDimmed: boolean }) {
  const t = spot.trailer;
  const held = t?.holds.some((h) => h.severity === 'out_of_service') ? 'OOS' : t?.holds.length ? 'HOLD' : null;
  const low = t ? isLowFuel(t, policy) : false;
  const off = t ? isReeferOff(t) : false;
  const border = held ? 'border-hold' : off ? 'border-danger' : low ? 'border-warn' : t ? 'border-brand' : 'border-paper-line border-dashed';
  return (
    <li data-spot={spot.label} className={`min-h-16 rounded-md border-2 bg-paper p-1 text-xs leading-tight ${border} ${isDimmed ? 'opacity-30' : ''}`}>
      <span className="block font-bold text-ink-soft">{spot.label}</span>
      {t ? (
        <>
          <span className="block text-sm font-bold text-ink">{t.unitNumber}</span>
          <span className="block">{t.isLoaded ? 'Loaded' : 'Empty'}</span>
          <span className="flex flex-wrap gap-0.5">
            {held ? <b className="rounded bg-hold-bg px-1 text-hold">{held}</b> : null}
            {low ? <b className="rounded bg-warn-bg px-1 text-warn">FUEL {t.fuelEighths}/8</b> : null}
            {off ? <b className="rounded bg-danger-bg px-1 text-danger">OFF</b> : null}
          </span>
        </>
      ) : (
        <span className="block text-ink-faint">free</span>
      )}
    </li>
  );
});

/** The yard drawn as rows of slots, then the dock doors (CSS grid; wraps on a phone). */
export function YardMap({ board, highlight, policy }: { board: Board; highlight: Set<string> | null; policy: YardPolicy }) {
  const groups = [
    ...board.rows.map((r) => ({ key: r.id, name: r.name, spots: board.spots.filter((s) => s.rowId === r.id) })),
    { key: 'doors', name: 'Dock doors', spots: board.spots.filter((s) => s.kind === 'door') },
  ].filter((g) => g.spots.length > 0);
  return (
    <div id="yard-map" className="space-y-3" data-testid="yard-map">
      {groups.map((g) => (
        <section key={g.key} aria-label={g.name}>
          <h2 className="text-gate font-bold">{g.name}</h2>
          <ul className="grid grid-cols-[repeat(auto-fill,minmax(5.5rem,1fr))] gap-1">
            {g.spots.map((s) => (
              <SpotCell key={s.id} spot={s} policy={policy} isDimmed={highlight !== null && !(s.trailer && highlight.has(s.trailer.id))} />
            ))}
          </ul>
        </section>
      ))}
      <p className="text-gate-sm text-ink-soft">OOS: out of service · HOLD: restricted · FUEL: at or below {policy.lowFuelEighths}/8 · OFF: reefer unit not running</p>
    </div>
  );
}
