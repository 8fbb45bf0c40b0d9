// Terminals, yard rows and slots, trailers and their labels of the big data set, all in SQL.
import type pg from 'pg';
import { inventedVin } from './vin';

/** Invented terminal names; none is a real business. */
const EXTRA_TERMINALS = [
  ['CDH', 'Cinderhollow terminal', 'America/New_York'],
  ['LWM', 'Larkwater Mills terminal', 'America/Chicago'],
  ['QNF', 'Quillan Flats terminal', 'America/Denver'],
  ['BRN', 'Brenneck Crossing terminal', 'America/Los_Angeles'],
  ['TSV', 'Tessavale terminal', 'America/Chicago'],
  ['OKR', 'Oakrune Junction terminal', 'America/New_York'],
  ['MRV', 'Marrowvale terminal', 'America/Phoenix'],
  ['GLS', 'Glassford Sidings terminal', 'America/Chicago'],
] as const;

/** Adds terminals up to `terminals`, grows Riverbend to `slots` slots; returns Riverbend's id. */
export async function addTerminals(client: pg.Client, terminals: number, slots: number): Promise<string> {
  const q = (sql: string, params: unknown[] = []) => client.query(sql, params);
  const rvb: string = (await q(`SELECT id FROM terminals WHERE code = 'RVB'`)).rows[0].id;
  for (const [code, name, zone] of EXTRA_TERMINALS.slice(0, Math.max(0, terminals - 2))) {
    await q(
      `INSERT INTO terminals (code, name, time_zone) VALUES ($1, $2, $3) ON CONFLICT (code) DO NOTHING`,
      [code, name, zone],
    );
    await q(
      `INSERT INTO policies (terminal_id, data)
       SELECT t.id, p.data FROM terminals t, policies p WHERE t.code = $1 AND p.terminal_id = $2
       ON CONFLICT DO NOTHING`,
      [code, rvb],
    );
    await addSlots(client, code, 6, 25);
  }
  const { n } = (
    await q(`SELECT count(*)::int AS n FROM yard_spots WHERE terminal_id = $1 AND kind = 'slot'`, [rvb])
  ).rows[0];
  if (n < slots) await addSlots(client, 'RVB', Math.ceil((slots - n) / 25), 25, 'X');
  return rvb;
}

/** Adds `rows` rows of `perRow` slots to terminal `code` (row names and labels carry `prefix`). */
async function addSlots(client: pg.Client, code: string, rows: number, perRow: number, prefix = '') {
  await client.query(
    `WITH t AS (SELECT id FROM terminals WHERE code = $1),
          r AS (INSERT INTO yard_rows (terminal_id, name, sort_order)
                SELECT t.id, 'Row ' || $4 || lpad(g::text, 2, '0'), 100 + g FROM t, generate_series(1, $2::int) g
                ON CONFLICT DO NOTHING RETURNING id, name, terminal_id)
     INSERT INTO yard_spots (terminal_id, row_id, kind, label, sort_order)
     SELECT r.terminal_id, r.id, 'slot', substr(r.name, 5) || '-' || lpad(s::text, 2, '0'), s
       FROM r, generate_series(1, $3::int) s
     ON CONFLICT DO NOTHING`,
    [code, rows, perRow, prefix],
  );
}

/** Adds trailers up to `total` (unit numbers B600001…, VINs with a valid check digit) and labels. */
export async function addTrailers(client: pg.Client, total: number): Promise<number> {
  const had: number = (await client.query(`SELECT count(*)::int AS n FROM trailers`)).rows[0].n;
  const add = Math.max(0, total - had);
  const vins = Array.from({ length: add }, (_, i) => inventedVin(i + 1));
  await client.query(
    `INSERT INTO trailers (unit_number, vin, plate, plate_state, kind, owner_carrier_id, fuel_tank_gallons,
                           hinges_per_door, axle_count, tire_layout)
     SELECT 'B' || (600000 + g), v.vin, 'BK' || lpad(g::text, 6, '0'),
            (ARRAY['IL','MO','CO','KS','NE'])[1 + g % 5],
            (CASE WHEN g % 10 = 9 THEN 'dry_van' ELSE 'reefer' END)::trailer_kind,
            (SELECT id FROM carriers WHERE scac = CASE WHEN g % 15 = 0 THEN 'OSFW' ELSE 'BRCL' END),
            CASE WHEN g % 10 = 9 THEN 0 ELSE 50 END, CASE WHEN g % 4 = 0 THEN 5 ELSE 4 END,
            2, (CASE WHEN g % 7 = 0 THEN 'wide_single' ELSE 'dual' END)::tire_layout
       FROM unnest($1::text[]) WITH ORDINALITY AS v(vin, o) CROSS JOIN LATERAL (SELECT v.o::int AS g) n`,
    [vins],
  );
  await client.query(`INSERT INTO labels (trailer_id) SELECT t.id FROM trailers t
                       WHERE NOT EXISTS (SELECT 1 FROM labels l WHERE l.trailer_id = t.id)`);
  return add;
}
