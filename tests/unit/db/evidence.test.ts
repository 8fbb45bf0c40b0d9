// The tamper half of the trust suite: someone with the app's database role, or with the owner's
// role but without CHAIN_KEY, tries to hide, replace or forge a record. Each attempt must be
// refused by the database or detected by the chain check and the public verify page. Also the
// retry and concurrency rules of the submit (reused draft key, twenty drops at once).
import { randomUUID } from 'node:crypto';
import { eq, inArray } from 'drizzle-orm';
import { NextIntlClientProvider } from 'next-intl';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { handoffs, trailers, yardRows, yardSpots } from '@/db/schema';
import { seed } from '@/db/seed';
import { MESSAGES } from '@/lib/i18n/messages';
import { canonicalJson, sha256Hex } from '@/lib/handoffs/hash';
import { verifyTrailerChain } from '@/lib/server/handoffs/chain';
import { actor, allOk, freshTrailer, submitInput } from './handoff-fixtures';
import { asOwner } from './owner-connection';

const signedIn = vi.hoisted(() => ({ user: null as unknown }));
vi.mock('@/lib/server/auth', () => ({ currentUser: async () => signedIn.user }));
vi.mock('next/server', () => ({ after: () => undefined }));
const { POST } = await import('@/app/api/handoffs/route');
const { GET: verifyApi } = await import('@/app/api/verify/[code]/route');
const { default: VerifyPage } = await import('@/app/verify/page');

// SQLSTATE 42501 insufficient_privilege (PostgreSQL manual, Appendix A "PostgreSQL Error Codes")
const DENIED = '42501';
const RECORD_TABLES = ['handoffs', 'handoff_items', 'audit_log', 'case_events', 'findings'];

type Driver = Awaited<ReturnType<typeof actor>>;
const signIn = (d: Driver) => {
  signedIn.user = { id: d.id, role: 'driver', carrierId: d.carrierId, terminalId: d.terminalId };
};
const post = (body: unknown) =>
  POST(
    new Request('http://localhost/api/handoffs', {
      method: 'POST',
      body: JSON.stringify(body),
      headers: { 'content-type': 'application/json' },
    }),
  );
const verify = async (code: string) => {
  const res = await verifyApi(new Request(`http://localhost/api/verify/${code}`), {
    params: Promise.resolve({ code }),
  });
  return { status: res.status, body: await res.json() };
};
// the page's shared components read their words from the provider the root layout gives them
const verifyPageHtml = async (code: string) => {
  const page = await VerifyPage({ searchParams: Promise.resolve({ code }) } as never);
  const provider = { locale: 'en', messages: MESSAGES.en, timeZone: 'UTC', children: page };
  return renderToStaticMarkup(createElement(NextIntlClientProvider, provider));
};

/** A drop of a fresh trailer through the real route; its id, code and trailer. */
async function drop(d: Driver) {
  const { trailer, checklist } = await freshTrailer();
  signIn(d);
  const res = await post(submitInput(trailer.id, d.carrierId!, 'drop', allOk(checklist), new Date()));
  expect(res.status).toBe(201);
  const { handoff } = await res.json();
  return { id: handoff.id as string, code: handoff.verificationCode as string, trailer };
}

describe('evidence that holds up (real database, app role and owner role)', () => {
  let d1: Driver;
  beforeAll(async () => {
    await seed();
    d1 = await actor('D1001');
  });
  afterAll(async () => {
    await pool.end();
  });

  it('the app connects as hitchmark_app, not as the owner of the tables', async () => {
    const { rows } = await pool.query<{ who: string; owner: string }>(
      "select current_user as who, tableowner as owner from pg_tables where tablename = 'handoffs'",
    );
    expect(rows[0]).toEqual({ who: 'hitchmark_app', owner: 'hitchmark' });
  });

  it('as the app role, TRUNCATE, UPDATE, DELETE and DISABLE TRIGGER on record tables all fail with 42501', async () => {
    const attempts: string[] = [];
    for (const table of RECORD_TABLES) {
      attempts.push(
        `truncate ${table} cascade`,
        `update ${table} set created_at = created_at`,
        `delete from ${table}`,
        `alter table ${table} disable trigger all`,
      );
    }
    const outcomes = [];
    for (const sql of attempts) {
      const client = await pool.connect();
      try {
        await client.query(sql);
        outcomes.push({ sql, code: 'allowed' });
      } catch (e) {
        outcomes.push({ sql, code: (e as { code?: string }).code });
      } finally {
        client.release();
      }
    }
    expect(outcomes).toEqual(attempts.map((sql) => ({ sql, code: DENIED })));
    console.log(
      `[tamper] ${attempts.length} write attempts on record tables as the app role: all refused (42501)`,
    );
    // and the rows are still there
    const [{ n }] = (await pool.query<{ n: string }>('select count(*) as n from handoffs')).rows;
    expect(Number(n)).toBeGreaterThan(0);
  });

  it('the app role still does its everyday work: inserts records, updates working tables', async () => {
    const { id, trailer } = await drop(d1);
    const [t] = await db.select().from(trailers).where(eq(trailers.id, trailer.id));
    expect(t.status).toBe('in_yard');
    expect((await verifyTrailerChain(trailer.id)).check).toEqual({ ok: true, count: 1 });
    const [h] = await db.select().from(handoffs).where(eq(handoffs.id, id));
    expect(h.hashVersion).toBe(3); // keyed, with the perishable answer in the hashed content
  });

  it('an edited row (owner, trigger disabled) is detected: /verify says it does not match and shows none of the new values', async () => {
    const { id, code, trailer } = await drop(d1);
    const before = await verify(code);
    expect(before.status).toBe(200);
    expect(before.body.status).toBe('genuine');
    expect(before.body.receipt.driverName).toBe('Test Driver');
    expect(await verifyPageHtml(code)).toContain('This receipt is genuine');

    await asOwner(async (owner) => {
      await owner.query('begin');
      await owner.query('alter table handoffs disable trigger handoffs_append_only');
      await owner.query("update handoffs set driver_name = 'Forged Name', is_loaded = true where id = $1", [
        id,
      ]);
      await owner.query('alter table handoffs enable trigger handoffs_append_only');
      await owner.query('commit');
    });

    const after = await verify(code);
    expect(after.status).toBe(200);
    expect(after.body.status).toBe('altered');
    expect(after.body.message).toMatch(/^This record does not match what was receipted\./);
    expect(JSON.stringify(after.body)).not.toContain('Forged Name');
    const html = await verifyPageHtml(code);
    expect(html).toContain('This record does not match what was receipted.');
    expect(html).not.toContain('This receipt is genuine');
    expect(html).not.toContain('Forged Name');
    const chain = await verifyTrailerChain(trailer.id);
    expect(chain.check).toEqual({ ok: false, brokenAt: id, why: 'content_changed' });
  });

  it("a chain rewritten by the owner with the app's old unkeyed hash is detected, also when marked as an old link", async () => {
    // two records, so the rewrite has to re-link the second to the edited first
    const first = await drop(d1);
    signIn(d1);
    const checklist = await trailerChecklist(first.trailer.id);
    const hook = await post(
      submitInput(first.trailer.id, d1.carrierId!, 'hook', allOk(checklist!), new Date()),
    );
    expect(hook.status).toBe(201);
    const second = (await hook.json()).handoff as { id: string; verificationCode: string };

    // the attacker edits the first, then recomputes every link with plain SHA-256 (no key)
    const { listChainRecords } = await import('@/db/queries/handoff-chain');
    const { hashableFromRows } = await import('@/lib/handoffs/canonical');
    const { unkeyedContentHash } = await import('@/lib/handoffs/hash');
    const rewrite = async (hashVersion: number) => {
      const records = await listChainRecords(first.trailer.id);
      let prev: string | null = null;
      await asOwner(async (owner) => {
        await owner.query('begin');
        await owner.query('alter table handoffs disable trigger handoffs_append_only');
        for (const r of records) {
          const row = {
            ...r.row,
            prevHash: prev,
            sealNumber: r.row.id === first.id ? 'FORGED-1' : r.row.sealNumber,
          };
          const hash = unkeyedContentHash(hashableFromRows(row, r.items, [], hashVersion));
          await owner.query(
            'update handoffs set seal_number = $2, prev_hash = $3, content_hash = $4, hash_version = $5 where id = $1',
            [r.row.id, row.sealNumber, prev, hash, hashVersion],
          );
          prev = hash;
        }
        await owner.query('alter table handoffs enable trigger handoffs_append_only');
        await owner.query('commit');
      });
    };

    await rewrite(2);
    expect((await verifyTrailerChain(first.trailer.id)).check).toEqual({
      ok: false,
      brokenAt: first.id,
      why: 'content_changed',
    });
    expect((await verify(second.verificationCode)).body.status).toBe('earlier_broken');

    await rewrite(1);
    expect((await verifyTrailerChain(first.trailer.id)).check).toEqual({
      ok: false,
      brokenAt: first.id,
      why: 'unkeyed',
    });
    const v = await verify(first.code);
    expect(v.body.status).toBe('unkeyed');
    expect(v.body.message).toMatch(/^This record does not match what was receipted\./);
    expect(JSON.stringify(v.body)).not.toContain('FORGED-1');
  });

  it('the same draft key with a different body is a 409; the same body again is the original (200)', async () => {
    const { trailer, checklist } = await freshTrailer();
    signIn(d1);
    const body = submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), new Date());
    const first = await post(body);
    expect(first.status).toBe(201);
    const original = (await first.json()).handoff;

    const changed = await post({ ...body, isLoaded: true, sealNumber: 'SL-404' });
    expect(changed.status).toBe(409);
    expect((await changed.json()).message).toMatch(/already used for a handoff with different content/);

    const same = await post(body);
    expect(same.status).toBe(200);
    expect((await same.json()).handoff).toEqual(original);
    const rows = await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id));
    expect(rows).toHaveLength(1);
    expect(rows[0].isLoaded).toBe(false);
    // the stored fingerprint is the SHA-256 of the parsed body's canonical JSON
    expect(rows[0].requestHash).toBe(sha256Hex(canonicalJson(body)));
  });

  it('twenty drops at once at one terminal all succeed, on twenty distinct slots, with no 500', async () => {
    // room for all twenty, so "yard full" cannot hide a collision: a new row of 20 empty slots
    const [row] = await db
      .insert(yardRows)
      .values({ terminalId: d1.terminalId!, name: 'Burst row', sortOrder: -1 })
      .returning({ id: yardRows.id });
    await db.insert(yardSpots).values(
      Array.from({ length: 20 }, (_, i) => ({
        terminalId: d1.terminalId!,
        rowId: row.id,
        kind: 'slot' as const,
        label: `BURST-${i + 1}`,
        sortOrder: i,
      })),
    );
    const picked = [];
    for (let i = 0; i < 20; i++) picked.push(await freshTrailer());
    signIn(d1);
    const responses = await Promise.all(
      picked.map(({ trailer, checklist }) =>
        post(
          submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), new Date(), {
            idempotencyKey: `burst-${randomUUID()}`,
          }),
        ),
      ),
    );
    const statuses = responses.map((r) => r.status);
    const refusals = await Promise.all(responses.filter((r) => r.status !== 201).map((r) => r.json()));
    if (refusals.length)
      console.log(
        '[slots] refused:',
        refusals.map((r) => r.message),
      );
    console.log(
      `[slots] 20 concurrent drops: ${statuses.filter((s) => s === 201).length} × 201, ${statuses.filter((s) => s >= 500).length} × 5xx`,
    );
    expect(statuses).toEqual(Array(20).fill(201));
    const rows = await db
      .select({ spot: trailers.currentSpotId, status: trailers.status })
      .from(trailers)
      .where(
        inArray(
          trailers.id,
          picked.map((p) => p.trailer.id),
        ),
      );
    expect(rows.every((r) => r.status === 'in_yard' && r.spot !== null)).toBe(true);
    expect(new Set(rows.map((r) => r.spot)).size).toBe(20);
  });
});

async function trailerChecklist(trailerId: string) {
  const { checklistOf } = await import('@/lib/trailers/checklist');
  const [t] = await db.select().from(trailers).where(eq(trailers.id, trailerId));
  return t ? checklistOf(t) : null;
}
