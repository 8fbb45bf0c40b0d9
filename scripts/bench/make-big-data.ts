// `npm run bench:data`: the big carrier's data set in its own database (hitchmark_big unless
// HM_BIG_DB says otherwise), made once and kept for the load benchmarks. Recreates the database,
// migrates it, seeds the demo data (needs the S3 fake: bash scripts/fakes.sh start), then adds
// the bulk rows (scripts/bench/big-data.ts) and prints the time and the row counts.
//   --handoffs N   about N handoffs (default 1,000,000)    --trailers N  (default 20,000)
//   --slots N      slots at the largest terminal (2,000)   --keep        reuse a seeded database
import { execFileSync } from 'node:child_process';
import pg from 'pg';
import { databaseUrl } from '@/db/url';
import { addBigData, BIG } from './big-data';

const args = process.argv.slice(2);
const flag = (name: string, fallback: number) => {
  const i = args.indexOf(`--${name}`);
  return i >= 0 ? Number(args[i + 1]) : fallback;
};
const dbName = process.env.HM_BIG_DB ?? 'hitchmark_big';
const started = Date.now();
const seconds = () => `${((Date.now() - started) / 1000).toFixed(0)} s`;
const env = { ...process.env, HM_DB_NAME: dbName };

if (!args.includes('--keep')) {
  execFileSync('bash', ['scripts/db.sh', 'createdb', dbName], { stdio: 'inherit', env });
  execFileSync('node_modules/.bin/tsx', ['db/migrate.ts'], { stdio: 'inherit', env });
  // the seed and the bulk rows are written as the owner (the app's role may not write history in bulk)
  execFileSync('node_modules/.bin/tsx', ['--conditions=react-server', 'db/seed/index.ts'], {
    stdio: 'inherit',
    env: { ...env, HM_DB_ROLE: 'owner' },
  });
  console.log(`demo seed ready (${seconds()})`);
}
const client = new pg.Client({ connectionString: databaseUrl(dbName, 'owner') });
await client.connect();
await client.query('SET synchronous_commit = off');
const counts = await addBigData(client, {
  ...BIG,
  handoffs: flag('handoffs', BIG.handoffs),
  trailers: flag('trailers', BIG.trailers),
  slots: flag('slots', BIG.slots),
  log: (l) => console.log(`  ${l} [${seconds()}]`),
});
await client.end();
console.log(`\nbig data set in database ${dbName}, made in ${seconds()}:`);
for (const [table, n] of Object.entries(counts))
  console.log(`  ${table.padEnd(14)} ${n.toLocaleString('en-US')}`);
