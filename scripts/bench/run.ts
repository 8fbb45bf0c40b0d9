// `npm run bench`: load benchmarks over loopback with autocannon against `next start` on the big
// data set (npm run bench:data first; `next build` first). Each endpoint: requests per second,
// p50/p95/p99 latency, errors (non-2xx or failed), and p99 ÷ the floor's p99 in the same run (the
// floor is /api/health, a trivial route handler). Writes a section of docs/benchmarks.md and
// prints it.
//   --label NAME   the section's name (default "latest"); a section of the same name is replaced
//   --url URL      benchmark a server already running there (e.g. scripts/bench/topology.sh)
//   --seconds N    seconds per read endpoint (default 8)
import { spawn, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { readFileSync, writeFileSync, existsSync } from 'node:fs';
import { cpus } from 'node:os';
import autocannon from 'autocannon';
import { sealData } from 'iron-session';
import pg from 'pg';
import { databaseUrl } from '@/db/url';
import { signLabelToken } from '@/lib/engine/identity/label-token';
import { allOkObservations } from '@/lib/handoffs/all-ok';
import { checklistOf } from '@/lib/trailers/checklist';

const args = process.argv.slice(2);
const opt = (name: string) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 ? args[i + 1] : undefined;
};
const label = opt('label') ?? 'latest';
const seconds = Number(opt('seconds') ?? 8);
const dbName = process.env.HM_BIG_DB ?? 'hitchmark_big';
const port = Number(process.env.HM_BENCH_PORT || process.env.HM_E2E_PORT || 3301);
const base = opt('url') ?? `http://localhost:${port}`;
const SUBMITS = Number(opt('submits') ?? 120);

// ---- fixtures from the big data set
const client = new pg.Client({ connectionString: databaseUrl(dbName) });
await client.connect();
const one = async <T extends pg.QueryResultRow>(sql: string, params: unknown[] = []) =>
  (await client.query<T>(sql, params)).rows[0];
// session_version: a sealed cookie names the user's current one (lib/server/auth.ts)
const driver = await one<{
  id: string;
  carrier_id: string;
  home_terminal_id: string;
  name: string;
  session_version: number;
}>(`SELECT id, carrier_id, home_terminal_id, name, session_version FROM users WHERE driver_number = 'D1001'`);
const clerk = await one<{ id: string; home_terminal_id: string; session_version: number }>(
  `SELECT id, home_terminal_id, session_version FROM users WHERE email = 'clerk@bramblecrest.example'`,
);
const jockey = await one<{ id: string; home_terminal_id: string; session_version: number }>(
  `SELECT id, home_terminal_id, session_version FROM users WHERE email = 'jockey@bramblecrest.example'`,
);
const longest = await one<{ trailer_id: string; n: string }>(
  `SELECT trailer_id, count(*) AS n FROM handoffs GROUP BY trailer_id ORDER BY count(*) DESC LIMIT 1`,
);
// an ordinary trailer for the gate's reads: the 90th percentile of history length
const typical = await one<{ trailer_id: string; n: string; unit_number: string; label_id: string }>(
  `WITH c AS (SELECT trailer_id, count(*) AS n FROM handoffs GROUP BY trailer_id)
   SELECT c.trailer_id, c.n, t.unit_number, l.id AS label_id FROM c
     JOIN trailers t ON t.id = c.trailer_id JOIN labels l ON l.trailer_id = t.id AND l.revoked_at IS NULL
    ORDER BY c.n OFFSET (SELECT (count(*) * 0.9)::int FROM c) LIMIT 1`,
);
const recentCase = await one<{ id: string }>(
  `SELECT id FROM cases WHERE terminal_id = $1 ORDER BY opened_at DESC LIMIT 1`,
  [clerk.home_terminal_id],
);
const slots = await one<{ n: string }>(
  `SELECT count(*) AS n FROM yard_spots WHERE terminal_id = $1 AND kind = 'slot'`,
  [jockey.home_terminal_id],
);
const onRoad = (
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
const cookies = {
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
const token = signLabelToken(
  { labelId: typical.label_id, trailerId: typical.trailer_id },
  process.env.LABEL_SECRET ?? '',
);

// ---- the server
let server: ChildProcess | null = null;
if (!opt('url')) {
  server = spawn('node_modules/.bin/next', ['start', '-p', String(port)], {
    env: { ...process.env, HM_DB_NAME: dbName, APP_URL: base },
    stdio: 'ignore',
  });
}
for (let i = 0; ; i++) {
  try {
    if ((await fetch(`${base}/api/health`)).ok) break;
  } catch {
    /* not up yet */
  }
  if (i > 120) throw new Error(`no server at ${base}; run \`next build\` first`);
  await new Promise((r) => setTimeout(r, 500));
}

type Row = {
  name: string;
  connections: number;
  rps: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
  requests: number;
  kb: number;
};

const pct = (xs: number[], p: number) => xs[Math.min(xs.length - 1, Math.floor((p / 100) * xs.length))] ?? 0;

async function measure(
  name: string,
  o: {
    path: string;
    cookie?: string;
    connections: number;
    method?: 'GET' | 'POST';
    bodies?: () => string;
    amount?: number;
  },
): Promise<Row> {
  const url = `${base}${o.path}`;
  // one warm-up request (compiles the route's code paths, fills caches)
  // (bounded: an endpoint that does not answer at all is reported as such, not waited for)
  if (!o.bodies)
    await fetch(url, { headers: { cookie: o.cookie ?? '' }, signal: AbortSignal.timeout(seconds * 2000) })
      .then((r) => r.arrayBuffer())
      .catch(() => undefined);
  const times: number[] = [];
  let errors = 0;
  let bytes = 0;
  const instance = autocannon({
    url,
    connections: o.connections,
    ...(o.amount ? { amount: o.amount } : { duration: seconds }),
    headers: {
      cookie: o.cookie ?? '',
      ...(o.method === 'POST' ? { 'content-type': 'application/json', origin: base } : {}),
    },
    method: o.method ?? 'GET',
    requests: o.bodies ? [{ setupRequest: (req) => ({ ...req, body: o.bodies!() }) }] : undefined,
  });
  instance.on('response', (_c, status, resBytes, ms) => {
    times.push(ms);
    bytes += resBytes;
    if (status >= 400) errors++;
  });
  const result = await instance;
  // autocannon counts a timed-out request among its errors too
  errors += result.errors;
  times.sort((a, b) => a - b);
  const elapsed = result.duration || seconds;
  return {
    name,
    connections: o.connections,
    rps: times.length / elapsed,
    p50: Math.round(pct(times, 50)),
    p95: Math.round(pct(times, 95)),
    p99: Math.round(pct(times, 99)),
    errors,
    requests: times.length,
    kb: times.length ? bytes / times.length / 1024 : 0,
  };
}

const submitBody = (kind: 'drop' | 'hook', t: (typeof onRoad)[number]) => {
  const isReefer = t.kind === 'reefer';
  const checklist = checklistOf({
    kind: t.kind,
    hingesPerDoor: t.hinges_per_door,
    axleCount: t.axle_count,
    tireLayout: t.tire_layout,
    fuelTankGallons: t.fuel_tank_gallons,
  });
  return JSON.stringify({
    idempotencyKey: `bench-${randomUUID()}`,
    trailerId: t.id,
    kind,
    carrierId: driver.carrier_id,
    driverName: driver.name,
    tractorNumber: 'T4242',
    isLoaded: false,
    sealNumber: null,
    fuelEighths: isReefer ? 8 : null,
    reefer: isReefer
      ? {
          isUnitOn: false,
          setpointF: null,
          returnAirF: null,
          engineHours: 9000,
          preTripResult: 'pass',
          preTripAt: new Date(Date.now() - 3_600_000).toISOString(),
        }
      : null,
    items: allOkObservations(checklist, () => 10),
    spotId: null,
    note: null,
  });
};

const rows: Row[] = [];
const run = async (name: string, o: Parameters<typeof measure>[1]) => {
  const r = await measure(name, o);
  rows.push(r);
  console.log(
    `  ${name}: ${r.rps.toFixed(0)} req/s, p99 ${r.p99} ms, ${r.errors} errors of ${r.requests} (${r.kb.toFixed(0)} KB each)`,
  );
};
try {
  console.log(`benchmarking ${base} on ${dbName} (${seconds} s per read)`);
  await run('floor: GET /api/health', { path: '/api/health', connections: 50 });
  await run('lookup by label token', {
    path: `/api/trailers/lookup?token=${token}`,
    cookie: cookies.driver,
    connections: 50,
  });
  await run('lookup by unit number', {
    path: `/api/trailers/lookup?unit=${typical.unit_number}`,
    cookie: cookies.driver,
    connections: 50,
  });
  await run(`last known condition (${typical.n} handoffs)`, {
    path: `/api/trailers/${typical.trailer_id}/condition`,
    cookie: cookies.driver,
    connections: 20,
  });
  await run(`last known condition, longest history (${longest.n})`, {
    path: `/api/trailers/${longest.trailer_id}/condition`,
    cookie: cookies.driver,
    connections: 10,
  });
  await run(`board JSON (${slots.n} slots)`, {
    path: '/api/yard/board',
    cookie: cookies.jockey,
    connections: 20,
  });
  await run(`yard page HTML (${slots.n} slots)`, { path: '/yard', cookie: cookies.jockey, connections: 20 });
  await run('case queue (desk page)', { path: '/desk', cookie: cookies.clerk, connections: 10 });
  await run('case page', { path: `/desk/cases/${recentCase.id}`, cookie: cookies.clerk, connections: 10 });
  await run(`trailer file, longest history (${longest.n})`, {
    path: `/trailers/${longest.trailer_id}`,
    cookie: cookies.clerk,
    connections: 10,
  });
  await run('reports page', { path: '/desk/reports', cookie: cookies.clerk, connections: 10 });
  // submits: drops of on-road trailers, then hooks of the same trailers (the yard ends as it began)
  let i = 0;
  await run(`handoff submit: drop (${onRoad.length})`, {
    path: '/api/handoffs',
    method: 'POST',
    cookie: cookies.driver,
    connections: 20,
    amount: onRoad.length,
    bodies: () => submitBody('drop', onRoad[i++ % onRoad.length]),
  });
  i = 0;
  await run(`handoff submit: hook (${onRoad.length})`, {
    path: '/api/handoffs',
    method: 'POST',
    cookie: cookies.driver,
    connections: 20,
    amount: onRoad.length,
    bodies: () => submitBody('hook', onRoad[i++ % onRoad.length]),
  });
} finally {
  server?.kill('SIGTERM');
}

// ---- the table
const floor = rows[0].p99 || 1;
const date = new Date().toISOString().slice(0, 16).replace('T', ' ');
const table = [
  `## ${label}`,
  '',
  `${date} UTC · ${cpus().length} cores · ${base.includes('localhost') && !opt('url') ? 'one `next start`' : base} · database ${dbName} · ${seconds} s per read`,
  '',
  '| endpoint | conns | req/s | p50 ms | p95 ms | p99 ms | errors | KB/resp | p99 ÷ floor |',
  '| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
  ...rows.map((r) =>
    r.requests === 0
      ? `| ${r.name} | ${r.connections} | 0 | — | — | — | no answer (${r.errors} errors or timeouts) | — | — |`
      : `| ${r.name} | ${r.connections} | ${r.rps.toFixed(1)} | ${r.p50} | ${r.p95} | ${r.p99} | ${r.errors}/${r.requests} | ${r.kb.toFixed(1)} | ${(r.p99 / floor).toFixed(1)}× |`,
  ),
  '',
].join('\n');
const file = 'docs/benchmarks.md';
const header =
  '# Benchmarks\n\nWritten by `npm run bench` (scripts/bench/run.ts); see docs/performance.md for how to run them.\n';
let text = existsSync(file) ? readFileSync(file, 'utf8') : header;
const sections = text.split(/\n(?=## )/);
const at = sections.findIndex((s) => s.startsWith(`## ${label}\n`));
if (at >= 0) sections[at] = table.trimEnd() + '\n';
else sections.push(table);
text = sections.join('\n');
writeFileSync(file, text.endsWith('\n') ? text : text + '\n');
console.log('\n' + table);
