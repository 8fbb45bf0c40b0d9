import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { getDriverGateDefaults } from '@/db/queries/gate-defaults';
import { handoffs, users } from '@/db/schema';

// The gate form's prefilled tractor: the one of this driver's latest handoff, on the seeded data.
afterAll(() => pool.end());

describe('getDriverGateDefaults', () => {
  it("gives the tractor of the seeded driver's latest handoff", async () => {
    const [driver] = await db.select({ id: users.id }).from(users).where(eq(users.driverNumber, 'D1001'));
    const rows = await db
      .select({ tractorNumber: handoffs.tractorNumber, occurredAt: handoffs.occurredAt })
      .from(handoffs)
      .where(eq(handoffs.driverId, driver.id));
    expect(rows.length).toBeGreaterThan(1);
    const latest = rows.reduce((a, b) => (b.occurredAt > a.occurredAt ? b : a));
    expect(await getDriverGateDefaults(driver.id)).toEqual({ tractorNumber: latest.tractorNumber });
  });

  it('gives no tractor to a driver with no handoff', async () => {
    const tag = randomUUID().slice(0, 8).toUpperCase();
    const [driver] = await db
      .insert(users)
      .values({ name: `Test ${tag}`, role: 'driver', driverNumber: `T${tag}`, secretHash: 'not-a-real-hash' })
      .returning({ id: users.id });
    expect(await getDriverGateDefaults(driver.id)).toEqual({ tractorNumber: null });
  });
});
