import 'server-only';
import { db, type Tx } from '@/db';
import { auditLog } from '@/db/schema';

/** Appends to the audit log (the table refuses updates and deletes). Pass `tx` to write inside a transaction. */
export async function recordAudit(
  entry: {
    actorId: string | null;
    action: string;
    entityType: string;
    entityId?: string | null;
    detail?: Record<string, unknown>;
  },
  tx?: Tx,
) {
  await (tx ?? db).insert(auditLog).values({ ...entry, entityId: entry.entityId ?? null });
}
