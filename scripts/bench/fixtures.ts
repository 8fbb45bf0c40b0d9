// The load benchmark's fixtures, read from the big data set (npm run bench:data): the demo
// users' session cookies, a gate label token, an ordinary and the longest trailer history, a
// recent case, the slot count and on-road trailers for the submits.
import { sealData } from 'iron-session';
import pg from 'pg';
import { databaseUrl } from '@/db/url';
import { signLabelToken } from '@/lib/engine/identity/label-token';

export const dbName = process.env.HM_BIG_DB ?? 'hitchmark_big';
const args = process.argv.slice(2);
const i = args.indexOf('--submits');
const SUBMITS = Number(i >= 0 ? args[i + 1] : 120);

const client = new pg.Client({ connectionString: databaseUrl(dbName) });
await client.connect();
const one = async <T extends pg.QueryResultRow>(sql: string, params: unknown[] = []) =>
  (await client.query<T>(sql, params)).rows[0];
// session_version: a sealed cookie names the user's current one (lib/server/auth.ts)
export const driver = await one<{
  id: string;
  carrier_id: string;
  home_terminal_id: string;
  name: string;
  session_version: number;
}>(`SELECT id, carrier_id, home_terminal_id, name, session_version FROM users WHERE driver_number = 'D1001'`);
export const clerk = await one<{ id: string; home_terminal_id: string; session_version: number }>(
  `SELECT id, home_terminal_id, session_version FROM users WHERE email = 'clerk@bramblecrest.example'`,
);
export const jockey = await one<{ id: string; home_terminal_id: string; session_version: number }>(
  `SELECT id, home_terminal_id, session_version FROM users WHERE email = 'jockey@bramblecrest.example'`,
);
export const longest = await one<{ trailer_id: string; n: string }>(
  `SELECT trailer_id, count(*) AS n FROM handoffs GROUP BY trailer_id ORDER BY count(*) DESC LIMIT 1`,
);
// an ordinary trailer for the gate's reads: the 90th percentile of history length
export const typical = await one<{ trailer_id: string; n: string; unit_number: string; label_id: string }>(
  `WITH c AS (SELECT trailer_id, count(*) AS n FROM handoffs GROUP BY trailer_id)
   SELECT c.trailer_id, c.n, t.unit_number, l.id AS label_id FROM c
     JOIN trailers t ON t.id = c.trailer_id JOIN labels l ON l.trailer_id = t.id AND l.revoked_at IS NULL
    ORDER BY c.n OFFSET (SELECT (count(*) * 0.9)::int FROM c) LIMIT 1`,
);
export const recentCase = await one<{ id: string }>(
  `SELECT id FROM cases WHERE terminal_id = $1 ORDER BY opened_at DESC LIMIT 1`,
  [clerk.home_terminal_id],
);
export const slots = await one<{ n: string }>(
  `SELECT count(*) AS n FROM yard_spots WHERE terminal_id = $1 AND kind = 'slot'`,
  [jockey.home_terminal_id],
);
export const onRoad = (
  await client.query<{
    id: string;
    kind: 'reefer' | 'dry_van';
    hinges_per_door: number;
    axle_count: number;
    tire_layout: 'dual' | 'wide_single';
    fuel_tank_gallons: number;
  }>(
    `SELECT t.id, t.kind, t.hinges_per_door, t.axle_count, t.tire_layout, t.fuel_tank_gallons FROM trailers t
      WHERE t.status = 'on_road' AND NOT EXISTS (SELECT 1 FROM holds h WHERE h.trailer_id = t.id AND h.released_at IS NULL)
      ORDER BY t.unit_number DESC LIMIT $1`,
    [SUBMITS],
  )
).rows;
await client.end();

const secret = process.env.SESSION_SECRET ?? 'hitchmark-local-development-secret-not-for-production';
const cookieFor = async (s: {
  userId: string;
  role: string;
  carrierId: string | null;
  terminalId: string;
  version: number;
}) => `hm_session=${await sealData(s, { password: secret, ttl: 60 * 60 * 12 })}`;
export const cookies = {
  driver: await cookieFor({
    userId: driver.id,
    role: 'driver',
    carrierId: driver.carrier_id,
    terminalId: driver.home_terminal_id,
    version: driver.session_version,
  }),
  clerk: await cookieFor({
    userId: clerk.id,
    role: 'clerk',
    carrierId: null,
    terminalId: clerk.home_terminal_id,
    version: clerk.session_version,
  }),
  jockey: await cookieFor({
    userId: jockey.id,
    role: 'jockey',
    carrierId: null,
    terminalId: jockey.home_terminal_id,
    version: jockey.session_version,
  }),
};
export const token = signLabelToken(
  { labelId: typical.label_id, trailerId: typical.trailer_id },
  process.env.LABEL_SECRET ?? '',
);
