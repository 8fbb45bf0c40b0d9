import { count, eq, like, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { auditLog, carriers, trailers, users, yardSpots } from '@/db/schema';
import { seed } from '@/db/seed';
import { validateVin } from '@/lib/engine/identity';

describe('database foundation (fresh test database)', () => {
  beforeAll(async () => {
    await seed();
  });
  afterAll(async () => {
    await pool.end();
  });

  it('is a fresh database of its own, not the demo one', async () => {
    const { rows } = await pool.query('select current_database() as name');
    expect(rows[0].name).toBe('hitchmark_test');
  });

  it('seeds two terminals worth of trailers, every VIN passing the 49 CFR 565.15 check digit', async () => {
    // other test files add trailers of their own; the seed's VINs all start with its invented prefix 1B9
    const rows = await db.select({ vin: trailers.vin }).from(trailers).where(like(trailers.vin, '1B9%'));
    expect(rows.length).toBe(300);
    const bad = rows.filter((r) => !validateVin(r.vin).ok);
    expect(bad).toEqual([]);
  });

  it('re-running the seed adds nothing', async () => {
    const before = await Promise.all([
      db.select({ n: count() }).from(users),
      db.select({ n: count() }).from(yardSpots),
      db.select({ n: count() }).from(trailers),
    ]);
    await seed();
    const after = await Promise.all([
      db.select({ n: count() }).from(users),
      db.select({ n: count() }).from(yardSpots),
      db.select({ n: count() }).from(trailers),
    ]);
    expect(after.map((r) => r[0].n)).toEqual(before.map((r) => r[0].n));
  });

  it('never puts two trailers in one slot (unique index)', async () => {
    const [a, b] = await db
      .select({ id: trailers.id, spot: trailers.currentSpotId })
      .from(trailers)
      .where(sql`${trailers.currentSpotId} is not null`)
      .limit(2);
    await expect(
      db.update(trailers).set({ currentSpotId: a.spot }).where(eq(trailers.id, b.id)),
    ).rejects.toThrow();
  });

  it('keeps the audit log append-only: updates and deletes are refused by the database', async () => {
    await db.insert(auditLog).values({ actorId: null, action: 'test', entityType: 'test' });
    // drizzle wraps the driver error; the database's own message is the cause
    const refused = { cause: expect.objectContaining({ message: expect.stringMatching(/append-only/) }) };
    await expect(db.update(auditLog).set({ action: 'changed' })).rejects.toMatchObject(refused);
    await expect(db.delete(auditLog)).rejects.toMatchObject(refused);
  });

  it('stores carriers by unique SCAC', async () => {
    await expect(
      db.insert(carriers).values({ scac: 'BRCL', name: 'Duplicate', contactEmail: 'x@example.com' }),
    ).rejects.toThrow();
  });
});
