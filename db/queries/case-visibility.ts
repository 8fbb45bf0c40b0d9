import 'server-only';
import { eq, sql, type SQL } from 'drizzle-orm';
import { cases } from '@/db/schema';
import type { Role } from '@/lib/auth/roles';

/** Who is looking: drivers see only cases proposed to their own carrier. */
export type CaseViewer = { role: Role; carrierId: string | null };

/** The ownership condition every case read and write carries in its WHERE clause. */
export function caseVisibleTo(viewer: CaseViewer): SQL | undefined {
  if (viewer.role === 'clerk' || viewer.role === 'admin') return undefined;
  if (viewer.role === 'driver' && viewer.carrierId) return eq(cases.proposedCarrierId, viewer.carrierId);
  return sql`false`;
}
