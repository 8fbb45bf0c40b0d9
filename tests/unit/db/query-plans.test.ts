// No query of the gate, the board, the desk or the trailer file reads a big table from end to end.
// A small version of the big data set (scripts/bench/big-data.ts) is added to this file's
// database and ANALYZEd; the real query functions run while every statement they send is
// recorded; then each statement is EXPLAINed with its own parameters (enable_seqscan untouched)
// and the test fails on any Seq Scan of a table that grows with the carrier's history and holds
// at least MIN_ROWS rows in the generated set (a smaller one is rightly read whole).
// Source for reading plans: PostgreSQL documentation, "Using EXPLAIN" (sequential vs index scans).
import { randomUUID } from 'node:crypto';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pool } from '@/db';
import { getCase, listCaseEvents, listCases } from '@/db/queries/cases';
import { getTrailerFileRows, getTrailerHeader } from '@/db/queries/trailer-file';
import { getTrailerById, getTrailerByUnit } from '@/db/queries/trailer-lookup';
import { getBoard } from '@/db/queries/yard-board';
import { databaseUrl } from '@/db/url';
import { getTrailerCondition } from '@/lib/server/handoffs/condition';
import { verifyTrailerChain } from '@/lib/server/handoffs/chain';
import { submitHandoff } from '@/lib/server/handoffs/submit';
import { validateVin } from '@/lib/engine/identity';
import type { TrailerShape } from '@/lib/trailers/checklist';
import { addBigData } from '@/scripts/bench/big-data';
import { unchangedHandoff } from '@/scripts/bench/unchanged-handoff';

/** Tables that grow with every handoff, case, walk or move: never scanned whole. */
const BIG_TABLES = [
  'handoffs',
  'handoff_items',
  'findings',
  'cases',
  'case_events',
  'holds',
  'photos',
  'yard_moves',
  'walk_scans',
  'trailer_condition',
  'labels',
];

/** Below this many rows a whole-table read is the planner's right choice, not a missing index. */
const MIN_ROWS = 1_000;

type PlanNode = { 'Node Type': string; 'Relation Name'?: string; Plans?: PlanNode[] };
const seqScans = (node: PlanNode): string[] => [
  ...(node['Node Type'] === 'Seq Scan' && BIG_TABLES.includes(node['Relation Name'] ?? '')
    ? [node['Relation Name']!]
    : []),
  ...(node.Plans ?? []).flatMap(seqScans),
];

// every statement the app sends while `recording` names a screen
let recording: string | null = null;
const sent: { screen: string; text: string; values: unknown[] }[] = [];
const originalQuery = pg.Client.prototype.query;

describe('query plans on a generated data set', () => {
  // the generator writes history as the owner does (bulk loads into record tables); the screens' queries
  // below run through the app's own pool and role
  const client = new pg.Client({ connectionString: databaseUrl(undefined, 'owner') });
  let ids: {
    terminalId: string;
    longest: string;
    unit: string;
    caseId: string;
    onRoad: { id: string; trailer: TrailerShape };
    driver: { id: string; carrierId: string; terminalId: string };
  };

  beforeAll(async () => {
    await client.connect();
    await addBigData(client, {
      trailers: 2_000,
      handoffs: 5_000,
      slots: 400,
      terminals: 4,
      heavyTrailers: 2,
      heavyHandoffs: 600,
      damageRate: 0.9,
      walkDays: 40,
    });
    const one = async (sql: string) => (await client.query(sql)).rows[0];
    const longest = await one(
      `SELECT trailer_id FROM handoffs GROUP BY trailer_id ORDER BY count(*) DESC LIMIT 1`,
    );
    const d = await one(`SELECT id, carrier_id, home_terminal_id FROM users WHERE driver_number = 'D1001'`);
    const road = await one(
      `SELECT * FROM trailers t WHERE status = 'on_road'
          AND EXISTS (SELECT 1 FROM handoffs h WHERE h.trailer_id = t.id)
          AND NOT EXISTS (SELECT 1 FROM holds h WHERE h.trailer_id = t.id AND h.released_at IS NULL)
        LIMIT 1`,
    );
    ids = {
      terminalId: d.home_terminal_id,
      longest: longest.trailer_id,
      unit: (await one(`SELECT unit_number FROM trailers WHERE id = '${longest.trailer_id}'`)).unit_number,
      caseId: (await one(`SELECT id FROM cases ORDER BY opened_at DESC LIMIT 1`)).id,
      onRoad: {
        id: road.id,
        trailer: {
          kind: road.kind,
          hingesPerDoor: road.hinges_per_door,
          axleCount: road.axle_count,
          tireLayout: road.tire_layout,
          fuelTankGallons: road.fuel_tank_gallons,
        },
      },
      driver: { id: d.id, carrierId: d.carrier_id, terminalId: d.home_terminal_id },
    };
    pg.Client.prototype.query = function (this: pg.Client, ...args: unknown[]) {
      const [q, v] = args as [string | { text: string; values?: unknown[] }, unknown[] | undefined];
      if (recording && this !== client) {
        const text = typeof q === 'string' ? q : q.text;
        const values = (typeof q === 'string' ? v : (q.values ?? v)) ?? [];
        if (/^\s*(select|with|insert|update|delete)\b/i.test(text))
          sent.push({ screen: recording, text, values });
      }
      return (originalQuery as (...a: unknown[]) => unknown).apply(this, args);
    } as typeof pg.Client.prototype.query;
  }, 120_000);

  afterAll(async () => {
    pg.Client.prototype.query = originalQuery;
    await client.end();
    await pool.end();
  });

  const screen = async (name: string, work: () => Promise<unknown>) => {
    recording = name;
    try {
      await work();
    } finally {
      recording = null;
    }
  };

  it('the generated set is valid: chains verify, VINs carry their check digit', async () => {
    // chains recomputed by the app's own check (lib/server/handoffs/chain.ts) on a sample: the
    // longest history and trailers with a damage record (photo hashes in the chain)
    const { rows } = await client.query(
      `(SELECT $1::uuid AS id) UNION (SELECT DISTINCT trailer_id FROM photos WHERE handoff_id IS NOT NULL LIMIT 3)`,
      [ids.longest],
    );
    expect(rows.length).toBeGreaterThan(1);
    for (const r of rows) expect((await verifyTrailerChain(r.id)).check).toMatchObject({ ok: true });
    // 49 CFR 565.15(c): the check digit in position 9 (validateVin recomputes it)
    const vins = await client.query(`SELECT vin FROM trailers WHERE unit_number LIKE 'B6%' LIMIT 500`);
    expect(vins.rows).toHaveLength(500);
    expect(vins.rows.filter((v) => !validateVin(v.vin).ok)).toEqual([]);
  }, 120_000);

  it('the plan reader does see a sequential scan when there is one', async () => {
    const { rows } = await client.query(`EXPLAIN (FORMAT JSON) SELECT id FROM handoffs WHERE note = $1`, [
      'x',
    ]);
    expect(seqScans((rows[0]['QUERY PLAN'] as { Plan: PlanNode }[])[0].Plan)).toEqual(['handoffs']);
  });

  it('reads every big table through an index', async () => {
    const clerk = { role: 'clerk' as const, carrierId: null };
    await screen('gate: typed lookup', () => getTrailerByUnit(ids.unit.toLowerCase()));
    await screen('gate: lookup by id', () => getTrailerById(ids.longest));
    await screen('gate: last known condition', () => getTrailerCondition(ids.longest, 'driver'));
    await screen('yard: board', () => getBoard(ids.terminalId));
    await screen('desk: queue', async () => {
      const first = await listCases(clerk, { sort: 'oldest', limit: 51 });
      const last = first.at(-1)!;
      await listCases(clerk, { sort: 'oldest', limit: 51, after: { openedAt: last.openedAt, id: last.id } });
    });
    await screen('desk: case', () => Promise.all([getCase(ids.caseId, clerk), listCaseEvents(ids.caseId)]));
    await screen('trailer file', async () => {
      const [, first] = await Promise.all([getTrailerHeader(ids.longest), getTrailerFileRows(ids.longest)]);
      // an older page (keyset on the last handoff shown)
      await getTrailerFileRows(ids.longest, first.next);
    });
    await screen('gate: submit', async () => {
      const result = await submitHandoff(
        unchangedHandoff({
          idempotencyKey: `plan-${randomUUID()}`,
          trailerId: ids.onRoad.id,
          trailer: ids.onRoad.trailer,
          kind: 'drop',
          carrierId: ids.driver.carrierId,
          driverName: 'Dana Okonkwo-Reyes',
        }),
        {
          id: ids.driver.id,
          role: 'driver',
          carrierId: ids.driver.carrierId,
          terminalId: ids.driver.terminalId,
        },
      );
      expect(result.ok).toBe(true);
    });

    // a table of a few pages is rightly read whole (cheaper than an index); judge the grown ones
    const { rows: sizes } = await client.query<{ name: string; n: number }>(
      `SELECT relname AS name, reltuples::int AS n FROM pg_class WHERE relname = ANY($1) AND relkind = 'r'`,
      [BIG_TABLES],
    );
    const grown = sizes.filter((t) => t.n >= MIN_ROWS).map((t) => t.name);
    console.log(`history tables judged (≥ ${MIN_ROWS} rows here): ${grown.join(', ')}`);
    expect(grown).toEqual(
      expect.arrayContaining(['handoffs', 'handoff_items', 'findings', 'cases', 'photos']),
    );
    const screens = new Set(sent.map((s) => s.screen));
    expect(screens.size).toBe(8);
    const offenders: string[] = [];
    for (const s of sent) {
      const { rows } = await client.query(`EXPLAIN (FORMAT JSON) ${s.text}`, s.values);
      const plan = (rows[0]['QUERY PLAN'] as { Plan: PlanNode }[])[0].Plan;
      for (const table of seqScans(plan).filter((t) => grown.includes(t)))
        offenders.push(`${s.screen}: Seq Scan on ${table} in\n  ${s.text.slice(0, 300)}`);
    }
    console.log(`${sent.length} statements of ${screens.size} screens explained`);
    expect(offenders).toEqual([]);
  }, 60_000);
});
