'use client';

import { useLocale, useTranslations } from 'next-intl';
import { COLUMNS, rowCells, type CellWords, type SortDir, type SortKey } from '@/lib/yard/table';
import type { TableRow } from '@/lib/yard/types';

type Sort = { key: SortKey; dir: SortDir };

/** The board as a table; headers sort (again to reverse). Cells are the CSV export's cells. */
export function BoardTable({
  rows,
  timeZone,
  now,
  sort,
  onSort,
}: {
  rows: TableRow[];
  timeZone: string;
  now: Date;
  sort: Sort;
  onSort: (s: Sort) => void;
}) {
  const t = useTranslations('Yard');
  const locale = useLocale();
  const words: CellWords = {
    loaded: t('cell.loaded'),
    empty: t('cell.empty'),
    noUnit: t('cell.noUnit'),
    notRead: t('cell.notRead'),
    off: t('cell.off'),
    on: t('cell.on'),
    onAt: (setpoint) => t('cell.onAt', { setpoint }),
    none: t('cell.none'),
    outOfService: t('cell.outOfService'),
    restricted: t('cell.restricted'),
    locale,
  };
  return (
    <div className="overflow-x-auto rounded-lg border-2 border-paper-line bg-paper">
      <table className="w-full text-left text-gate-sm">
        <thead className="bg-paper-dim">
          <tr>
            {COLUMNS.map((c) => {
              const key = c.key === 'gateIn' ? 'dwell' : c.key;
              const active = sort.key === key && c.key !== 'gateIn';
              return (
                <th
                  key={c.key}
                  scope="col"
                  aria-sort={active ? (sort.dir === 'asc' ? 'ascending' : 'descending') : undefined}
                  className="whitespace-nowrap p-0"
                >
                  <button
                    type="button"
                    className="min-h-tap w-full px-2 text-left font-bold"
                    onClick={() => onSort({ key, dir: active && sort.dir === 'asc' ? 'desc' : 'asc' })}
                  >
                    {t(`column.${c.key}`)}
                    {active ? (sort.dir === 'asc' ? ' ▲' : ' ▼') : ''}
                  </button>
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.trailer.id} className="border-t border-paper-line">
              {rowCells(r, timeZone, now, words).map((cell, i) => (
                <td
                  key={COLUMNS[i].key}
                  className={`px-2 py-1 ${i === 0 ? 'font-bold' : ''} ${i === 5 && cell !== words.none ? 'text-hold' : ''}`}
                >
                  {cell}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {rows.length === 0 ? <p className="p-3 text-gate">{t('board.noMatch')}</p> : null}
    </div>
  );
}
