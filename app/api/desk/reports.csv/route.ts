import { listReportCases } from '@/db/queries/desk-reports';
import { reportCsv, summarizeCases } from '@/lib/desk/reports';
import { invalid } from '@/lib/server/api';
import { apiUser } from '@/lib/server/auth';
import { reportQuerySchema } from '@/lib/validation/desk';

/** Damage by carrier and month as CSV (RFC 4180), for clerks and admins. */
export async function GET(request: Request) {
  const user = await apiUser(['clerk', 'admin']);
  if (user instanceof Response) return user;
  const parsed = reportQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!parsed.success) return invalid(parsed.error, 'months must be a whole number from 1 to 36.');
  const csv = reportCsv(summarizeCases(await listReportCases(parsed.data.months)));
  return new Response(csv, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="hitchmark-damage-${parsed.data.months}m.csv"`,
    },
  });
}
