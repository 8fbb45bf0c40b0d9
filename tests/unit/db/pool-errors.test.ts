// The app's pool outlives an idle connection being closed under it (a database restart, a
// failover, PgBouncer recycling server connections): the server keeps running and the next
// query gets a new connection.
import { afterAll, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { sql } from 'drizzle-orm';
import { asOwner } from './owner-connection';

describe('the database pool', () => {
  afterAll(async () => {
    await pool.end();
  });

  it('survives its idle connections being terminated', async () => {
    const logged = vi.spyOn(console, 'error').mockImplementation(() => {});
    // open two connections at once so the pool holds two idle ones afterwards
    const pids = await Promise.all(
      [0, 1].map(async () => {
        const { rows } = await pool.query<{ pid: number }>('SELECT pg_backend_pid() AS pid, pg_sleep(0.05)');
        return rows[0].pid;
      }),
    );
    expect(pool.idleCount).toBeGreaterThanOrEqual(1);
    const killed = await asOwner(async (c) => {
      const { rows } = await c.query<{ done: boolean }>(
        'SELECT pg_terminate_backend(pid) AS done FROM unnest($1::int[]) AS pid',
        [pids],
      );
      return rows.filter((r) => r.done).length;
    });
    expect(killed).toBe(new Set(pids).size);
    // the pool notices the closed sockets and reports through its 'error' event
    await vi.waitFor(() => expect(logged).toHaveBeenCalledWith(expect.stringMatching(/^\[db\] an idle/)));
    const { rows } = await db.execute<{ one: number }>(sql`SELECT 1 AS one`);
    expect(rows[0].one).toBe(1);
    logged.mockRestore();
  });
});
