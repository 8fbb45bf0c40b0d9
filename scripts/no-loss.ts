// No-loss run (trust suite): many phones record handoffs at once over HTTP against `next start`,
// with duplicate taps, client timeouts and retries under the same draft key, while the app server
// (not the database) is killed and restarted. Then it checks what the database holds:
// stored = sent, each draft key once, no answer 500, every touched trailer's chain verifies.
//
//   source scripts/env.sh && npx next build && npm run -s no-loss
//   npm run -s no-loss -- --handoffs 60 --phones 10 --restarts 1     (a short form)
//
// It makes its own database (hitchmark_noloss: migrate, demo seed, plus an invented yard row of
// 40 empty slots so twenty phones never find the yard full) and its own server on HM_NOLOSS_PORT
// (default 3190). Needs PostgreSQL running (scripts/db.sh start); the receipt e-mails go to the
// SMTP fake when it runs (scripts/fakes.sh start) and wait in the outbox when it does not.
import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { sealData } from 'iron-session';

const arg = (name: string, fallback: number) => {
  const i = process.argv.indexOf(`--${name}`);
  const v = i >= 0 ? Number(process.argv[i + 1]) : fallback;
  if (!Number.isInteger(v) || v < 0) throw new Error(`--${name} needs a whole number`);
  return v;
};
const HANDOFFS = arg('handoffs', 300);
const PHONES = arg('phones', 20);
const RESTARTS = arg('restarts', 2);
const PORT = Number(process.env.HM_NOLOSS_PORT ?? 3190);
// the app's own address (APP_URL below): the same-site check compares Origin with it
const BASE = `http://localhost:${PORT}`;
const DB = 'hitchmark_noloss';
const DRIVERS = ['D1001', 'D1002', 'D1003', 'D1004', 'D2001', 'D2002', 'D3001', 'D4001'];
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

if (!process.env.SESSION_SECRET || !process.env.CHAIN_KEY) {
  console.error('Run `source scripts/env.sh` first (SESSION_SECRET and CHAIN_KEY are needed).');
  process.exit(2);
}

// ---- the database: fresh, migrated and seeded as the owner; the app connects as its own role
console.log(`no-loss: preparing ${DB} (migrate, seed; about 40 s)`);
process.env.HM_DB_NAME = DB;
execFileSync('bash', ['scripts/db.sh', 'createdb', DB], { stdio: 'ignore' });
execFileSync('node_modules/.bin/tsx', ['db/migrate.ts'], { stdio: 'ignore' });
execFileSync('node_modules/.bin/tsx', ['--conditions=react-server', 'db/seed/index.ts'], {
  stdio: 'ignore',
  env: { ...process.env, HM_DB_ROLE: 'owner' },
});

const { db, pool } = await import('@/db');
const { and, eq, like, sql } = await import('drizzle-orm');
const { handoffs, trailers, users, yardRows, yardSpots } = await import('@/db/schema');
const { checklistOf } = await import('@/lib/trailers/checklist');
const { allOkObservations } = await import('@/lib/handoffs/all-ok');
const { verifyTrailerChain } = await import('@/lib/server/handoffs/chain');
const { SESSION_COOKIE } = await import('@/lib/auth/session-cookie');

const drivers = await Promise.all(
  DRIVERS.map(async (n) => {
    const [u] = await db.select().from(users).where(eq(users.driverNumber, n));
    const cookie = await sealData(
      {
        userId: u.id,
        role: u.role,
        carrierId: u.carrierId,
        terminalId: u.homeTerminalId,
        version: u.sessionVersion,
      },
      { password: process.env.SESSION_SECRET!, ttl: 3600 },
    );
    return {
      id: u.id,
      carrierId: u.carrierId!,
      terminalId: u.homeTerminalId!,
      cookie: `${SESSION_COOKIE}=${cookie}`,
    };
  }),
);
// room for every phone's trailer at the drivers' home terminal
const [row] = await db
  .insert(yardRows)
  .values({ terminalId: drivers[0].terminalId, name: 'No-loss row', sortOrder: -1 })
  .returning({ id: yardRows.id });
await db.insert(yardSpots).values(
  Array.from({ length: 40 }, (_, i) => ({
    terminalId: drivers[0].terminalId,
    rowId: row.id,
    kind: 'slot' as const,
    label: `NL-${i + 1}`,
    sortOrder: i,
  })),
);
const onRoad = await db
  .select()
  .from(trailers)
  .where(
    and(
      eq(trailers.status, 'on_road'),
      sql`not exists (select 1 from handoffs h where h.trailer_id = ${trailers.id})`,
    ),
  )
  .limit(PHONES);
if (onRoad.length < PHONES)
  throw new Error(`only ${onRoad.length} untouched trailers on the road for ${PHONES} phones`);

// ---- the app server, killed and restarted during the run
let server: ChildProcess | null = null;
async function startServer() {
  server = spawn('node_modules/.bin/next', ['start', '-p', String(PORT)], {
    env: { ...process.env, HM_DB_NAME: DB, HM_APP_PORT: String(PORT), APP_URL: `http://localhost:${PORT}` },
    stdio: 'ignore',
    detached: true,
  });
  for (let i = 0; i < 240; i++) {
    try {
      if ((await fetch(`${BASE}/api/health`)).ok) return;
    } catch {
      /* not up yet */
    }
    await sleep(250);
  }
  throw new Error('the app server did not come up in 60 s');
}
process.on('exit', () => killServer());
process.on('SIGINT', () => process.exit(130));
process.on('SIGTERM', () => process.exit(143));
function killServer() {
  try {
    if (server?.pid) process.kill(-server.pid, 'SIGKILL');
  } catch {
    /* gone already */
  }
  server = null;
}

// ---- the phones
type Outcome = {
  key: string;
  trailerId: string;
  handoffId: string | null;
  status: number | null;
  tries: number;
};
const outcomes: Outcome[] = [];
const figures = {
  requests: 0,
  fiveHundreds: 0,
  networkErrors: 0,
  timeouts: 0,
  duplicateTaps: 0,
  replays: 0,
  conflicts: 0,
};
let recorded = 0;

type Answer = { handoff?: { id: string }; message?: string };

async function send(
  cookie: string,
  body: unknown,
  timeoutMs: number,
): Promise<{ status: number; json: Answer | null } | null> {
  figures.requests++;
  try {
    const res = await fetch(`${BASE}/api/handoffs`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie, origin: BASE },
      body: JSON.stringify(body),
      signal: AbortSignal.timeout(timeoutMs),
    });
    const json = (await res.json().catch(() => null)) as Answer | null;
    if (res.status >= 500) figures.fiveHundreds++;
    if (res.status === 200) figures.replays++;
    if (res.status === 409) figures.conflicts++;
    return { status: res.status, json };
  } catch (e) {
    if ((e as Error).name === 'TimeoutError') figures.timeouts++;
    else figures.networkErrors++;
    return null;
  }
}

/** One handoff from one phone: retried under the same draft key until the server answers it. */
async function handoff(phone: number, kind: 'drop' | 'hook', trailer: (typeof onRoad)[number]) {
  const d = drivers[phone % drivers.length];
  const key = `noloss-${randomUUID()}`;
  const body = {
    idempotencyKey: key,
    trailerId: trailer.id,
    kind,
    carrierId: d.carrierId,
    driverName: `Phone ${phone + 1}`,
    tractorNumber: `NL-${phone + 1}`,
    isLoaded: false,
    sealNumber: null,
    fuelEighths: 8,
    reefer:
      trailer.kind === 'reefer'
        ? {
            isUnitOn: true,
            setpointF: 34,
            returnAirF: 36,
            engineHours: 1200,
            preTripResult: 'pass',
            preTripAt: new Date(Date.now() - 3_600_000).toISOString(),
          }
        : null,
    items: allOkObservations(checklistOf(trailer)),
    spotId: null,
    note: null,
  };
  const out: Outcome = { key, trailerId: trailer.id, handoffId: null, status: null, tries: 0 };
  outcomes.push(out);
  const started = Date.now();
  while (Date.now() - started < 180_000) {
    out.tries++;
    // one try in ten is a double tap (two identical requests at once); one in eight gives up after 40 ms
    const tap = Math.random() < 0.1;
    const timeout = Math.random() < 0.125 ? 40 : 20_000;
    if (tap) figures.duplicateTaps++;
    const answers = await Promise.all([
      send(d.cookie, body, timeout),
      tap ? send(d.cookie, body, 20_000) : null,
    ]);
    const ok = answers.find((a) => a && (a.status === 201 || a.status === 200));
    if (ok) {
      out.handoffId = ok.json?.handoff?.id ?? null;
      out.status = ok.status;
      recorded++;
      return;
    }
    const refusal = answers.find((a) => a && a.status >= 400 && a.status < 500 && a.status !== 409);
    if (refusal) {
      out.status = refusal.status;
      console.error(`phone ${phone + 1}: ${kind} refused ${refusal.status}: ${refusal.json?.message}`);
      return;
    }
    await sleep(200 + Math.random() * 300); // server down, timed out, or the double tap's twin holds the trailer
  }
  console.error(`phone ${phone + 1}: gave up on ${key} after 180 s`);
}

async function phone(i: number, count: number) {
  const trailer = onRoad[i];
  for (let n = 0; n < count; n++) await handoff(i, n % 2 === 0 ? 'drop' : 'hook', trailer);
}

await startServer();
console.log(`no-loss: ${HANDOFFS} handoffs from ${PHONES} phones, ${RESTARTS} server kills`);
const t0 = Date.now();
const perPhone = Array.from(
  { length: PHONES },
  (_, i) => Math.floor(HANDOFFS / PHONES) + (i < HANDOFFS % PHONES ? 1 : 0),
);
let phonesDone = false;
const run = Promise.all(perPhone.map((n, i) => phone(i, n))).finally(() => {
  phonesDone = true;
});
let restarts = 0;
const killer = (async () => {
  for (let k = 1; k <= RESTARTS; k++) {
    while (!phonesDone && recorded < (HANDOFFS * k) / (RESTARTS + 1)) await sleep(50);
    if (phonesDone) break;
    killServer();
    console.log(`no-loss: killed the app server after ${recorded} recorded handoffs`);
    await sleep(1000);
    await startServer();
    restarts++;
    console.log('no-loss: app server back');
  }
})();
await run;
await killer;
killServer();

// ---- what the database holds
const stored = await db
  .select({ id: handoffs.id, key: handoffs.idempotencyKey, trailerId: handoffs.trailerId })
  .from(handoffs)
  .where(like(handoffs.idempotencyKey, 'noloss-%'));
const byKey = new Map<string, number>();
for (const s of stored) byKey.set(s.key, (byKey.get(s.key) ?? 0) + 1);
const answered = outcomes.filter((o) => o.handoffId);
const missing = answered.filter((o) => !stored.some((s) => s.key === o.key && s.id === o.handoffId));
const twice = [...byKey.values()].filter((n) => n > 1).length;
const strays = stored.filter((s) => !outcomes.some((o) => o.key === s.key)).length;
const chains = await Promise.all(onRoad.map((t) => verifyTrailerChain(t.id)));
const chainsOk = chains.filter((c) => c.check.ok).length;
await pool.end();

const lines = [
  `handoffs sent             ${outcomes.length} (${PHONES} phones, ${figures.requests} HTTP requests in ${((Date.now() - t0) / 1000).toFixed(0)} s)`,
  `handoffs stored           ${stored.length}`,
  `answered 201/200          ${answered.length} (replays answered 200: ${figures.replays})`,
  `stored as answered        ${answered.length - missing.length} of ${answered.length}`,
  `draft keys stored twice   ${twice}`,
  `stored but never sent     ${strays}`,
  `duplicate taps            ${figures.duplicateTaps}`,
  `client timeouts (retried) ${figures.timeouts}`,
  `network errors (retried)  ${figures.networkErrors}`,
  `409 while a twin held it  ${figures.conflicts}`,
  `answers 500               ${figures.fiveHundreds}`,
  `server kills survived     ${restarts}`,
  `chains verified           ${chainsOk} of ${chains.length} trailers`,
];
console.log(`\nno-loss figures\n  ${lines.join('\n  ')}`);
const ok =
  outcomes.length === HANDOFFS &&
  stored.length === HANDOFFS &&
  answered.length === HANDOFFS &&
  missing.length === 0 &&
  twice === 0 &&
  strays === 0 &&
  figures.fiveHundreds === 0 &&
  restarts === RESTARTS &&
  chainsOk === chains.length;
console.log(ok ? '\nno-loss: PASS' : '\nno-loss: FAIL');
process.exit(ok ? 0 : 1);
