// Sets up the yard state the walk journey needs in the e2e database, through the same helpers
// the database tests use: a new row of the jockey's home terminal with three trailers in it.
import { eq } from 'drizzle-orm';
import { db } from '../../../db';
import { labels, terminals } from '../../../db/schema';
import { signLabelToken } from '../../../lib/engine/identity/label-token';
import { baseURL } from '../../../playwright.config';
import { createRowWithSlots, placeTrailers, uniqueTag } from '../../support/yard-fixture';

export async function walkRowFixture() {
  const [home] = await db.select({ id: terminals.id }).from(terminals).where(eq(terminals.code, 'RVB'));
  const tag = uniqueTag();
  const rowName = `Row W${tag}`;
  const { spots } = await createRowWithSlots(db, home.id, rowName, 4);
  const trailers = await placeTrailers(db, home.id, tag, [spots[0].id, spots[1].id, spots[2].id]);
  return {
    rowName,
    tag,
    slots: spots.map((s) => s.label),
    units: trailers.map((t) => t.unitNumber),
    trailerIds: trailers.map((t) => t.id),
  };
}

/** Issues a current label for a trailer and returns the link its QR code carries. */
export async function labelLinkFor(trailerId: string) {
  const [label] = await db.insert(labels).values({ trailerId }).returning({ id: labels.id });
  return `${baseURL}/l/${signLabelToken({ labelId: label.id, trailerId }, process.env.LABEL_SECRET!)}`;
}
