// Row counts of every table of the public schema, to show that a refused request wrote nothing.
import type { Pool } from 'pg';

export async function rowCounts(pool: Pool): Promise<Record<string, number>> {
  const { rows: tables } = await pool.query<{ name: string }>(
    `SELECT quote_ident(table_name) AS name FROM information_schema.tables
      WHERE table_schema = 'public' AND table_type = 'BASE TABLE' ORDER BY table_name`,
  );
  if (tables.length === 0) throw new Error('No tables found: is this the right database?');
  const sql = tables
    .map((t) => `SELECT '${t.name}' AS name, count(*)::int AS n FROM ${t.name}`)
    .join(' UNION ALL ');
  const { rows } = await pool.query<{ name: string; n: number }>(sql);
  return Object.fromEntries(rows.map((r) => [r.name, r.n]));
}

/** The tables whose count changed between two snapshots, with before → after. */
export function changedTables(before: Record<string, number>, after: Record<string, number>) {
  return Object.keys({ ...before, ...after })
    .filter((t) => before[t] !== after[t])
    .map((t) => `${t}: ${before[t] ?? 0} → ${after[t] ?? 0}`);
}
