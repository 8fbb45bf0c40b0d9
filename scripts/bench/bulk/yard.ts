// Yard moves and walks of the big data set (no hash chain), in SQL with generate_series, and the
// row counts the generator prints.
import type pg from 'pg';

/** One move per five bulk drops; a walk a day at Riverbend for `days` days with 50 scans each. */
export async function addYardHistory(client: pg.Client, rvb: string, jockeyId: string, days: number) {
  await client.query(
    `INSERT INTO yard_moves (trailer_id, terminal_id, from_spot_id, to_spot_id, moved_by_id, moved_at)
     SELECT h.trailer_id, h.terminal_id, NULL, s.id, $1, h.occurred_at + interval '2 hours'
       FROM handoffs h
       JOIN LATERAL (SELECT id FROM yard_spots WHERE terminal_id = h.terminal_id AND kind = 'slot'
                     ORDER BY label OFFSET (abs(hashtext(h.id::text)) % 100) LIMIT 1) s ON true
      WHERE h.kind = 'drop' AND h.idempotency_key LIKE 'bulk-%' AND abs(hashtext(h.id::text)) % 5 = 0`,
    [jockeyId],
  );
  await client.query(
    `INSERT INTO yard_walks (terminal_id, started_by_id, row_ids, status, started_at, finished_at, summary)
     SELECT $1, $2, '[]'::jsonb, 'finished', now() - make_interval(days => d), now() - make_interval(days => d)
            + interval '40 minutes', '{"matched": 50}'::jsonb
       FROM generate_series(1, $3::int) d`,
    [rvb, jockeyId, days],
  );
  await client.query(
    `INSERT INTO walk_scans (walk_id, seq, client_key, scanned_text, trailer_id, spot_id, is_unit_running,
                             fuel_eighths, are_doors_closed, is_seal_present, scanned_at)
     SELECT w.id, g, w.id || '-' || g, t.unit_number, t.id, t.current_spot_id, true, 6, true, true,
            w.started_at + make_interval(secs => g * 40)
       FROM yard_walks w
       CROSS JOIN generate_series(1, 50) g
       JOIN LATERAL (SELECT id, unit_number, current_spot_id FROM trailers
                      WHERE current_terminal_id = w.terminal_id AND status = 'in_yard'
                      ORDER BY unit_number OFFSET g * 7 LIMIT 1) t ON true
      WHERE w.terminal_id = $1 AND w.status = 'finished' AND w.summary ->> 'matched' = '50'
        AND NOT EXISTS (SELECT 1 FROM walk_scans x WHERE x.walk_id = w.id)`,
    [rvb],
  );
}

const COUNTED = [
  'terminals',
  'yard_spots',
  'trailers',
  'labels',
  'handoffs',
  'handoff_items',
  'photos',
  'findings',
  'cases',
  'case_events',
  'holds',
  'yard_moves',
  'yard_walks',
  'walk_scans',
  'trailer_condition',
];

export async function countRows(client: pg.Client): Promise<Record<string, number>> {
  const counted: Record<string, number> = {};
  for (const table of COUNTED)
    counted[table] = Number((await client.query(`SELECT count(*) AS n FROM ${table}`)).rows[0].n);
  return counted;
}
