import { count, eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { auditLog, carriers, trailers, users, yardSpots } from '@/db/schema';
import { seed } from '@/db/seed';
import { validateVin } from '@/lib/engine/identity';
import { asOwner } from './owner-connection';

// SQLSTATE 23505 unique_violation (PostgreSQL manual, Appendix A "PostgreSQL Error Codes").
const UNIQUE_VIOLATION = '23505';
/** The driver error drizzle wraps: which SQLSTATE, raised by which constraint or index. */
const refusedBy = (code: string, constraint: string) => ({
  cause: expect.objectContaining({ code, constraint }),
});

describe('database foundation (a fresh database of its own)', () => {
  beforeAll(async () => {
    await seed();
  });
  afterAll(async () => {
    await pool.end();
  });

  it('is a database of this file alone, not the demo one', async () => {
    const { rows } = await pool.query('select current_database() as name');
    expect(rows[0].name).toBe(process.env.HM_DB_NAME);
    expect(rows[0].name).toMatch(/^hitchmark_test_file_[0-9a-f]{8}$/);
  });

  it('seeds two terminals worth of trailers, every VIN passing the 49 CFR 565.15 check digit', async () => {
    // no other test file writes here, so every trailer is the seed's (VINs with its invented prefix 1B9)
    const rows = await db.select({ vin: trailers.vin }).from(trailers);
    expect(rows.length).toBe(300);
    expect(rows.filter((r) => !r.vin.startsWith('1B9'))).toEqual([]);
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
    ).rejects.toMatchObject(refusedBy(UNIQUE_VIOLATION, 'trailers_current_spot'));
  });

  it('keeps the audit log append-only: updates and deletes are refused by the database', async () => {
    await db.insert(auditLog).values({ actorId: null, action: 'test', entityType: 'test' });
    // the app's role has no UPDATE or DELETE there (42501 insufficient_privilege, PostgreSQL
    // Appendix A); drizzle wraps the driver error, the database's own error is the cause
    const denied = {
      cause: expect.objectContaining({ code: '42501', message: expect.stringMatching(/permission denied/) }),
    };
    await expect(db.update(auditLog).set({ action: 'changed' })).rejects.toMatchObject(denied);
    await expect(db.delete(auditLog)).rejects.toMatchObject(denied);
    // behind the grants, the append-only trigger stops even the owner (HM001, migration 0001)
    await asOwner(async (owner) => {
      await expect(owner.query("update audit_log set action = 'changed'")).rejects.toMatchObject({
        code: 'HM001',
        message: expect.stringMatching(/append-only/),
      });
      await expect(owner.query('delete from audit_log')).rejects.toMatchObject({ code: 'HM001' });
    });
  });

  it('stores carriers by unique SCAC', async () => {
    await expect(
      db.insert(carriers).values({ scac: 'BRCL', name: 'Duplicate', contactEmail: 'x@example.com' }),
    ).rejects.toMatchObject(refusedBy(UNIQUE_VIOLATION, 'carriers_scac_unique'));
  });
});
