// A big carrier's data, added in bulk to a database that already holds the demo seed: more
// terminals (the demo's Riverbend grows to `slots` slots), `trailers` trailers with labels, and
// about `handoffs` handoffs over two years with their items, photo metadata, findings, cases,
// holds, yard moves and yard walks. Every name here is invented.
//
// The handoffs are made in one streaming pass, oldest first per trailer, and written with
// PostgreSQL COPY in batches; each handoff's content hash is computed with the app's own
// hashing (lib/handoffs/canonical.ts + hash.ts), so every trailer's chain verifies. Moves and
// walks are made in SQL with generate_series. Used by scripts/bench/make-big-data.ts (the
// big set) and by the query-plan test (a small set).
import { randomUUID } from 'node:crypto';
import type pg from 'pg';
import { from as copyFrom } from 'pg-copy-streams';
import { pipeline } from 'node:stream/promises';
import { Readable } from 'node:stream';
import { allOkObservations } from '@/lib/handoffs/all-ok';
import { hashableFromRows, type HandoffHashRow } from '@/lib/handoffs/canonical';
import { handoffContentHash, WRITTEN_HASH_VERSION } from '@/lib/handoffs/hash';
import { normalizeItems, type ItemRowInput } from '@/lib/handoffs/items';
import { CROCKFORD } from '@/lib/handoffs/verification-code';
import { checklistOf, type TrailerShape } from '@/lib/trailers/checklist';

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

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const TWO_YEARS = 730 * DAY;

/** Invented terminal names; none is a real business. */
const EXTRA_TERMINALS = [
  ['CDH', 'Cinderhollow terminal', 'America/New_York'],
  ['LWM', 'Larkwater Mills terminal', 'America/Chicago'],
  ['QNF', 'Quillan Flats terminal', 'America/Denver'],
  ['BRN', 'Brenneck Crossing terminal', 'America/Los_Angeles'],
  ['TSV', 'Tessavale terminal', 'America/Chicago'],
  ['OKR', 'Oakrune Junction terminal', 'America/New_York'],
  ['MRV', 'Marrowvale terminal', 'America/Phoenix'],
  ['GLS', 'Glassford Sidings terminal', 'America/Chicago'],
] as const;

const DAMAGE_KEYS = [
  ['left_side.skin', 'Skin dented behind the landing gear; no insulation showing.'],
  ['rear.door_right.hinge_2', 'Hinge bent; door closes but not flush.'],
  ['interior.floor', 'Floor board cracked near the nose.'],
  ['right_side.side_skirt', 'Side skirt torn loose at one bracket.'],
] as const;

/** Deterministic pseudo-random numbers (mulberry32), so two runs make the same shapes. */
function random(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A unique 8-character Crockford code per sequence number (an odd multiplier mod 2^40 is a bijection). */
function codeFor(seq: number): string {
  let v = (BigInt(seq) * 0x9e3779b97fn + 0x5bd1e995n) & 0xffffffffffn;
  let out = '';
  for (let i = 0; i < 8; i++) {
    out = CROCKFORD[Number(v & 31n)] + out;
    v >>= 5n;
  }
  return out;
}

/** One value in PostgreSQL's COPY text format. */
function cell(v: unknown): string {
  if (v === null || v === undefined) return '\\N';
  if (v instanceof Date) return v.toISOString();
  const s = typeof v === 'object' ? JSON.stringify(v) : String(v);
  return s.replace(/\\/g, '\\\\').replace(/\t/g, '\\t').replace(/\n/g, '\\n').replace(/\r/g, '\\r');
}
const line = (values: unknown[]) => values.map(cell).join('\t') + '\n';

class CopyBuffer {
  lines: string[] = [];
  constructor(
    readonly table: string,
    readonly columns: string[],
  ) {}
  push(values: unknown[]) {
    this.lines.push(line(values));
  }
  async flush(client: pg.Client) {
    if (!this.lines.length) return 0;
    const n = this.lines.length;
    const chunks = this.lines;
    this.lines = [];
    const sql = `COPY ${this.table} (${this.columns.join(', ')}) FROM STDIN`;
    await pipeline(Readable.from(chunkJoin(chunks)), client.query(copyFrom(sql)));
    return n;
  }
}

function* chunkJoin(lines: string[]) {
  for (let i = 0; i < lines.length; i += 2000) yield lines.slice(i, i + 2000).join('');
}

type Trailer = TrailerShape & { id: string; unitNumber: string; index: number };
type Actor = { id: string; carrierId: string; name: string };

export async function addBigData(client: pg.Client, o: BigDataOptions): Promise<Record<string, number>> {
  const log = o.log ?? (() => {});
  const q = async <T extends pg.QueryResultRow = pg.QueryResultRow>(sql: string, params: unknown[] = []) =>
    (await client.query<T>(sql, params)).rows;
  const rand = random(12);
  const now = Date.now();

  // 1. terminals, their policies, rows and slots; Riverbend grows to `slots` slots
  const [rvb] = await q<{ id: string }>(`SELECT id FROM terminals WHERE code = 'RVB'`);
  for (const [code, name, zone] of EXTRA_TERMINALS.slice(0, Math.max(0, o.terminals - 2))) {
    await q(
      `INSERT INTO terminals (code, name, time_zone) VALUES ($1, $2, $3) ON CONFLICT (code) DO NOTHING`,
      [code, name, zone],
    );
    await q(
      `INSERT INTO policies (terminal_id, data)
       SELECT t.id, p.data FROM terminals t, policies p WHERE t.code = $1 AND p.terminal_id = $2
       ON CONFLICT DO NOTHING`,
      [code, rvb.id],
    );
    await addSlots(client, code, 6, 25);
  }
  const [{ n: rvbSlots }] = await q<{ n: number }>(
    `SELECT count(*)::int AS n FROM yard_spots WHERE terminal_id = $1 AND kind = 'slot'`,
    [rvb.id],
  );
  if (rvbSlots < o.slots) await addSlots(client, 'RVB', Math.ceil((o.slots - rvbSlots) / 25), 25, 'X');

  // 2. trailers and their labels (unit numbers B600001…, invented VIN-shaped serials)
  const [{ n: had }] = await q<{ n: number }>(`SELECT count(*)::int AS n FROM trailers`);
  const add = Math.max(0, o.trailers - had);
  await q(
    `INSERT INTO trailers (unit_number, vin, plate, plate_state, kind, owner_carrier_id, fuel_tank_gallons,
                           hinges_per_door, axle_count, tire_layout)
     SELECT 'B' || (600000 + g), '1B9BK' || lpad(g::text, 12, '0'), 'BK' || lpad(g::text, 6, '0'),
            (ARRAY['IL','MO','CO','KS','NE'])[1 + g % 5],
            (CASE WHEN g % 10 = 9 THEN 'dry_van' ELSE 'reefer' END)::trailer_kind,
            (SELECT id FROM carriers WHERE scac = CASE WHEN g % 15 = 0 THEN 'OSFW' ELSE 'BRCL' END),
            CASE WHEN g % 10 = 9 THEN 0 ELSE 50 END, CASE WHEN g % 4 = 0 THEN 5 ELSE 4 END,
            2, (CASE WHEN g % 7 = 0 THEN 'wide_single' ELSE 'dual' END)::tire_layout
       FROM generate_series(1, $1::int) g`,
    [add],
  );
  await q(`INSERT INTO labels (trailer_id) SELECT t.id FROM trailers t
            WHERE NOT EXISTS (SELECT 1 FROM labels l WHERE l.trailer_id = t.id)`);
  log(`terminals, slots, ${add} trailers and labels added`);

  // 3. handoffs, streamed oldest first per trailer
  const trailers = (
    await q<{
      id: string;
      unit_number: string;
      kind: 'reefer' | 'dry_van';
      hinges_per_door: number;
      axle_count: number;
      tire_layout: 'dual' | 'wide_single';
      fuel_tank_gallons: number;
    }>(
      `SELECT id, unit_number, kind, hinges_per_door, axle_count, tire_layout, fuel_tank_gallons
         FROM trailers t WHERE NOT EXISTS (SELECT 1 FROM handoffs h WHERE h.trailer_id = t.id)
        ORDER BY unit_number`,
    )
  ).map((r, index): Trailer => ({
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
    await q<{ id: string; carrier_id: string; name: string }>(
      `SELECT id, carrier_id, name FROM users WHERE role = 'driver' ORDER BY driver_number`,
    )
  ).map((d): Actor => ({ id: d.id, carrierId: d.carrier_id, name: d.name }));
  const terminals = await q<{ id: string; code: string }>(`SELECT id, code FROM terminals ORDER BY code`);
  const [clerk] = await q<{ id: string }>(`SELECT id FROM users WHERE role = 'clerk' LIMIT 1`);
  const [jockey] = await q<{ id: string }>(`SELECT id FROM users WHERE role = 'jockey' LIMIT 1`);
  // free slots per terminal: Riverbend is filled to 90 %, the others to about two thirds
  const free = new Map<string, string[]>();
  for (const t of terminals) {
    const rows = await q<{ id: string }>(
      `SELECT s.id FROM yard_spots s WHERE s.terminal_id = $1 AND s.kind = 'slot' AND s.retired_at IS NULL
          AND NOT EXISTS (SELECT 1 FROM trailers x WHERE x.current_spot_id = s.id) ORDER BY s.label`,
      [t.id],
    );
    const share = t.id === rvb.id ? 0.9 : 0.66;
    free.set(
      t.id,
      rows.slice(0, Math.floor(rows.length * share)).map((r) => r.id),
    );
  }
  // which trailers end in a yard, and where
  const finalSpot = new Map<string, { terminalId: string; spotId: string }>();
  let next = 0;
  for (const t of terminals)
    for (const spotId of free.get(t.id)!)
      if (next < trailers.length) finalSpot.set(trailers[next++].id, { terminalId: t.id, spotId });

  // handoffs per trailer: a few with a very long history, the rest exponentially spread
  const heavy = Math.min(o.heavyTrailers, trailers.length);
  const heavyEach = Math.min(o.heavyHandoffs, Math.floor(o.handoffs / 4 / Math.max(1, heavy)));
  const rest = Math.max(1, trailers.length - heavy);
  const mean = Math.max(1, (o.handoffs - heavy * heavyEach) / rest);
  const counts = trailers.map((t, i) =>
    i < heavy ? heavyEach : Math.max(1, Math.round(-Math.log(1 - rand() * 0.999) * mean)),
  );

  const H = new CopyBuffer('handoffs', [
    'id',
    'trailer_id',
    'terminal_id',
    'kind',
    'level',
    'carrier_id',
    'driver_id',
    'driver_name',
    'tractor_number',
    'recorded_by_id',
    'is_loaded',
    'seal_number',
    'fuel_eighths',
    'is_reefer_on',
    'setpoint_tenths_f',
    'return_air_tenths_f',
    'engine_hours_tenths',
    'pretrip_result',
    'pretrip_at',
    'note',
    'occurred_at',
    'idempotency_key',
    'corrects_handoff_id',
    'verification_code',
    'prev_hash',
    'content_hash',
    'hash_version',
    'created_at',
  ]);
  const I = new CopyBuffer('handoff_items', [
    'handoff_id',
    'item_key',
    'condition',
    'tread_thirty_seconds',
    'is_holding_air',
    'details',
    'note',
    'created_at',
  ]);
  const P = new CopyBuffer('photos', [
    'id',
    'object_key',
    'uploaded_by_id',
    'trailer_id',
    'handoff_id',
    'item_key',
    'status',
    'content_type',
    'byte_size',
    'sha256',
    'created_at',
  ]);
  const C = new CopyBuffer('cases', [
    'id',
    'handoff_id',
    'trailer_id',
    'terminal_id',
    'proposed_carrier_id',
    'state',
    'estimate_cents',
    'decision',
    'charged_cents',
    'decision_reason',
    'dispute_deadline',
    'opened_at',
    'updated_at',
    'created_at',
  ]);
  const E = new CopyBuffer('case_events', [
    'case_id',
    'kind',
    'from_state',
    'to_state',
    'actor_id',
    'note',
    'created_at',
  ]);
  const F = new CopyBuffer('findings', [
    'handoff_id',
    'trailer_id',
    'item_key',
    'kind',
    'condition',
    'previous_condition',
    'previous_handoff_id',
    'responsible_carrier_id',
    'responsible_party',
    'confidence',
    'candidates',
    'reason',
    'case_id',
    'created_at',
  ]);
  const HO = new CopyBuffer('holds', [
    'trailer_id',
    'handoff_id',
    'severity',
    'rule_key',
    'item_key',
    'reason',
    'source',
    'placed_by_id',
    'placed_at',
    'released_at',
    'released_by_id',
    'repair_note',
    'repaired_by',
    'created_at',
  ]);
  const T = new CopyBuffer('bulk_trailer_final', [
    'trailer_id',
    'status',
    'terminal_id',
    'spot_id',
    'is_loaded',
    'fuel_eighths',
    'is_reefer_on',
    'setpoint_tenths_f',
    'gate_in_at',
    'last_seen_at',
  ]);
  await q(`CREATE TEMP TABLE bulk_trailer_final (trailer_id uuid, status trailer_status, terminal_id uuid,
             spot_id uuid, is_loaded boolean, fuel_eighths int, is_reefer_on boolean, setpoint_tenths_f int,
             gate_in_at timestamptz, last_seen_at timestamptz)`);
  // the item table's indexes (as db/tables/gate.ts declares them) are built once after the load:
  // far faster than 70 index updates per handoff. IF EXISTS: an interrupted run may have dropped them.
  await q(`ALTER TABLE handoff_items DROP CONSTRAINT IF EXISTS handoff_items_pkey`);
  await q(`DROP INDEX IF EXISTS handoff_items_handoff_item`);
  await q(`DROP INDEX IF EXISTS handoff_items_item`);
  const totals: Record<string, number> = {};
  const flush = async () => {
    for (const b of [H, I, P, C, E, F, HO, T])
      totals[b.table] = (totals[b.table] ?? 0) + (await b.flush(client));
  };

  const itemsByShape = new Map<string, ItemRowInput[]>();
  let seq = 0;
  let pending = 0;
  let logged = 0;
  const started = Date.now();
  for (const t of trailers) {
    const shape = `${t.kind}/${t.hingesPerDoor}/${t.axleCount}/${t.tireLayout}/${t.fuelTankGallons}`;
    let okRows = itemsByShape.get(shape);
    if (!okRows) {
      const checklist = checklistOf(t);
      okRows = normalizeItems(
        checklist,
        allOkObservations(checklist, (key) => 8 + (key.length % 5)),
      ).rows;
      itemsByShape.set(shape, okRows);
    }
    const n = counts[t.index];
    const final = finalSpot.get(t.id);
    const endsInYard = Boolean(final);
    const end = now - (1 + rand() * (endsInYard ? 140 : 100)) * HOUR;
    const step = Math.min(TWO_YEARS / n, 10 * DAY);
    const isReefer = t.kind === 'reefer';
    const home = terminals[t.index % terminals.length].id;
    let prevHash: string | null = null;
    let prevId: string | null = null;
    let openHold: { at: number } | null = null;
    let terminalId = home;
    for (let k = 0; k < n; k++) {
      const isDrop = (n - 1 - k) % 2 === 0 ? endsInYard : !endsInYard;
      const kind = isDrop ? 'drop' : 'hook';
      const at = new Date(end - (n - 1 - k) * step + (k < n - 1 ? Math.floor(rand() * step * 0.3) : 0));
      const trip = Math.floor((k + (isDrop ? 1 : 0)) / 2);
      const driver = drivers[(t.index * 7 + trip * 3) % 5 === 0 ? 4 + (trip % 4) : (t.index + trip) % 4];
      if (isDrop)
        terminalId =
          k === n - 1 && final
            ? final.terminalId
            : rand() < 0.7
              ? home
              : terminals[Math.floor(rand() * terminals.length)].id;
      const id = randomUUID();
      seq++;
      const loaded = rand() < 0.55;
      const row: HandoffHashRow = {
        id,
        trailerId: t.id,
        terminalId,
        kind,
        level: 'full',
        carrierId: driver.carrierId,
        driverId: driver.id,
        driverName: driver.name,
        tractorNumber: `T${4100 + ((seq * 13) % 900)}`,
        recordedById: driver.id,
        isLoaded: loaded,
        sealNumber: loaded ? `SL${100000 + (seq % 899999)}` : null,
        fuelEighths: isReefer ? 2 + Math.floor(rand() * 7) : null,
        isReeferOn: isReefer ? loaded : null,
        setpointTenthsF: isReefer && loaded ? [340, -100, 0, 350][seq % 4] : null,
        returnAirTenthsF: isReefer && loaded ? [352, -92, 11, 361][seq % 4] : null,
        engineHoursTenths: isReefer ? 40000 + k * 60 : null,
        pretripResult: isReefer ? 'pass' : null,
        pretripAt: isReefer ? new Date(at.getTime() - 2 * HOUR) : null,
        note: null,
        occurredAt: at,
        correctsHandoffId: null,
        verificationCode: codeFor(seq),
        prevHash,
      };
      // now and then a drop brings new damage (→ photo, finding, case) or a pin not engaged (→ hold)
      let items = okRows;
      const shas: string[] = [];
      const r = rand();
      const damage =
        isDrop && k > 0 && r < (o.damageRate ?? 0.012) ? DAMAGE_KEYS[seq % DAMAGE_KEYS.length] : null;
      const pin =
        isDrop && !damage && r > 1 - (o.damageRate ?? 0.012) / 2
          ? 'undercarriage.tandem_pin.right_rear'
          : null;
      if (damage && okRows.some((i) => i.itemKey === damage[0])) {
        items = okRows.map((i) =>
          i.itemKey === damage[0] ? { ...i, condition: 'damaged' as const, note: damage[1] } : i,
        );
        const sha = randomUUID().replace(/-/g, '') + randomUUID().replace(/-/g, '');
        shas.push(sha);
        const photoId = randomUUID();
        P.push([
          photoId,
          `handoffs/${t.id}/${photoId}.jpg`,
          driver.id,
          t.id,
          id,
          damage[0],
          'stored',
          'image/jpeg',
          180_000 + (seq % 90_000),
          sha,
          at,
        ]);
        const caseId = randomUUID();
        const age = now - at.getTime();
        const state =
          age > 60 * DAY
            ? rand() < 0.7
              ? 'closed'
              : 'decided'
            : (['open', 'notified', 'disputed', 'decided'] as const)[seq % 4];
        const decided = state === 'closed' || state === 'decided';
        C.push([
          caseId,
          id,
          t.id,
          terminalId,
          driver.carrierId,
          state,
          85_000,
          decided ? 'charge' : null,
          decided ? 85_000 : null,
          decided ? 'Damage found at the drop; the carrier held the trailer.' : null,
          state === 'open' ? null : new Date(at.getTime() + 14 * DAY),
          at,
          new Date(at.getTime() + (decided ? 10 : 1) * DAY),
          at,
        ]);
        E.push([caseId, 'opened', null, 'open', driver.id, `Opened by the drop of ${t.unitNumber}.`, at]);
        if (state !== 'open')
          E.push([caseId, 'notified', 'open', 'notified', clerk.id, null, new Date(at.getTime() + HOUR)]);
        F.push([
          id,
          t.id,
          damage[0],
          'new',
          'damaged',
          'ok',
          prevId,
          driver.carrierId,
          driver.name,
          'high',
          [],
          `${damage[0]}: ok at the previous handoff, damaged at this drop.`,
          caseId,
          at,
        ]);
      } else if (pin && okRows.some((i) => i.itemKey === pin)) {
        items = okRows.map((i) => (i.itemKey === pin ? { ...i, details: { isEngaged: false } } : i));
        F.push([
          id,
          t.id,
          pin,
          'pin_not_engaged',
          'ok',
          null,
          null,
          null,
          null,
          null,
          null,
          'Tandem locking pin, right rear is not engaged.',
          null,
          at,
        ]);
        openHold = { at: at.getTime() };
        HO.push([
          t.id,
          id,
          'out_of_service',
          'pin_not_engaged',
          pin,
          'Tandem locking pin, right rear is not engaged.',
          '49 CFR 393.207(b)',
          driver.id,
          at,
          k === n - 1 ? null : new Date(at.getTime() + HOUR),
          k === n - 1 ? null : jockey.id,
          k === n - 1 ? null : 'Pin engaged and checked.',
          k === n - 1 ? null : 'Yard mechanic',
          at,
        ]);
      }
      if (openHold && k < n - 1) openHold = null;
      const contentHash = handoffContentHash(
        hashableFromRows(row, items, shas, WRITTEN_HASH_VERSION),
        CHAIN_KEY,
      );
      H.push([
        id,
        t.id,
        terminalId,
        kind,
        'full',
        row.carrierId,
        row.driverId,
        row.driverName,
        row.tractorNumber,
        row.recordedById,
        row.isLoaded,
        row.sealNumber,
        row.fuelEighths,
        row.isReeferOn,
        row.setpointTenthsF,
        row.returnAirTenthsF,
        row.engineHoursTenths,
        row.pretripResult,
        row.pretripAt,
        null,
        at,
        `bulk-${id}`,
        null,
        row.verificationCode,
        prevHash,
        contentHash,
        WRITTEN_HASH_VERSION,
        at,
      ]);
      for (const i of items)
        I.push([id, i.itemKey, i.condition, i.treadThirtySeconds, i.isHoldingAir, i.details, i.note, at]);
      prevHash = contentHash;
      prevId = id;
      pending++;
      if (k === n - 1)
        T.push([
          t.id,
          isDrop ? 'in_yard' : 'on_road',
          isDrop ? terminalId : null,
          isDrop ? (final?.spotId ?? null) : null,
          row.isLoaded,
          row.fuelEighths,
          row.isReeferOn,
          row.setpointTenthsF,
          isDrop ? at : null,
          at,
        ]);
    }
    if (pending >= 2_000) {
      await flush();
      pending = 0;
      if (totals.handoffs - logged >= 25_000) {
        logged = totals.handoffs;
        log(`${totals.handoffs} handoffs (${Math.round((Date.now() - started) / 1000)} s)`);
      }
    }
  }
  await flush();
  log(`handoffs copied; rebuilding the item indexes (${Math.round((Date.now() - started) / 1000)} s)`);
  await q(`SET maintenance_work_mem = '512MB'`);
  await q(`ALTER TABLE handoff_items ADD CONSTRAINT handoff_items_pkey PRIMARY KEY (id)`);
  await q(`CREATE UNIQUE INDEX handoff_items_handoff_item ON handoff_items (handoff_id, item_key)`);
  await q(`CREATE INDEX handoff_items_item ON handoff_items (item_key)`);
  await q(`UPDATE trailers t SET status = f.status, current_terminal_id = f.terminal_id, current_spot_id = f.spot_id,
             is_loaded = f.is_loaded, fuel_eighths = f.fuel_eighths, is_reefer_on = f.is_reefer_on,
             setpoint_tenths_f = f.setpoint_tenths_f, gate_in_at = f.gate_in_at, last_seen_at = f.last_seen_at
             FROM bulk_trailer_final f WHERE f.trailer_id = t.id`);
  // the current condition of every trailer (as migration 0008 fills it for stored handoffs)
  if ((await q(`SELECT to_regclass('trailer_condition') AS t`))[0].t)
    await q(`INSERT INTO trailer_condition (trailer_id, item_key, handoff_id, observed_at, condition)
             SELECT DISTINCT ON (h.trailer_id, i.item_key) h.trailer_id, i.item_key, h.id, h.occurred_at, i.condition
               FROM handoff_items i JOIN handoffs h ON h.id = i.handoff_id
              ORDER BY h.trailer_id, i.item_key, h.occurred_at DESC, h.created_at DESC
             ON CONFLICT DO NOTHING`);
  log(`handoffs written (${Math.round((Date.now() - started) / 1000)} s)`);

  // 4. yard moves and walks (no hash chain): one move per 10 handoffs, a walk a day at Riverbend
  await q(
    `INSERT INTO yard_moves (trailer_id, terminal_id, from_spot_id, to_spot_id, moved_by_id, moved_at)
     SELECT h.trailer_id, h.terminal_id, NULL, s.id, $1, h.occurred_at + interval '2 hours'
       FROM handoffs h
       JOIN LATERAL (SELECT id FROM yard_spots WHERE terminal_id = h.terminal_id AND kind = 'slot'
                     ORDER BY label OFFSET (abs(hashtext(h.id::text)) % 100) LIMIT 1) s ON true
      WHERE h.kind = 'drop' AND h.idempotency_key LIKE 'bulk-%' AND abs(hashtext(h.id::text)) % 5 = 0`,
    [jockey.id],
  );
  const days = o.walkDays ?? Math.max(1, Math.min(730, Math.round(o.handoffs / 1500)));
  await q(
    `INSERT INTO yard_walks (terminal_id, started_by_id, row_ids, status, started_at, finished_at, summary)
     SELECT $1, $2, '[]'::jsonb, 'finished', now() - make_interval(days => d), now() - make_interval(days => d)
            + interval '40 minutes', '{"matched": 50}'::jsonb
       FROM generate_series(1, $3::int) d`,
    [rvb.id, jockey.id, days],
  );
  await q(
    `INSERT INTO walk_scans (walk_id, seq, client_key, scanned_text, trailer_id, spot_id, is_unit_running,
                             fuel_eighths, are_doors_closed, is_seal_present, scanned_at)
     SELECT w.id, g, w.id || '-' || g, t.unit_number, t.id, t.current_spot_id, true, 6, true, true,
            w.started_at + make_interval(secs => g * 40)
       FROM yard_walks w
       CROSS JOIN generate_series(1, 50) g
       JOIN LATERAL (SELECT id, unit_number, current_spot_id FROM trailers
                      WHERE current_terminal_id = w.terminal_id AND status = 'in_yard'
                      ORDER BY unit_number OFFSET g * 7 LIMIT 1) t ON true
      WHERE w.terminal_id = $1 AND w.status = 'finished' AND w.summary ->> 'matched' = '50'
        AND NOT EXISTS (SELECT 1 FROM walk_scans x WHERE x.walk_id = w.id)`,
    [rvb.id],
  );
  await q('ANALYZE');
  const counted: Record<string, number> = {};
  for (const table of [
    'terminals',
    'yard_spots',
    'trailers',
    'labels',
    'handoffs',
    'handoff_items',
    'photos',
    'findings',
    'cases',
    'case_events',
    'holds',
    'yard_moves',
    'yard_walks',
    'walk_scans',
  ]) {
    const [{ n }] = await q<{ n: string }>(`SELECT count(*) AS n FROM ${table}`);
    counted[table] = Number(n);
  }
  return counted;
}

/** Adds `rows` rows of `perRow` slots to terminal `code` (row names and labels carry `prefix`). */
async function addSlots(client: pg.Client, code: string, rows: number, perRow: number, prefix = '') {
  await client.query(
    `WITH t AS (SELECT id FROM terminals WHERE code = $1),
          r AS (INSERT INTO yard_rows (terminal_id, name, sort_order)
                SELECT t.id, 'Row ' || $4 || lpad(g::text, 2, '0'), 100 + g FROM t, generate_series(1, $2::int) g
                ON CONFLICT DO NOTHING RETURNING id, name, terminal_id)
     INSERT INTO yard_spots (terminal_id, row_id, kind, label, sort_order)
     SELECT r.terminal_id, r.id, 'slot', substr(r.name, 5) || '-' || lpad(s::text, 2, '0'), s
       FROM r, generate_series(1, $3::int) s
     ON CONFLICT DO NOTHING`,
    [code, rows, perRow, prefix],
  );
}
