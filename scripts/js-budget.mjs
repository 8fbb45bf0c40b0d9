// First-load JavaScript per main route, gzipped, read from the build output (`next build` first).
// A route's first load = the app's root main files (.next/build-manifest.json `rootMainFiles`)
// plus every script its client reference manifest names for its segments (layouts, error and
// not-found boundaries, the page): an upper bound of what the browser fetches before the page
// works. Scripts loaded later with import() (the camera scanner, the submit's schema) are not in
// it. Gzip level 9 (as the framework's own size report measures). Fails when a driver or jockey
// page is over its budget (issue 12: at most 180 KB).
//   node scripts/js-budget.mjs [--budget KB]
import { existsSync, readFileSync } from 'node:fs';
import { gzipSync } from 'node:zlib';
import { join } from 'node:path';
import vm from 'node:vm';

const NEXT = '.next';
const args = process.argv.slice(2);
const budgetAt = args.indexOf('--budget');
const BUDGET_KB = budgetAt >= 0 ? Number(args[budgetAt + 1]) : 180;

/** [route as the manifest names it, shown as, held to the budget (driver and jockey pages)] */
const ROUTES = [
  ['/(auth)/login/page', '/login', true],
  ['/(app)/gate/page', '/gate', true],
  ['/(app)/gate/trailers/[id]/page', '/gate/trailers/[id] (handoff form)', true],
  ['/(app)/gate/receipts/[id]/page', '/gate/receipts/[id]', true],
  ['/(app)/yard/page', '/yard', true],
  ['/(app)/yard/moves/page', '/yard/moves', true],
  ['/(app)/yard/tasks/page', '/yard/tasks', true],
  ['/(app)/yard/walks/[id]/page', '/yard/walks/[id]', true],
  ['/(app)/desk/page', '/desk', false],
  ['/(app)/desk/cases/[id]/page', '/desk/cases/[id]', false],
  ['/(app)/trailers/[id]/page', '/trailers/[id] (trailer file)', false],
];

if (!existsSync(join(NEXT, 'build-manifest.json'))) {
  console.error('no build output in .next: run `npx next build` first');
  process.exit(2);
}
const build = JSON.parse(readFileSync(join(NEXT, 'build-manifest.json'), 'utf8'));
const gz = new Map();
const gzKb = (file) => {
  if (!gz.has(file)) gz.set(file, gzipSync(readFileSync(join(NEXT, file)), { level: 9 }).length / 1024);
  return gz.get(file);
};

/** The scripts a route's client reference manifest lists (the file assigns a global: run it in a sandbox). */
function entryScripts(route) {
  const file = join(NEXT, 'server/app', `${route.slice(1)}_client-reference-manifest.js`);
  if (!existsSync(file)) return null;
  const sandbox = { globalThis: {} };
  sandbox.self = sandbox.globalThis;
  vm.runInNewContext(readFileSync(file, 'utf8'), sandbox);
  const manifest = sandbox.globalThis.__RSC_MANIFEST?.[route];
  if (!manifest) return null;
  // Turbopack lists each segment's scripts; webpack lists the chunks of every client module the
  // route's tree imports statically (`async: false`; import() chunks are async)
  const files = manifest.entryJSFiles
    ? Object.values(manifest.entryJSFiles).flat()
    : Object.values(manifest.clientModules ?? {})
        .filter((m) => !m.async)
        .flatMap((m) => m.chunks.filter((c) => typeof c === 'string' && c.endsWith('.js')));
  return files.map((f) => decodeURIComponent(f.replace(/^\/_next\//, '')));
}

let over = 0;
const lines = [];
for (const [route, shown, held] of ROUTES) {
  const scripts = entryScripts(route);
  if (!scripts) {
    lines.push([shown, 'not in this build', '', '']);
    continue;
  }
  const files = new Set([...(build.rootMainFiles ?? []), ...scripts]);
  const kb = [...files].reduce((sum, f) => sum + gzKb(f), 0);
  const verdict = !held ? 'no budget' : kb <= BUDGET_KB ? 'within' : 'OVER';
  if (verdict === 'OVER') over++;
  lines.push([shown, kb.toFixed(1), String(files.size), verdict]);
}
console.log(`First-load JavaScript, gzipped (budget ${BUDGET_KB} KB for driver and jockey pages)`);
console.log(`${'route'.padEnd(38)} ${'KB'.padStart(7)} ${'files'.padStart(5)}  verdict`);
for (const [a, b, c, d] of lines) console.log(`${a.padEnd(38)} ${b.padStart(7)} ${c.padStart(5)}  ${d}`);
if (over) {
  console.error(`${over} route(s) over the budget`);
  process.exit(1);
}
