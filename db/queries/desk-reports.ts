import 'server-only';
import { eq, gte, sql } from 'drizzle-orm';
import { db } from '@/db';
import { carriers, cases, terminals } from '@/db/schema';
import type { ReportCaseRow } from '@/lib/desk/reports';

/** Cases opened in the last `months` months, with the month in the terminal's own time zone. */
export async function listReportCases(months: number, now = new Date()): Promise<ReportCaseRow[]> {
  const since = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - months + 1, 1));
  return db
    .select({
      month: sql<string>`to_char(${cases.openedAt} at time zone ${terminals.timeZone}, 'YYYY-MM')`,
      carrierScac: carriers.scac,
      state: cases.state,
      decision: cases.decision,
      amountCents: sql<number>`coalesce(${cases.overrideCents}, ${cases.estimateCents})::int`,
      chargedCents: cases.chargedCents,
    })
    .from(cases)
    .innerJoin(terminals, eq(terminals.id, cases.terminalId))
    .leftJoin(carriers, eq(carriers.id, cases.proposedCarrierId))
    .where(gte(cases.openedAt, since));
}
