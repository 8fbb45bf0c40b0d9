// Benchmark (not a test): how fast /yard renders a 2,000-slot terminal in headless Chromium.
// Builds a throwaway database (hitchmark_bench) with the demo seed plus a terminal "BEN" of
// 40 rows x 50 slots, 1,500 of them occupied, starts `next start` on it (run `next build`
// first), signs a jockey in and times navigation start -> every slot of the map drawn.
// Usage: source scripts/env.sh && npx tsx scripts/bench-board.ts [runs]
import { execFileSync, spawn } from 'node:child_process';
import { hash } from 'bcryptjs';
import { launchChromium } from '../tests/support/chromium';

const DB = 'hitchmark_bench';
const PORT = Number(process.env.HM_BENCH_PORT ?? process.env.HM_E2E_PORT ?? 3301);
const SLOTS_PER_ROW = 50;
const ROWS = 40;
const OCCUPIED = 1500;
const TARGET_MS = 1000;
const RUNS = Number(process.argv[2] ?? 7);
const JOCKEY = { email: 'bench-jockey@bench.example', password: 'hitchmark-bench-jockey' };

process.env.HM_DB_NAME = DB;
execFileSync('bash', ['scripts/db.sh', 'createdb', DB], { stdio: 'ignore' });
execFileSync('node_modules/.bin/tsx', ['db/migrate.ts'], { stdio: 'ignore', env: process.env });
execFileSync('node_modules/.bin/tsx', ['db/seed.ts'], {
  stdio: 'ignore',
  env: { ...process.env, HM_DB_ROLE: 'owner' },
});

const { db, pool } = await import('../db/index');
const { users } = await import('../db/schema');
const fx = await import('../tests/support/yard-fixture');
const terminalId = await fx.ensureTerminal(db, 'BEN');
const spotIds: string[] = [];
for (let r = 0; r < ROWS; r++) {
  const { spots } = await fx.createRowWithSlots(
    db,
    terminalId,
    `Row ${String(r + 1).padStart(2, '0')}`,
    SLOTS_PER_ROW,
    r,
  );
  spotIds.push(...spots.map((s) => s.id));
}
for (let i = 0; i < OCCUPIED; i += 500) {
  await fx.placeTrailers(db, terminalId, fx.uniqueTag(), spotIds.slice(i, Math.min(i + 500, OCCUPIED)), {
    fuelEighths: i % 8,
  });
}
await db.insert(users).values({
  name: 'Bench jockey',
  role: 'jockey',
  email: JOCKEY.email,
  secretHash: await hash(JOCKEY.password, 10),
  homeTerminalId: terminalId,
});
await pool.end();

const server = spawn('node_modules/.bin/next', ['start', '-p', String(PORT)], {
  env: process.env,
  stdio: 'ignore',
});
const base = `http://localhost:${PORT}`;
try {
  for (let i = 0; ; i++) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) break;
    } catch {
      /* not up yet */
    }
    if (i > 120) throw new Error('next start did not come up; run `next build` first');
    await new Promise((r) => setTimeout(r, 500));
  }
  const browser = await launchChromium();
  const page = await (await browser.newContext({ viewport: { width: 1280, height: 900 } })).newPage();
  await page.goto(`${base}/login`);
  await page.getByRole('tab', { name: 'Terminal staff' }).click();
  await page.getByLabel('E-mail').fill(JOCKEY.email);
  await page.getByLabel('Password').fill(JOCKEY.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(/\/yard$/);

  const total = ROWS * SLOTS_PER_ROW;
  const times: number[] = [];
  const parts: { firstByte: number; lastByte: number; bytes: number }[] = [];
  for (let run = 0; run <= RUNS; run++) {
    await page.goto(`${base}/yard`, { waitUntil: 'commit' });
    // performance.now() counts from this document's navigation start
    const handle = await page.waitForFunction(
      (n) => (document.querySelectorAll('#yard-map li').length >= n ? performance.now() : false),
      total,
      { polling: 'raf', timeout: 30_000 },
    );
    const ms = (await handle.jsonValue()) as number;
    const nav = await page.evaluate(() => {
      const e = performance.getEntriesByType('navigation')[0] as PerformanceNavigationTiming;
      return { firstByte: e.responseStart, lastByte: e.responseEnd, bytes: e.transferSize };
    });
    if (run > 0) {
      times.push(ms);
      parts.push(nav);
    } // run 0 warms the server and the browser cache
  }
  // the floor on this machine right now: a small yard page in the same browser
  const floor: number[] = [];
  for (let i = 0; i < 5; i++) {
    await page.goto(`${base}/yard/tasks`, { waitUntil: 'commit' });
    const h = await page.waitForFunction(
      () => (document.querySelector('h1') ? performance.now() : false),
      null,
      { polling: 'raf' },
    );
    floor.push((await h.jsonValue()) as number);
  }
  const api: number[] = [];
  for (let i = 0; i < 5; i++) {
    const t0 = performance.now();
    await (await page.request.get(`${base}/api/yard/board`)).body();
    api.push(performance.now() - t0);
  }
  await browser.close();
  times.sort((a, b) => a - b);
  const median = times[Math.floor(times.length / 2)];
  const worst = times[times.length - 1];
  console.log(`board render, ${total} slots (${OCCUPIED} occupied), ${times.length} runs after one warm-up`);
  console.log(
    `  median ${median.toFixed(0)} ms · best ${times[0].toFixed(0)} ms · worst ${worst.toFixed(0)} ms`,
  );
  const mid = (xs: number[]) => xs.sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  console.log(
    `  median first byte ${mid(parts.map((p) => p.firstByte)).toFixed(0)} ms · last byte ${mid(parts.map((p) => p.lastByte)).toFixed(0)} ms · ${(mid(parts.map((p) => p.bytes)) / 1024).toFixed(0)} KiB`,
  );
  console.log(
    `  /api/yard/board (same data as JSON) median ${mid(api).toFixed(0)} ms · small page /yard/tasks median ${mid(floor).toFixed(0)} ms`,
  );
  console.log(
    `  median / 1 s target = ${(median / TARGET_MS).toFixed(2)} · worst / target = ${(worst / TARGET_MS).toFixed(2)} · ${worst < TARGET_MS ? 'under' : 'OVER'} the target`,
  );
} finally {
  server.kill('SIGTERM');
}
