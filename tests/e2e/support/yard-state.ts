// Sets up the yard state the walk journey needs in the e2e database, through the same helpers
// the database tests use: a new row of the jockey's home terminal with three trailers in it.
import { eq } from 'drizzle-orm';
import { db } from '../../../db';
import { terminals } from '../../../db/schema';
import { createRowWithSlots, placeTrailers, uniqueTag } from '../../support/yard-fixture';

export async function walkRowFixture() {
  const [home] = await db.select({ id: terminals.id }).from(terminals).where(eq(terminals.code, 'RVB'));
  const tag = uniqueTag();
  const rowName = `Row W${tag}`;
  const { spots } = await createRowWithSlots(db, home.id, rowName, 4);
  const [t1, t2, t3] = await placeTrailers(db, home.id, tag, [spots[0].id, spots[1].id, spots[2].id]);
  return { rowName, tag, slots: spots.map((s) => s.label), units: [t1.unitNumber, t2.unitNumber, t3.unitNumber] };
}
