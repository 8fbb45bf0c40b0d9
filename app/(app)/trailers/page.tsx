import type { Metadata } from 'next';
import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { z } from 'zod';
import { EmptyState } from '@/app/_components/empty-state';
import { listTrailers } from '@/db/queries/trailers';
import { SECTION_ROLES } from '@/lib/auth/roles';
import { requireUser } from '@/lib/server/auth';
import { plainText } from '@/lib/validation/text';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Trailers'))('title') };
}

const searchSchema = z.object({ q: plainText(40).optional().catch(undefined) });

export default async function TrailersPage({ searchParams }: PageProps<'/trailers'>) {
  await requireUser(SECTION_ROLES.trailers);
  const { q } = searchSchema.parse(await searchParams);
  const rows = await listTrailers({ q });
  const t = await getTranslations('Trailers');
  return (
    <div className="space-y-4">
      <h1 className="text-gate-xl font-bold">{t('title')}</h1>
      <form role="search" className="flex gap-2">
        <label htmlFor="q" className="sr-only">
          {t('search')}
        </label>
        <input
          id="q"
          name="q"
          defaultValue={q}
          placeholder={t('search')}
          className="min-h-tap flex-1 rounded-lg border-2 border-paper-line px-3 text-gate"
        />
        <button type="submit" className="min-h-tap rounded-lg bg-brand px-5 text-gate font-bold text-on-fill">
          {t('find')}
        </button>
      </form>
      {rows.length === 0 ? (
        <EmptyState title={t('noMatch')}>{t('noMatchText')}</EmptyState>
      ) : (
        <form action="/trailers/labels" className="space-y-2">
          <div className="flex flex-wrap gap-2">
            <button
              type="submit"
              className="min-h-tap rounded-lg bg-brand px-5 text-gate font-bold text-on-fill"
            >
              {t('printTicked')}
            </button>
            <Link
              href="/trailers/labels"
              className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-5 text-gate font-bold text-brand"
            >
              {t('printRow')}
            </Link>
          </div>
          <div className="overflow-x-auto rounded-xl bg-paper">
            <table className="w-full text-left text-gate-sm">
              <thead className="bg-paper-dim">
                <tr>
                  <th scope="col" className="p-2">
                    <span className="sr-only">{t('col.print')}</span>
                  </th>
                  {(['unit', 'kind', 'owner', 'where', 'vin'] as const).map((c) => (
                    <th key={c} scope="col" className="p-2">
                      {t(`col.${c}`)}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {rows.map((row) => (
                  <tr key={row.id} className="border-t border-paper-line">
                    <td className="p-2">
                      <input
                        type="checkbox"
                        name="ids"
                        value={row.id}
                        aria-label={t('printFor', { unit: row.unitNumber })}
                        className="size-6"
                      />
                    </td>
                    <td className="p-2 font-bold">
                      <Link className="text-brand underline" href={`/trailers/${row.id}`}>
                        {row.unitNumber}
                      </Link>{' '}
                      <Link
                        className="text-gate-sm font-normal text-brand underline"
                        href={`/trailers/${row.id}/label`}
                        aria-label={t('labelOf', { unit: row.unitNumber })}
                      >
                        {t('label')}
                      </Link>
                    </td>
                    <td className="p-2">{t(`kind.${row.kind}`)}</td>
                    <td className="p-2">{row.ownerScac}</td>
                    <td className="p-2">
                      {row.status === 'in_yard'
                        ? `${row.terminalCode} ${row.spotLabel ?? ''}`
                        : row.status === 'on_road'
                          ? t('onRoad')
                          : t('gone')}
                    </td>
                    <td className="p-2 font-mono">{row.vin}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </form>
      )}
    </div>
  );
}
