import Link from 'next/link';
import { useTranslations } from 'next-intl';
import { rowsByTerminal, type LabelRow } from '@/lib/labels/rows';

/** Every yard row to print, under its terminal's name; the user's own terminal comes first. */
export function RowChooser({ rows, homeTerminalId }: { rows: LabelRow[]; homeTerminalId: string | null }) {
  const t = useTranslations('Trailers');
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">{t('labels.choose')}</h1>
      <p className="text-gate">
        {t.rich('labels.chooseText', {
          link: (chunks) => (
            <Link href="/trailers" className="font-bold text-brand underline">
              {chunks}
            </Link>
          ),
        })}
      </p>
      {rowsByTerminal(rows, homeTerminalId).map((group) => (
        <section key={group.terminalId} aria-labelledby={`rows-${group.terminalId}`} className="space-y-2">
          <h2 id={`rows-${group.terminalId}`} className="text-gate-lg font-bold">
            {group.terminalName}
          </h2>
          <ul className="grid gap-2 sm:grid-cols-2">
            {group.rows.map((r) => (
              <li key={r.id}>
                <Link
                  href={`/trailers/labels?row=${r.id}`}
                  aria-label={t('labels.rowLabel', {
                    row: r.name,
                    terminal: r.terminalName,
                    count: r.trailerCount,
                  })}
                  className="flex min-h-tap items-center justify-between rounded-lg bg-paper px-4 text-gate font-bold"
                >
                  <span>{r.name}</span>
                  <span className="text-ink-soft">{t('labels.rowCount', { count: r.trailerCount })}</span>
                </Link>
              </li>
            ))}
          </ul>
        </section>
      ))}
    </div>
  );
}
