import 'server-only';
import { db } from '@/db';
import { getCurrentLabel, insertLabel, listSheetTrailers, lockTrailers } from '@/db/queries/labels';
import type { SessionUser } from '../auth';

export type SheetTrailer = {
  id: string;
  unitNumber: string;
  vin: string;
  ownerScac: string;
  labelId: string;
};

/**
 * The trailers a label sheet prints, each with its current label; a trailer without one gets a
 * label issued, under a row lock so two sheets printed at once do not issue two.
 */
export async function prepareLabelSheet(
  actor: Pick<SessionUser, 'id'>,
  query: { trailerIds: string[] } | { rowId: string },
): Promise<SheetTrailer[]> {
  const trailers = await listSheetTrailers(query);
  if (trailers.length === 0) return [];
  const labelIds = await db.transaction(async (tx) => {
    await lockTrailers(
      trailers.map((t) => t.id),
      tx,
    );
    const found = new Map<string, string>();
    for (const t of trailers) {
      const current = (await getCurrentLabel(t.id, tx)) ?? (await insertLabel(t.id, actor.id, tx));
      found.set(t.id, current.id);
    }
    return found;
  });
  return trailers.map((t) => ({ ...t, labelId: labelIds.get(t.id)! }));
}
