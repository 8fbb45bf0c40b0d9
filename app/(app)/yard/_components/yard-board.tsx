'use client';

import { useMemo, useState } from 'react';
import { BOARD_FILTERS, FILTER_LABELS, filterRows, tableRows, type BoardFilter } from '@/lib/yard/board';
import { sortRows, type SortDir, type SortKey } from '@/lib/yard/table';
import type { Board } from '@/lib/yard/types';
import { BoardTable } from './board-table';
import { useBoard } from './use-board';
import { YardMap } from './yard-map';

/** `initial` may hold only the first rows of a big yard (`isPartial`); the first refresh brings the rest. */
export function YardBoard({ initial }: { initial: Board & { isPartial?: boolean } }) {
  const { data, error } = useBoard(initial);
  const board = data ?? initial;
  const isPartial = board === initial && Boolean(initial.isPartial);
  const [filters, setFilters] = useState<BoardFilter[]>([]);
  const [sort, setSort] = useState<{ key: SortKey; dir: SortDir }>({ key: 'slot', dir: 'asc' });
  const [view, setView] = useState<'map' | 'table'>('map');
  // "now" is the moment the server read the board, so server and browser render the same dwell
  const now = useMemo(() => new Date(board.generatedAt), [board.generatedAt]);
  const all = useMemo(() => tableRows(board), [board]);
  const shown = useMemo(
    () => sortRows(filterRows(all, filters, board.policy, now), sort.key, sort.dir, now),
    [all, filters, board.policy, now, sort],
  );
  const shownIds = useMemo(() => new Set(shown.map((r) => r.trailer.id)), [shown]);
  const toggle = (f: BoardFilter) =>
    setFilters((fs) => (fs.includes(f) ? fs.filter((x) => x !== f) : [...fs, f]));
  const csvHref = `/api/yard/board.csv?${new URLSearchParams({ filter: filters.join(','), sort: sort.key, dir: sort.dir })}`;

  return (
    <section aria-labelledby="board-title" className="space-y-3">
      <div className="flex flex-wrap items-baseline gap-x-3">
        <h1 id="board-title" className="text-gate-xl font-bold">
          Yard board
        </h1>
        <p className="text-gate-sm text-ink-soft">
          {board.terminal.name} · {all.length} trailers · {board.terminal.timeZone} · free time{' '}
          {board.policy.freeTimeHours} h
        </p>
      </div>
      {error ? (
        <p role="alert" className="text-gate-sm font-bold text-danger">
          Live refresh failed; showing the last board read.
        </p>
      ) : null}
      <fieldset className="flex flex-wrap gap-2">
        <legend className="sr-only">Filters</legend>
        {BOARD_FILTERS.map((f) => (
          <label
            key={f}
            className={`flex min-h-tap cursor-pointer items-center gap-2 rounded-lg border-2 px-3 text-gate-sm font-bold ${filters.includes(f) ? 'border-brand bg-brand-light' : 'border-paper-line bg-paper'}`}
          >
            <input
              type="checkbox"
              checked={filters.includes(f)}
              onChange={() => toggle(f)}
              className="size-5"
            />
            {FILTER_LABELS[f]}
          </label>
        ))}
      </fieldset>
      <div className="flex flex-wrap items-center gap-2">
        <div role="tablist" aria-label="Board view" className="flex gap-1">
          {(['map', 'table'] as const).map((v) => (
            <button
              key={v}
              type="button"
              role="tab"
              aria-selected={view === v}
              onClick={() => setView(v)}
              className={`min-h-tap rounded-lg px-4 text-gate font-bold ${view === v ? 'bg-brand text-on-fill' : 'bg-paper-dim text-ink'}`}
            >
              {v === 'map' ? 'Map' : 'Table'}
            </button>
          ))}
        </div>
        <p className="text-gate-sm" aria-live="polite">
          {shown.length} shown
        </p>
        <a
          href={csvHref}
          className="ml-auto flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
          download
        >
          Export CSV
        </a>
      </div>
      {view === 'map' ? (
        <YardMap
          board={board}
          highlight={filters.length ? shownIds : null}
          policy={board.policy}
          isPartial={isPartial}
        />
      ) : (
        <BoardTable rows={shown} timeZone={board.terminal.timeZone} now={now} sort={sort} onSort={setSort} />
      )}
    </section>
  );
}
