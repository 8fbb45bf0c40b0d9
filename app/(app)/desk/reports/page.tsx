import type { Metadata } from 'next';
import { EmptyState } from '@/app/_components/empty-state';
import { listReportCases } from '@/db/queries/desk-reports';
import { formatMoney } from '@/lib/format/money';
import { DESK_STAFF } from '@/lib/desk/access';
import { summarizeCases, totalsBy } from '@/lib/desk/reports';
import { requireUser } from '@/lib/server/auth';
import { reportQuerySchema } from '@/lib/validation/desk';
import { ChargedAbsorbedChart } from './_components/charged-absorbed-chart';

export const metadata: Metadata = { title: 'Desk reports' };

export default async function DeskReportsPage({ searchParams }: PageProps<'/desk/reports'>) {
  await requireUser(DESK_STAFF);
  const parsed = reportQuerySchema.safeParse(await searchParams);
  const months = parsed.success ? parsed.data.months : 12;
  const lines = summarizeCases(await listReportCases(months));
  const byCarrier = totalsBy(lines, 'carrier');
  const byMonth = totalsBy(lines, 'month');
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h1 className="text-gate-xl font-bold">Damage reports, last {months} months</h1>
        <a
          href={`/api/desk/reports.csv?months=${months}`}
          className="inline-flex min-h-tap items-center rounded-lg border-2 border-brand px-4 text-gate font-bold text-brand"
          download
        >
          Download CSV
        </a>
      </div>
      {!parsed.success ? (
        <p role="alert" className="font-bold text-danger">
          Months must be 1 to 36; showing 12.
        </p>
      ) : null}
      {lines.length === 0 ? (
        <EmptyState title="No cases in this period" />
      ) : (
        <>
          <div className="grid gap-4 lg:grid-cols-2">
            <ChargedAbsorbedChart title="By carrier" bars={byCarrier} />
            <ChargedAbsorbedChart title="By month" bars={byMonth} />
          </div>
          <div className="overflow-x-auto rounded-xl bg-paper">
            <table className="w-full text-left text-gate-sm">
              <caption className="sr-only">Damage by carrier and month</caption>
              <thead className="bg-paper-dim">
                <tr>
                  {['Month', 'Carrier', 'Cases', 'Estimate', 'Charged', 'Absorbed', 'Waived', 'Open'].map(
                    (h) => (
                      <th key={h} className="p-2">
                        {h}
                      </th>
                    ),
                  )}
                </tr>
              </thead>
              <tbody>
                {lines.map((l) => (
                  <tr key={`${l.month}-${l.carrier}`} className="border-t border-paper-line">
                    <td className="p-2">{l.month}</td>
                    <td className="p-2 font-bold">{l.carrier}</td>
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
