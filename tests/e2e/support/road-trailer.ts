import { expect } from '@playwright/test';
import { sql } from 'drizzle-orm';
import { db } from '../../../db';

/**
 * A seeded reefer on the road with a Hitchmark history (db/seed/history.ts hooks every fifth
 * trailer on the road), from the top of the list: the other specs use the first ones, and a drop
 * here puts it in the yard, so a second run of this spec takes the next one.
 */
export async function reeferOnTheRoad(): Promise<{ id: string; unit: string }> {
  const { rows } = await db.execute<{ id: string; unit: string }>(sql`
    select t.id, t.unit_number as unit from trailers t
    where t.status = 'on_road' and t.kind = 'reefer'
      and exists (select 1 from handoffs h where h.trailer_id = t.id)
    order by t.unit_number desc limit 1`);
  expect(rows).toHaveLength(1);
  return rows[0];
}
