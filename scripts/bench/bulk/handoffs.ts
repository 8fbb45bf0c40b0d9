// The handoff pass: one streaming pass over the trailers, oldest handoff first per trailer, that
// computes each handoff's keyed content hash (so every chain verifies) and writes the handoffs
// with COPY. Item rows are not streamed: a trailer's items are its shape's all-ok template
// (made in SQL afterwards, items.ts) plus the few rows written to bulk_item_override.
import { randomUUID } from 'node:crypto';
import type pg from 'pg';
import type { HandoffHashRow } from '@/lib/handoffs/canonical';
import type { TrailerShape } from '@/lib/trailers/checklist';
import type { Buffers } from './buffers';
import { codeFor } from './copy';
import { damage, DAMAGE_KEYS, PIN_KEY, pinNotEngaged, type EventContext } from './events';
import { handoffCopyRow, linkHash, shapeOf, type Shape } from './rows';

const HOUR = 3_600_000;
const DAY = 24 * HOUR;
const TWO_YEARS = 730 * DAY;

export type PassTrailer = TrailerShape & { id: string; unitNumber: string; index: number };
type Actor = { id: string; carrierId: string; name: string };
export type PassInput = {
  trailers: PassTrailer[];
  counts: number[];
  drivers: Actor[];
  terminals: string[];
  finalSpot: Map<string, { terminalId: string; spotId: string }>;
  clerkId: string;
  jockeyId: string;
  damageRate: number;
  chainKey: string;
  rand: () => number;
  log: (line: string) => void;
};

/** Streams every trailer's handoffs into the buffers; flushes every ~5,000 handoffs. */
export async function handoffPass(client: pg.Client, b: Buffers, p: PassInput, now: number) {
  const shapes = new Map<string, Shape>();
  const flush = async () => {
    for (const buf of Object.values(b)) await buf.flush(client);
  };
  let seq = 0;
  let checked = 0;
  let nextLog = 100_000;
  const started = Date.now();
  for (const t of p.trailers) {
    const shape = shapeOf(shapes, t, b);
    const n = p.counts[t.index];
    const final = p.finalSpot.get(t.id);
    const endsInYard = Boolean(final);
    const end = now - (1 + p.rand() * (endsInYard ? 140 : 100)) * HOUR;
    const step = Math.min(TWO_YEARS / n, 10 * DAY);
    const isReefer = t.kind === 'reefer';
    const home = p.terminals[t.index % p.terminals.length];
    let prevHash: string | null = null;
    let prevId: string | null = null;
    let terminalId = home;
    for (let k = 0; k < n; k++) {
      const isLast = k === n - 1;
      const isDrop = (n - 1 - k) % 2 === 0 ? endsInYard : !endsInYard;
      const at = new Date(end - (n - 1 - k) * step + (isLast ? 0 : Math.floor(p.rand() * step * 0.3)));
      const trip = Math.floor((k + (isDrop ? 1 : 0)) / 2);
      const driver = p.drivers[(t.index * 7 + trip * 3) % 5 === 0 ? 4 + (trip % 4) : (t.index + trip) % 4];
      if (isDrop)
        terminalId =
          isLast && final
            ? final.terminalId
            : p.rand() < 0.7
              ? home
              : p.terminals[Math.floor(p.rand() * p.terminals.length)];
      const id = randomUUID();
      seq++;
      const loaded = p.rand() < 0.55;
      const row: HandoffHashRow = {
        id,
        trailerId: t.id,
        terminalId,
        kind: isDrop ? 'drop' : 'hook',
        level: 'full',
        carrierId: driver.carrierId,
        driverId: driver.id,
        driverName: driver.name,
        tractorNumber: `T${4100 + ((seq * 13) % 900)}`,
        recordedById: driver.id,
        isLoaded: loaded,
        sealNumber: loaded ? `SL${100000 + (seq % 899999)}` : null,
        fuelEighths: isReefer ? 2 + Math.floor(p.rand() * 7) : null,
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
      const ctx: EventContext = {
        b,
        rand: p.rand,
        now,
        seq,
        handoffId: id,
        prevId,
        trailer: t,
        terminalId,
        driver,
        clerkId: p.clerkId,
        jockeyId: p.jockeyId,
        at,
        isLast,
      };
      const r = p.rand();
      const hit = DAMAGE_KEYS[seq % DAMAGE_KEYS.length];
      const has = (key: string) => shape.okRows.some((i) => i.itemKey === key);
      const found =
        isDrop && k > 0 && r < p.damageRate && has(hit[0])
          ? damage(ctx, hit[0], hit[1], shape.okRows)
          : isDrop && r > 1 - p.damageRate / 2 && has(PIN_KEY)
            ? pinNotEngaged(ctx, shape.okRows)
            : null;
      const contentHash = linkHash(row, shape, found, p.chainKey, checked < 3);
      if (!found && checked < 3) checked++;
      b.handoffs.push(handoffCopyRow(row, contentHash));
      prevHash = contentHash;
      prevId = id;
      if (isLast)
        b.finals.push([
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
          id,
        ]);
    }
    if (b.handoffs.size >= 5_000) {
      await flush();
      if (b.handoffs.total >= nextLog) {
        nextLog += 100_000;
        p.log(
          `${b.handoffs.total} handoffs hashed and copied (${Math.round((Date.now() - started) / 1000)} s)`,
        );
      }
    }
  }
  await flush();
  return b.handoffs.total;
}
