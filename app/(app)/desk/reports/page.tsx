import type { Metadata } from 'next';
import { getLocale, getTranslations } from 'next-intl/server';
import { EmptyState } from '@/app/_components/empty-state';
import { listReportCases } from '@/db/queries/desk-reports';
import { formatMoney } from '@/lib/format/money';
import { DESK_STAFF } from '@/lib/desk/access';
import { reportCarrierLabel, summarizeCases, totalsBy } from '@/lib/desk/reports';
import { requireUser } from '@/lib/server/auth';
import { reportQuerySchema } from '@/lib/validation/desk';
import { ChargedAbsorbedChart } from './_components/charged-absorbed-chart';

export async function generateMetadata(): Promise<Metadata> {
  return { title: (await getTranslations('Desk'))('report.pageTitle') };
}

export default async function DeskReportsPage({ searchParams }: PageProps<'/desk/reports'>) {
  await requireUser(DESK_STAFF);
  const t = await getTranslations('Desk');
  const parsed = reportQuerySchema.safeParse(await searchParams);
  const months = parsed.success ? parsed.data.months : 12;
  const lines = summarizeCases(await listReportCases(months));
  const locale = await getLocale();
  const byCarrier = totalsBy(lines, 'carrier').map((b) => ({
    ...b,
    label: reportCarrierLabel(b.label, locale),
  }));
  const byMonth = totalsBy(lines, 'month');
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-gate-xl font-bold">{t('report.title', { months })}</h1>
        <a
          href={`/api/desk/reports.csv?months=${months}`}
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
          download
        >
          {t('report.csv')}
        </a>
      </div>
      {!parsed.success ? (
        <p role="alert" className="font-bold text-danger">
          {t('report.badMonths')}
        </p>
      ) : null}
      {lines.length === 0 ? (
        <EmptyState title={t('report.empty')} />
      ) : (
        <>
          <div className="grid gap-4 lg:grid-cols-2">
            <ChargedAbsorbedChart title={t('report.byCarrier')} bars={byCarrier} />
            <ChargedAbsorbedChart title={t('report.byMonth')} bars={byMonth} />
          </div>
          {/* a wide table scrolls sideways: focusable so a keyboard can scroll it (WCAG 2.1.1) */}
          <div
            className="overflow-x-auto rounded-xl bg-paper"
            tabIndex={0}
            role="region"
            aria-label={t('report.caption')}
          >
            <table className="w-full text-left text-gate-sm">
              <caption className="sr-only">{t('report.caption')}</caption>
              <thead className="bg-paper-dim">
                <tr>
                  {(
                    [
                      'month',
                      'carrier',
                      'cases',
                      'estimate',
                      'charged',
                      'absorbed',
                      'waived',
                      'open',
                    ] as const
                  ).map((h) => (
                    <th key={h} scope="col" className="p-2">
                      {t(`report.col.${h}`)}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {lines.map((l) => (
                  <tr key={`${l.month}-${l.carrier}`} className="border-t border-paper-line">
                    <td className="p-2">{l.month}</td>
                    <td className="p-2 font-bold">{reportCarrierLabel(l.carrier, locale)}</td>
                    <td className="p-2">{l.cases}</td>
                    {[l.estimateCents, l.chargedCents, l.absorbedCents, l.waivedCents, l.openCents].map(
                      (c, i) => (
                        <td key={i} className="p-2">
                          {formatMoney(c)}
                        </td>
                      ),
                    )}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        </>
      )}
    </div>
  );
}
