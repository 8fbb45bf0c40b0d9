import { listReportCases } from '@/db/queries/desk-reports';
import { DESK_STAFF } from '@/lib/desk/access';
import { reportCsv, summarizeCases } from '@/lib/desk/reports';
import { route } from '@/lib/server/api';
import { reportQuerySchema } from '@/lib/validation/desk';

/** Damage by carrier and month as CSV (RFC 4180), for clerks and admins. */
export const GET = route(
  {
    access: DESK_STAFF,
    query: reportQuerySchema,
    invalidMessage: 'months must be a whole number from 1 to 36.',
  },
  async ({ query }) => {
    const csv = reportCsv(summarizeCases(await listReportCases(query.months)));
    return new Response(csv, {
      headers: {
        'content-type': 'text/csv; charset=utf-8',
        'content-disposition': `attachment; filename="hitchmark-damage-${query.months}m.csv"`,
      },
    });
  },
);
