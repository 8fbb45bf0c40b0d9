import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ACTIONS, CELLS, PAGES, ROUTES, VISITORS } from '@/tests/support/access-matrix';

// The access matrix must name every page, route handler and server action the app has: a new one
// without a row fails here, so nobody adds a door without saying who may open it.
function files(dir: string, match: (name: string) => boolean): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return files(path, match);
    return match(name) ? [path] : [];
  });
}

const pages = files('app', (n) => n === 'page.tsx');
const routes = files('app', (n) => n === 'route.ts').flatMap((file) => {
  const src = readFileSync(file, 'utf8');
  return [
    ...src.matchAll(/export (?:const|async function|function) (GET|POST|PUT|PATCH|DELETE|HEAD|OPTIONS)\b/g),
  ].map((m) => `${m[1]} ${file}`);
});
const actions = files('app', (n) => /\.tsx?$/.test(n)).flatMap((file) => {
  const src = readFileSync(file, 'utf8');
  if (!/^['"]use server['"];?/m.test(src.trimStart().split('\n')[0] ?? '')) return [];
  return [...src.matchAll(/export (?:const|async function|function) (\w+)/g)].map((m) => `${file}#${m[1]}`);
});

describe('the access matrix covers the file tree', () => {
  it('found the pages, route handlers and actions it checks', () => {
    expect(pages.length).toBeGreaterThanOrEqual(20);
    expect(routes.length).toBeGreaterThanOrEqual(15);
    expect(actions.length).toBeGreaterThanOrEqual(20);
  });

  it('every page.tsx has at least one row, and every row names a page that exists', () => {
    const rows = new Set(PAGES.map((p) => p.file));
    expect(pages.filter((p) => !rows.has(p))).toEqual([]);
    expect([...rows].filter((r) => !pages.includes(r))).toEqual([]);
  });

  it('every exported route handler method has a row, and no row is stale', () => {
    const rows = ROUTES.map((r) => `${r.method} ${r.file}`);
    expect(routes.filter((r) => !rows.includes(r))).toEqual([]);
    expect(rows.filter((r) => !routes.includes(r))).toEqual([]);
  });

  it('every exported server action has a row, and no row is stale', () => {
    const rows = ACTIONS.map((a) => `${a.file}#${a.name}`);
    expect(actions.filter((a) => !rows.includes(a))).toEqual([]);
    expect(rows.filter((r) => !actions.includes(r))).toEqual([]);
  });

  it('every row has an answer for each of the six visitors', () => {
    for (const row of [...PAGES, ...ROUTES, ...ACTIONS]) {
      expect(Object.keys(row.expect).sort(), row.file).toEqual([...VISITORS].sort());
    }
    console.log(
      `access matrix: ${CELLS.pages} page cells, ${CELLS.routes} route cells, ${CELLS.actions} action cells`,
    );
  });
});
