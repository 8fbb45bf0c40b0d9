'use client';

import { useTranslations } from 'next-intl';
import { useMemo, useState } from 'react';
import { BOARD_FILTERS, filterRows, tableRows, type BoardFilter } from '@/lib/yard/board';
import { sortRows, type SortDir, type SortKey } from '@/lib/yard/table';
import type { Board } from '@/lib/yard/types';
import { BoardTable } from './board-table';
import { useBoard } from './use-board';
import { YardMap } from './yard-map';

export function YardBoard({ initial }: { initial: Board }) {
  const t = useTranslations('Yard');
  const { data, error } = useBoard(initial);
  const board = data ?? initial;
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
          {t('board.title')}
        </h1>
        <p className="text-gate-sm text-ink-soft">
          {t('board.meta', {
            terminal: board.terminal.name,
            count: all.length,
            zone: board.terminal.timeZone,
            hours: board.policy.freeTimeHours,
          })}
        </p>
      </div>
      {error ? (
        <p role="alert" className="text-gate-sm font-bold text-danger">
          {t('board.refreshFailed')}
        </p>
      ) : null}
      <fieldset className="flex flex-wrap gap-2">
        <legend className="sr-only">{t('board.filters')}</legend>
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
            {t(`board.filter.${f}`)}
          </label>
        ))}
      </fieldset>
      <div className="flex flex-wrap items-center gap-2">
        <div role="tablist" aria-label={t('board.view')} className="flex gap-1">
          {(['map', 'table'] as const).map((v) => (
            <button
              key={v}
              type="button"
              role="tab"
              aria-selected={view === v}
              onClick={() => setView(v)}
              className={`min-h-tap rounded-lg px-4 text-gate font-bold ${view === v ? 'bg-brand text-on-fill' : 'bg-paper-dim text-ink'}`}
            >
              {t(`board.${v}`)}
            </button>
          ))}
        </div>
        <p className="text-gate-sm" aria-live="polite">
          {t('board.shown', { count: shown.length })}
        </p>
        <a
          href={csvHref}
          className="ml-auto flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
          download
        >
          {t('board.export')}
        </a>
      </div>
      {view === 'map' ? (
        <YardMap board={board} highlight={filters.length ? shownIds : null} policy={board.policy} />
      ) : (
        <BoardTable rows={shown} timeZone={board.terminal.timeZone} now={now} sort={sort} onSort={setSort} />
      )}
    </section>
  );
}
