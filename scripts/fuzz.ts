// The long form of the fuzz suite, by hand: `npm run fuzz -- --runs 10000 [--seed N]` against a
// running app (APP_URL, default from scripts/env.sh) and its database (HM_DB_NAME). Prints the
// totals; exits 1 if any request answered 5xx, a fuzzed write was accepted, or a table changed.
import { pool } from '../db';
import { describeTotals, fuzz } from '../tests/support/fuzz';
import { changedTables, rowCounts } from '../tests/support/row-counts';
import { sessionCookieFor } from '../tests/support/session-cookie';

function arg(name: string, fallback: number): number {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
}

async function main() {
  const runs = arg('runs', 1000);
  const seed = arg('seed', Date.now() % 2 ** 31);
  const baseURL = process.env.APP_URL ?? 'http://localhost:3000';
  console.log(`fuzzing ${baseURL} with ${runs} requests, seed ${seed} (repeat with --seed ${seed})`);
  const cookie = await sessionCookieFor('admin@bramblecrest.example');
  const before = await rowCounts(pool);
  const totals = await fuzz({ baseURL, cookie, runs, seed });
  const changed = changedTables(before, await rowCounts(pool));
  console.log(describeTotals(totals, seed));
  for (const e of totals.serverErrors.slice(0, 10))
    console.log('5xx:', e.status, e.request.method, e.request.path.slice(0, 200));
  if (changed.length) console.log('tables changed:', changed.join(', '));
  await pool.end();
  process.exit(totals.serverErrors.length || totals.acceptedWrites.length || changed.length ? 1 : 0);
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
