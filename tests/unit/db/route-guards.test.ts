import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { pool } from '@/db';
import { seed } from '@/db/seed';
import { changedTables, rowCounts } from '@/tests/support/row-counts';
import { actor } from './handoff-fixtures';

// Every state-changing route handler goes through route() (lib/server/api.ts), which refuses
// cross-site requests and bodies that are not JSON before anything is read or written. The
// handlers run in-process with a signed-in user; zod, the services and the database are real.
const signedIn = vi.hoisted(() => ({ user: null as unknown }));
vi.mock('@/lib/server/auth', () => ({ currentUser: async () => signedIn.user }));
vi.mock('next/server', () => ({ after: () => undefined }));

type Handler = (req: Request, ctx?: { params: Promise<Record<string, string>> }) => Promise<Response>;
const WRITE_METHODS = ['POST', 'PUT', 'PATCH', 'DELETE'] as const;

function routeFiles(dir = 'app'): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) return routeFiles(path);
    return name === 'route.ts' ? [path] : [];
  });
}

/** `app/api/uploads/[id]/complete/route.ts` → `/api/uploads/<uuid>/complete` and its params. */
function urlOf(file: string) {
  const params: Record<string, string> = {};
  const path = relative('app', file)
    .replace(/\/route\.ts$/, '')
    .split('/')
    .filter((seg) => !/^\(.*\)$/.test(seg))
    .map((seg) => {
      const m = /^\[(\w+)\]$/.exec(seg);
      if (!m) return seg;
      params[m[1]] = randomUUID();
      return params[m[1]];
    })
    .join('/');
  return { url: `http://localhost/${path}`, params };
}

const writeRoutes = routeFiles().flatMap((file) => {
  const source = readFileSync(file, 'utf8');
  return WRITE_METHODS.filter((m) =>
    new RegExp(`export (const|async function|function) ${m}\\b`).test(source),
  ).map((method) => ({ file, method, source }));
});

let before: Record<string, number>;
beforeAll(async () => {
  await seed();
  const d = await actor('D1001');
  // an admin may call every route: only the cross-site and content-type checks can refuse
  signedIn.user = { id: d.id, role: 'admin', carrierId: d.carrierId, terminalId: d.terminalId };
  before = await rowCounts(pool);
});
afterAll(async () => {
  await pool.end();
});

describe('cross-site and non-JSON writes are refused by the one wrapper', () => {
  it('finds the state-changing route handlers, and each is built with route()', () => {
    expect(writeRoutes.length).toBeGreaterThanOrEqual(5);
    for (const { file, method, source } of writeRoutes) {
      expect(source, `${method} in ${file}`).toMatch(new RegExp(`export const ${method} = route\\(`));
    }
  });

  it.each(writeRoutes.map((r) => [r.method, r.file]))(
    '%s %s: cross-site → 403, text/plain → 415',
    async (method, file) => {
      const mod = (await import(`@/${file.replace(/\.ts$/, '')}`)) as Record<string, Handler>;
      const { url, params } = urlOf(file);
      const ctx = { params: Promise.resolve(params) };
      const body = JSON.stringify({ trailerId: randomUUID(), unit: 'R5001', target: 'A-01' });
      const send = (headers: Record<string, string>) =>
        mod[method](new Request(url, { method, body, headers }), ctx);

      // the attack the issue describes: a form on another site posting text/plain
      const csrf = await send({ origin: 'http://evil.example', 'content-type': 'text/plain' });
      expect(csrf.status).toBe(403);
      expect((await csrf.json()).code).toBe('forbidden');
      const fetchSite = await send({ 'sec-fetch-site': 'cross-site', 'content-type': 'application/json' });
      expect(fetchSite.status).toBe(403);
      const sameSiteButText = await send({ origin: 'http://localhost', 'content-type': 'text/plain' });
      expect(sameSiteButText.status).toBe(415);
      const formPost = await send({ 'content-type': 'application/x-www-form-urlencoded' });
      expect(formPost.status).toBe(415);
    },
  );

  it('wrote no row for any refused request', async () => {
    expect(changedTables(before, await rowCounts(pool))).toEqual([]);
  });
});

describe('control characters in query and body fields are a 422 naming the field', () => {
  it('q of GET /api/trailers', async () => {
    const { GET } = (await import('@/app/api/trailers/route')) as unknown as { GET: Handler };
    const res = await GET(new Request('http://localhost/api/trailers?q=R5%00'));
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors).toEqual({ q: ['Remove the special characters from this field.'] });
  });

  it('unit of POST /api/yard/moves, with no move written', async () => {
    const snapshot = await rowCounts(pool);
    const { POST } = (await import('@/app/api/yard/moves/route')) as unknown as { POST: Handler };
    const res = await POST(
      new Request('http://localhost/api/yard/moves', {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ unit: 'R50\u000001', target: 'A-01' }),
      }),
    );
    expect(res.status).toBe(422);
    expect((await res.json()).fieldErrors).toEqual({
      unit: ['Remove the special characters from this field.'],
    });
    expect(changedTables(snapshot, await rowCounts(pool))).toEqual([]);
  });
});
