// Largest Contentful Paint of the daily screens in headless Chromium (Debian's /usr/bin/chromium
// through @playwright/test's launcher), against a running `next start` (--url, default the e2e
// port) whose database is --db (default hitchmark_big; the demo's is hitchmark_e2e). Each page is
// loaded --runs times (default 3) in a fresh phone-sized context with a sealed session; prints
// every run and the median. LCP as the browser reports it: the last `largest-contentful-paint`
// entry before the first input (W3C Largest Contentful Paint draft; PerformanceObserver, buffered).
// Under each page, the median breakdown of what came before it (scripts/bench/lcp-profile.ts):
// first byte, streamed HTML, CSS, fonts, scripts, hydration, first paint, the LCP element.
//   bash scripts/bench/with-env.sh scripts/bench/lcp.ts --db hitchmark_e2e --url http://localhost:3150
import { cpus, loadavg } from 'node:os';
import { sealData } from 'iron-session';
import pg from 'pg';
import { databaseUrl } from '@/db/url';
import { launchChromium } from '../../tests/support/chromium';
import { breakdown, profileLoad, type Profile } from './lcp-profile';

const args = process.argv.slice(2);
const opt = (name: string) => (args.includes(`--${name}`) ? args[args.indexOf(`--${name}`) + 1] : undefined);
const dbName = opt('db') ?? process.env.HM_BIG_DB ?? 'hitchmark_big';
const base = opt('url') ?? `http://localhost:${process.env.HM_E2E_PORT ?? 3150}`;
const runs = Number(opt('runs') ?? 3);
const only = opt('only');

const client = new pg.Client({ connectionString: databaseUrl(dbName) });
await client.connect();
const one = async (sql: string) => (await client.query(sql)).rows[0];
const user = (where: string) =>
  one(`SELECT id, role, carrier_id, home_terminal_id, session_version FROM users WHERE ${where} LIMIT 1`);
const driver = await user(`driver_number = 'D1001'`);
const jockey = await user(`email = 'jockey@bramblecrest.example'`);
const clerk = await user(`email = 'clerk@bramblecrest.example'`);
const longest = await one(
  `SELECT trailer_id, count(*)::int AS n FROM handoffs GROUP BY trailer_id ORDER BY count(*) DESC LIMIT 1`,
);
const slots = await one(
  `SELECT count(*)::int AS n FROM yard_spots WHERE terminal_id = '${jockey.home_terminal_id}' AND kind = 'slot'`,
);
await client.end();

const secret = process.env.SESSION_SECRET ?? 'hitchmark-local-development-secret-not-for-production';
const seal = (u: typeof driver) =>
  sealData(
    {
      userId: u.id,
      role: u.role,
      carrierId: u.carrier_id,
      terminalId: u.home_terminal_id,
      version: u.session_version,
    },
    { password: secret, ttl: 60 * 60 },
  );

const PAGES = [
  ['gate', '/gate', driver],
  ['handoff form (longest history)', `/gate/trailers/${longest.trailer_id}`, driver],
  [`yard (${slots.n} slots)`, '/yard', jockey],
  ['desk (case queue)', '/desk', clerk],
  [`trailer file (${longest.n} handoffs)`, `/trailers/${longest.trailer_id}`, clerk],
] as const;

const load = () =>
  loadavg()
    .map((l) => l.toFixed(2))
    .join(' ');
const loadAtStart = load();
const browser = await launchChromium();
const lines: string[] = [];
for (const [name, path, who] of PAGES.filter(([n]) => !only || n.startsWith(only))) {
  const profiles: Profile[] = [];
  for (let r = 0; r < runs; r++) {
    const context = await browser.newContext({ viewport: { width: 412, height: 915 }, isMobile: true });
    await context.addCookies([{ name: 'hm_session', value: await seal(who), url: base }]);
    profiles.push(await profileLoad(context, base + path));
    await context.close();
    console.error(`  ${name}: run ${r + 1}, LCP ${(profiles[r].lcp / 1000).toFixed(2)} s`);
  }
  const figures = profiles.map((p) => p.lcp);
  const median = [...figures].sort((a, b) => a - b)[Math.floor(figures.length / 2)];
  lines.push(
    `${name.padEnd(34)} median ${(median / 1000).toFixed(2)} s   runs ${figures.map((f) => (f / 1000).toFixed(2)).join(' / ')}`,
    ...breakdown(profiles),
  );
}
await browser.close();
const date = new Date().toISOString().slice(0, 16).replace('T', ' ');
console.log(
  `LCP in headless Chromium, ${date} UTC, ${cpus().length} cores, ${base}, database ${dbName}, ${runs} runs each; load average ${loadAtStart} at the start, ${load()} at the end`,
);
for (const l of lines) console.log(l);
