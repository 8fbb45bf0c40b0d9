// `npm run bench`: load benchmarks over loopback with autocannon against `next start` on the big
// data set (npm run bench:data first; `next build` first). Each endpoint: requests per second,
// p50/p95/p99 latency, errors (non-2xx or failed), and p99 ÷ the floor's p99 in the same run (the
// floor is /api/health, a trivial route handler). Writes a section of docs/benchmarks.md and
// prints it.
//   --label NAME   the section's name (default "latest"); a section of the same name is replaced
//   --url URL      benchmark a server already running there
//   --topology     one `next start`, then scripts/topology.sh (nginx, two app servers, PgBouncer)
//                  in the same run, and one table with both
//   --seconds N    seconds per read endpoint (default 8)
import { spawn, execFileSync, type ChildProcess } from 'node:child_process';
import { readFileSync, writeFileSync, existsSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { cookies, dbName, longest, onRoad, recentCase, slots, token, typical } from './fixtures';
import { measure, submitBody, type Row } from './measure';

const args = process.argv.slice(2);
const opt = (name: string) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 ? args[i + 1] : undefined;
};
const topology = args.includes('--topology');
const label = opt('label') ?? (topology ? 'one server and the topology' : 'latest');
const seconds = Number(opt('seconds') ?? 8);
const port = Number(process.env.HM_BENCH_PORT || process.env.HM_E2E_PORT || 3301);
const single = opt('url') ?? `http://localhost:${port}`;
const load = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');

async function waitUp(base: string) {
  for (let i = 0; ; i++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) return;
    } catch {
      /* not up yet */
    }
    if (i > 120) throw new Error(`no server at ${base}; run \`next build\` first`);
    await new Promise((r) => setTimeout(r, 500));
  }
}

/** Every endpoint against one address, in order; the yard ends as it began (drops then hooks). */
async function runAll(base: string, title: string): Promise<Row[]> {
  const rows: Row[] = [];
  const run = async (name: string, o: Parameters<typeof measure>[3]) => {
    const r = await measure(base, seconds, name, o);
    rows.push(r);
    console.log(
      `  ${name}: ${r.rps.toFixed(0)} req/s, p99 ${r.p99} ms, ${r.errors} errors of ${r.requests} (${r.kb.toFixed(0)} KB each)`,
    );
  };
  console.log(`benchmarking ${title} at ${base} on ${dbName} (${seconds} s per read; load ${load()})`);
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
  for (const kind of ['drop', 'hook'] as const) {
    let i = 0;
    await run(`handoff submit: ${kind} (${onRoad.length})`, {
      path: '/api/handoffs',
      method: 'POST',
      cookie: cookies.driver,
      connections: 20,
      amount: onRoad.length,
      bodies: () => submitBody(kind, onRoad[i++ % onRoad.length]),
    });
  }
  return rows;
}

const date = new Date().toISOString().slice(0, 16).replace('T', ' ');
const loads: string[] = [];
let server: ChildProcess | null = null;
let oneServer: Row[];
try {
  if (!opt('url')) {
    server = spawn('node_modules/.bin/next', ['start', '-p', String(port)], {
      env: { ...process.env, HM_DB_NAME: dbName, APP_URL: single },
      stdio: 'ignore',
    });
  }
  await waitUp(single);
  loads.push(load());
  oneServer = await runAll(single, 'one server');
} finally {
  server?.kill('SIGTERM');
}
let twoServers: Row[] = [];
const lb = `http://127.0.0.1:${process.env.HM_TOPO_PORT}`;
if (topology) {
  const env = { ...process.env, HM_TOPO_DB: dbName };
  execFileSync('bash', ['scripts/topology.sh', 'start'], { stdio: 'inherit', env });
  try {
    await waitUp(lb);
    loads.push(load());
    twoServers = await runAll(lb, 'the topology');
  } finally {
    execFileSync('bash', ['scripts/topology.sh', 'stop'], { stdio: 'inherit', env });
  }
}

// ---- the table
const cells = (r: Row | undefined, floor: number) =>
  !r
    ? ['—', '—', '—', '—']
    : r.requests === 0
      ? ['0', '—', `no answer (${r.errors} errors or timeouts)`, '—']
      : [r.rps.toFixed(1), String(r.p99), `${r.errors}/${r.requests}`, `${(r.p99 / floor).toFixed(1)}×`];
const floorA = oneServer[0].p99 || 1;
const floorB = twoServers[0]?.p99 || 1;
const table = topology
  ? [
      `## ${label}`,
      '',
      `${date} UTC · ${cpus().length} cores · database ${dbName} · ${seconds} s per read · load average (1, 5, 15 min) at the start: one server ${loads[0]}, topology ${loads[1]}`,
      '',
      'One server: one `next start`, straight to PostgreSQL. Topology: nginx round-robin over two `next start`, through PgBouncer (docs/topology.md).',
      '',
      '| endpoint | conns | one: req/s | one: p99 ms | one: errors | one: p99 ÷ floor | two: req/s | two: p99 ms | two: errors | two: p99 ÷ floor |',
      '| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
      ...oneServer.map(
        (r, i) =>
          `| ${r.name} | ${r.connections} | ${[...cells(r, floorA), ...cells(twoServers[i], floorB)].join(' | ')} |`,
      ),
      '',
    ]
  : [
      `## ${label}`,
      '',
      `${date} UTC · ${cpus().length} cores · ${opt('url') ?? 'one `next start`'} · database ${dbName} · ${seconds} s per read · load average at the start ${loads[0]}`,
      '',
      '| endpoint | conns | req/s | p50 ms | p95 ms | p99 ms | errors | KB/resp | p99 ÷ floor |',
      '| --- | ---: | ---: | ---: | ---: | ---: | ---: | ---: | ---: |',
      ...oneServer.map((r) =>
        r.requests === 0
          ? `| ${r.name} | ${r.connections} | 0 | — | — | — | no answer (${r.errors} errors or timeouts) | — | — |`
          : `| ${r.name} | ${r.connections} | ${r.rps.toFixed(1)} | ${r.p50} | ${r.p95} | ${r.p99} | ${r.errors}/${r.requests} | ${r.kb.toFixed(1)} | ${(r.p99 / floorA).toFixed(1)}× |`,
      ),
      '',
    ];
const text = table.join('\n');
const file = 'docs/benchmarks.md';
const header =
  '# Benchmarks\n\nWritten by `npm run bench` (scripts/bench/run.ts); see docs/performance.md for how to run them.\n';
const sections = (existsSync(file) ? readFileSync(file, 'utf8') : header).split(/\n(?=## )/);
const at = sections.findIndex((s) => s.startsWith(`## ${label}\n`));
if (at >= 0) sections[at] = text.trimEnd() + '\n';
else sections.push(text);
const out = sections.join('\n');
writeFileSync(file, out.endsWith('\n') ? out : out + '\n');
console.log('\n' + text);
