// A big carrier's data, added in bulk to a database that already holds the demo seed: more
// terminals (the demo's Riverbend grows to `slots` slots), `trailers` trailers with labels and
// valid VINs, and about `handoffs` handoffs over two years with their items, photo metadata,
// findings, cases, holds, yard moves and yard walks. Every name here is invented.
//
// Steps (scripts/bench/bulk/): places in SQL; one streaming pass computing each handoff's keyed
// hash oldest first per trailer (so every chain verifies) and writing handoffs with COPY; item
// rows made set-based from each trailer's all-ok template plus the few changed rows; indexes
// built once; moves and walks with generate_series. Used by scripts/bench/make-big-data.ts (the
// big set) and by the query-plan test (a small set).
import type pg from 'pg';
import { makeBuffers, WORK_TABLES_SQL } from './bulk/buffers';
import { random } from './bulk/copy';
import { handoffPass, type PassTrailer } from './bulk/handoffs';
import { dropIndexes, finishTrailers, insertItems, rebuildIndexes } from './bulk/items';
import { addTerminals, addTrailers } from './bulk/places';
import { addYardHistory, countRows } from './bulk/yard';

// the chain key the app will check these links with (scripts/env.sh sets it)
const CHAIN_KEY = process.env.CHAIN_KEY ?? '';

export type BigDataOptions = {
  /** Total trailers after the run (the demo's are counted). */
  trailers: number;
  /** About this many handoffs are added. */
  handoffs: number;
  /** Slots at the largest terminal (the demo's Riverbend). */
  slots: number;
  /** Terminals after the run (the demo's two are counted). */
  terminals: number;
  /** Trailers with a very long history, and how many handoffs each. */
  heavyTrailers: number;
  heavyHandoffs: number;
  /** Share of drops that find new damage (→ photo, finding, case). */
  damageRate?: number;
  /** Days with a yard walk at Riverbend (default: one per 1,500 handoffs, at most 730). */
  walkDays?: number;
  log?: (line: string) => void;
};

export const BIG: BigDataOptions = {
  trailers: 20_000,
  handoffs: 1_000_000,
  slots: 2_000,
  terminals: 10,
  heavyTrailers: 10,
  heavyHandoffs: 3_000,
};

export async function addBigData(client: pg.Client, o: BigDataOptions): Promise<Record<string, number>> {
  const log = o.log ?? (() => {});
  const q = async <T extends pg.QueryResultRow = pg.QueryResultRow>(sql: string, params: unknown[] = []) =>
    (await client.query<T>(sql, params)).rows;
  const rand = random(12);
  const now = Date.now();

  const rvb = await addTerminals(client, o.terminals, o.slots);
  const added = await addTrailers(client, o.trailers);
  log(`terminals, slots, ${added} trailers and labels added`);

  const trailers = (
    await q(
      `SELECT id, unit_number, kind, hinges_per_door, axle_count, tire_layout, fuel_tank_gallons
         FROM trailers t WHERE NOT EXISTS (SELECT 1 FROM handoffs h WHERE h.trailer_id = t.id)
        ORDER BY unit_number`,
    )
  ).map((r, index): PassTrailer => ({
    id: r.id,
    unitNumber: r.unit_number,
    kind: r.kind,
    hingesPerDoor: r.hinges_per_door,
    axleCount: r.axle_count,
    tireLayout: r.tire_layout,
    fuelTankGallons: r.fuel_tank_gallons,
    index,
  }));
  const drivers = (
    await q(`SELECT id, carrier_id, name FROM users WHERE role = 'driver' ORDER BY driver_number`)
  ).map((d) => ({ id: d.id as string, carrierId: d.carrier_id as string, name: d.name as string }));
  const terminals = (await q<{ id: string }>(`SELECT id FROM terminals ORDER BY code`)).map((t) => t.id);
  const [clerk] = await q<{ id: string }>(`SELECT id FROM users WHERE role = 'clerk' LIMIT 1`);
  const [jockey] = await q<{ id: string }>(`SELECT id FROM users WHERE role = 'jockey' LIMIT 1`);

  // which trailers end in a yard, and where: Riverbend filled to 90 %, the others to two thirds
  const finalSpot = new Map<string, { terminalId: string; spotId: string }>();
  let next = 0;
  for (const terminalId of terminals) {
    const rows = await q<{ id: string }>(
      `SELECT s.id FROM yard_spots s WHERE s.terminal_id = $1 AND s.kind = 'slot' AND s.retired_at IS NULL
          AND NOT EXISTS (SELECT 1 FROM trailers x WHERE x.current_spot_id = s.id) ORDER BY s.label`,
      [terminalId],
    );
    const share = terminalId === rvb ? 0.9 : 0.66;
    for (const r of rows.slice(0, Math.floor(rows.length * share)))
      if (next < trailers.length) finalSpot.set(trailers[next++].id, { terminalId, spotId: r.id });
  }

  // handoffs per trailer: a few with a very long history, the rest exponentially spread
  const heavy = Math.min(o.heavyTrailers, trailers.length);
  const heavyEach = Math.min(o.heavyHandoffs, Math.floor(o.handoffs / 4 / Math.max(1, heavy)));
  const mean = Math.max(1, (o.handoffs - heavy * heavyEach) / Math.max(1, trailers.length - heavy));
  const counts = trailers.map((_, i) =>
    i < heavy ? heavyEach : Math.max(1, Math.round(-Math.log(1 - rand() * 0.999) * mean)),
  );

  await client.query(WORK_TABLES_SQL);
  const savedItems = await dropIndexes(client, 'handoff_items');
  const savedHandoffs = await dropIndexes(client, 'handoffs');
  const started = Date.now();
  const secs = () => `${Math.round((Date.now() - started) / 1000)} s`;
  const b = makeBuffers();
  const handoffs = await handoffPass(
    client,
    b,
    {
      trailers,
      counts,
      drivers,
      terminals,
      finalSpot,
      clerkId: clerk.id,
      jockeyId: jockey.id,
      damageRate: o.damageRate ?? 0.012,
      chainKey: CHAIN_KEY,
      rand,
      log,
    },
    now,
  );
  log(`${handoffs} handoffs hashed and copied (${secs()}); making their items in SQL`);
  await rebuildIndexes(client, savedHandoffs, log);
  await q(
    'ANALYZE handoffs; ANALYZE bulk_trailer_shape; ANALYZE bulk_item_template; ANALYZE bulk_item_override',
  );
  log(`handoffs' indexes and keys rebuilt (${secs()})`);
  await insertItems(
    client,
    trailers.map((t) => t.id),
    log,
  );
  log(`items made (${secs()}); building the item table's indexes and constraints`);
  await rebuildIndexes(client, savedItems, log);
  log(`item indexes and keys built (${secs()})`);
  await finishTrailers(client);
  log(`indexes, trailers' state and current condition done (${secs()})`);

  const days = o.walkDays ?? Math.max(1, Math.min(730, Math.round(o.handoffs / 1500)));
  await addYardHistory(client, rvb, jockey.id, days);
  await q('DROP TABLE bulk_trailer_final, bulk_trailer_shape, bulk_item_template, bulk_item_override');
  await q('ANALYZE');
  log(`moves and walks added, analyzed (${secs()})`);
  return countRows(client);
}
