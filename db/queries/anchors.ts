import 'server-only';
import { and, desc, eq } from 'drizzle-orm';
import { db, type Tx } from '@/db';
import { chainAnchors, users, type AnchoredHead } from '@/db/schema';

type NewAnchor = {
  terminalId: string;
  day: string;
  digest: string;
  heads: AnchoredHead[];
  recordCount: number;
  emailedTo: string[];
};

/** Stores the anchor of a terminal's day; null when that day is already anchored. */
export async function insertAnchor(tx: Tx, anchor: NewAnchor) {
  const [row] = await tx
    .insert(chainAnchors)
    .values(anchor)
    .onConflictDoNothing({ target: [chainAnchors.terminalId, chainAnchors.day] })
    .returning({ id: chainAnchors.id });
  return row ?? null;
}

/** A terminal's anchors, newest day first. */
export function listAnchors(terminalId: string, limit = 14) {
  return db
    .select()
    .from(chainAnchors)
    .where(eq(chainAnchors.terminalId, terminalId))
    .orderBy(desc(chainAnchors.day))
    .limit(limit);
}

/** The e-mail addresses of the terminal's managers: its active admin users. */
/** The active admins of a terminal who keep an e-mail address, with the language each reads. */
export async function listTerminalManagerEmails(
  terminalId: string,
): Promise<{ email: string; locale: string }[]> {
  const rows = await db
    .select({ email: users.email, locale: users.locale })
    .from(users)
    .where(and(eq(users.homeTerminalId, terminalId), eq(users.role, 'admin'), eq(users.isActive, true)));
  return rows.flatMap((r) => (r.email ? [{ email: r.email, locale: r.locale }] : []));
}
