// Set-based steps after the handoff pass: every handoff's item rows from its trailer's all-ok
// template and the pass's overrides (INSERT … SELECT in batches of trailers), the item table's
// indexes and constraints rebuilt once, the trailers' final state, and their current condition.
import type pg from 'pg';

type Saved = { name: string; sql: string };

/** Drops a table's indexes and keys (rebuilt once after the load: far faster than row by row). */
export async function dropIndexes(client: pg.Client, table: 'handoffs' | 'handoff_items'): Promise<Saved[]> {
  const { rows: constraints } = await client.query<{ name: string; def: string }>(
    `SELECT conname AS name, pg_get_constraintdef(oid) AS def FROM pg_constraint
      WHERE conrelid = $1::regclass AND contype = ANY($2::char[])`,
    // other tables' keys point at the handoffs' primary key: it stays
    [table, table === 'handoffs' ? ['u', 'f'] : ['p', 'u', 'f']],
  );
  const { rows: indexes } = await client.query<{ name: string; def: string }>(
    `SELECT i.relname AS name, pg_get_indexdef(i.oid) AS def FROM pg_index x JOIN pg_class i ON i.oid = x.indexrelid
      WHERE x.indrelid = $1::regclass
        AND NOT EXISTS (SELECT 1 FROM pg_constraint c WHERE c.conindid = i.oid)`,
    [table],
  );
  const saved = [
    ...indexes.map((i) => ({ name: i.name, sql: i.def })),
    // primary key and unique first, foreign keys after (they are checked against the table)
    ...constraints
      .sort((a, b) => Number(a.def.startsWith('FOREIGN')) - Number(b.def.startsWith('FOREIGN')))
      .map((c) => ({ name: c.name, sql: `ALTER TABLE ${table} ADD CONSTRAINT "${c.name}" ${c.def}` })),
  ];
  for (const c of constraints) await client.query(`ALTER TABLE ${table} DROP CONSTRAINT "${c.name}"`);
  for (const i of indexes) await client.query(`DROP INDEX "${i.name}"`);
  return saved;
}

/** Re-creates what dropIndexes saved, logging each one's seconds (where the time goes). */
export async function rebuildIndexes(
  client: pg.Client,
  saved: Saved[],
  log: (line: string) => void = () => {},
) {
  // sorts of tens of millions of keys: one big in-memory run instead of many merged from disk
  await client.query(`SET maintenance_work_mem = '1GB'`);
  for (const s of saved) {
    const started = Date.now();
    await client.query(s.sql);
    log(`  ${s.name}: ${((Date.now() - started) / 1000).toFixed(1)} s`);
  }
}

/** Item rows of the trailers' handoffs, in batches of `per` trailers; returns the rows added. */
export async function insertItems(
  client: pg.Client,
  trailerIds: string[],
  log: (line: string) => void,
  per = 1_000,
): Promise<number> {
  let added = 0;
  const started = Date.now();
  for (let i = 0; i < trailerIds.length; i += per) {
    const r = await client.query(
      `INSERT INTO handoff_items (handoff_id, item_key, condition, tread_thirty_seconds, is_holding_air,
                                  details, note, created_at)
       SELECT h.id, t.item_key, coalesce(o.condition, t.condition)::item_condition, t.tread_thirty_seconds,
              t.is_holding_air, CASE WHEN o.handoff_id IS NULL THEN t.details ELSE o.details END,
              CASE WHEN o.handoff_id IS NULL THEN t.note ELSE o.note END, h.occurred_at
         FROM handoffs h
         JOIN bulk_trailer_shape s ON s.trailer_id = h.trailer_id
         JOIN bulk_item_template t ON t.shape = s.shape
         LEFT JOIN bulk_item_override o ON o.handoff_id = h.id AND o.item_key = t.item_key
        WHERE h.trailer_id = ANY($1::uuid[])`,
      [trailerIds.slice(i, i + per)],
    );
    added += r.rowCount ?? 0;
    if ((i / per) % 5 === 4 || i + per >= trailerIds.length)
      log(`${added.toLocaleString('en-US')} item rows (${Math.round((Date.now() - started) / 1000)} s)`);
  }
  return added;
}

/** The trailers' last state and their current condition (every bulk handoff observes every item). */
export async function finishTrailers(client: pg.Client) {
  await client.query(`UPDATE trailers t SET status = f.status, current_terminal_id = f.terminal_id,
             current_spot_id = f.spot_id, is_loaded = f.is_loaded, fuel_eighths = f.fuel_eighths,
             is_reefer_on = f.is_reefer_on, setpoint_tenths_f = f.setpoint_tenths_f, gate_in_at = f.gate_in_at,
             last_seen_at = f.last_seen_at
        FROM bulk_trailer_final f WHERE f.trailer_id = t.id`);
  await client.query(`INSERT INTO trailer_condition (trailer_id, item_key, handoff_id, observed_at, condition)
       SELECT f.trailer_id, i.item_key, i.handoff_id, f.last_seen_at, i.condition
         FROM bulk_trailer_final f JOIN handoff_items i ON i.handoff_id = f.last_handoff_id
       ON CONFLICT DO NOTHING`);
}
