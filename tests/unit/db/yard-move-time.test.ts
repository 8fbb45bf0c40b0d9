// A yard move queued on a phone without signal is recorded at the time it was made, keeps the time
// it reached the server, and sorts in the trailer's history by the time it was made; arriving
// after a move made later, it is history and leaves the trailer where the later move put it.
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { trailers, yardMoves } from '@/db/schema';
import { getTrailerFileRows } from '@/db/queries/trailer-file';
import { seed } from '@/db/seed';
import { buildTrailerFile } from '@/lib/desk/trailer-file';
import type { YardActor } from '@/lib/server/yard/actor';
import { recordMove } from '@/lib/server/yard/moves';
import { moveSchema } from '@/lib/validation/yard';
import { MOVE_IN_FUTURE, MOVE_TOO_OLD } from '@/lib/yard/move-time';
import {
  createRowWithSlots,
  createStaff,
  ensureTerminal,
  placeTrailers,
  removeTestYard,
  uniqueTag,
} from '../../support/yard-fixture';

let terminalId: string;
let jockey: YardActor;
const MIN = 60_000;
const ago = (minutes: number) => new Date(Date.now() - minutes * MIN).toISOString();

beforeAll(async () => {
  await seed();
  terminalId = await ensureTerminal(db, 'HMYQ');
  jockey = { id: await createStaff(db, terminalId), terminalId };
});
afterAll(async () => {
  await removeTestYard(db, terminalId);
  await pool.end();
});

describe('a queued yard move keeps the time it was made', () => {
  it('records a move made 20 minutes ago at that time, and when it arrived', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row Q${tag}`, 2);
    const [a] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    const madeAt = ago(20);
    const input = moveSchema.parse({
      unit: a.unitNumber,
      target: spots[1].label,
      clientKey: `q-${tag}-1`,
      madeAt,
    });
    const before = Date.now();
    expect((await recordMove(jockey, input)).ok).toBe(true);
    const [row] = await db.select().from(yardMoves).where(eq(yardMoves.trailerId, a.id));
    expect(row.movedAt.toISOString()).toBe(madeAt);
    // the arrival: now, not 20 minutes ago (a second of slack for the database's clock)
    expect(row.createdAt.getTime()).toBeGreaterThanOrEqual(before - 1000);
    expect(row.createdAt.getTime() - row.movedAt.getTime()).toBeGreaterThanOrEqual(20 * MIN - 1000);
    // the trailer was last seen when the move was made
    const [t] = await db.select({ seen: trailers.lastSeenAt }).from(trailers).where(eq(trailers.id, a.id));
    expect(t.seen?.toISOString()).toBe(madeAt);
  });

  it('sorts the trailer’s history by the time of the move, not by arrival', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row R${tag}`, 3);
    const [a] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    // sent online now, then a move queued 20 minutes ago reaches the server
    expect((await recordMove(jockey, { unit: a.unitNumber, target: spots[1].label })).ok).toBe(true);
    const queued = { unit: a.unitNumber, target: spots[2].label, clientKey: `q-${tag}-2`, madeAt: ago(20) };
    expect((await recordMove(jockey, moveSchema.parse(queued))).ok).toBe(true);
    const file = buildTrailerFile((await getTrailerFileRows(a.id)).rows, 'move');
    // newest first: the online move, then the one made 20 minutes earlier though it arrived last
    const moves = file.filter((e) => e.kind === 'move').map((e) => e.at.getTime());
    expect(moves).toHaveLength(2);
    expect(moves[0]).toBeGreaterThan(moves[1]);
    expect(moves[1]).toBe(Date.parse(queued.madeAt));
  });

  it('keeps the trailer where a later move put it when an earlier queued move arrives after it', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row T${tag}`, 3);
    const [a] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    // another phone moves the trailer to the second slot now …
    expect((await recordMove(jockey, { unit: a.unitNumber, target: spots[1].label })).ok).toBe(true);
    // … then a move to the third slot, made 20 minutes ago without signal, reaches the server
    const queued = { unit: a.unitNumber, target: spots[2].label, clientKey: `q-${tag}-4`, madeAt: ago(20) };
    const late = await recordMove(jockey, moveSchema.parse(queued));
    expect(late).toMatchObject({
      ok: true,
      value: { fromLabel: spots[0].label, toLabel: spots[2].label, laterSpotLabel: spots[1].label },
    });
    const [t] = await db
      .select({ spotId: trailers.currentSpotId, seen: trailers.lastSeenAt })
      .from(trailers)
      .where(eq(trailers.id, a.id));
    expect(t.spotId).toBe(spots[1].id);
    expect(t.seen!.getTime()).toBeGreaterThan(Date.parse(queued.madeAt));
    // the late move is in the history, from where the later move found the trailer
    const rows = await db.select().from(yardMoves).where(eq(yardMoves.trailerId, a.id));
    const recorded = rows.find((r) => r.clientKey === queued.clientKey);
    expect(recorded).toMatchObject({ fromSpotId: spots[0].id, toSpotId: spots[2].id });
    // sent again from the outbox: the same move, nothing new
    const again = await recordMove(jockey, moveSchema.parse(queued));
    expect(again).toMatchObject({ ok: true, value: { moveId: recorded!.id, isReplay: true } });
    expect(await db.select().from(yardMoves).where(eq(yardMoves.trailerId, a.id))).toHaveLength(2);
  });

  it('refuses a time beyond the bounds under the field madeAt, and records nothing', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row S${tag}`, 2);
    const [a] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    const base = { unit: a.unitNumber, target: spots[1].label, clientKey: `q-${tag}-3` };
    for (const [madeAt, message] of [
      [ago(73 * 60), MOVE_TOO_OLD],
      [ago(-10), MOVE_IN_FUTURE],
    ]) {
      // the schema refuses it under the field (the route answers 400 with these fieldErrors) …
      const parsed = moveSchema.safeParse({ ...base, madeAt });
      expect(parsed.success).toBe(false);
      expect(parsed.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([['madeAt', message]]);
      // … and so does the service, for a caller that did not parse it
      expect(await recordMove(jockey, { ...base, madeAt })).toMatchObject({
        ok: false,
        code: 'invalid',
        fieldErrors: { madeAt: [message] },
      });
    }
    expect(moveSchema.safeParse({ ...base, madeAt: 'yesterday' }).error?.issues[0]).toMatchObject({
      path: ['madeAt'],
      message: 'Not a valid time for the move.',
    });
    // 71 hours ago is inside the bound
    expect(moveSchema.safeParse({ ...base, madeAt: ago(71 * 60) }).success).toBe(true);
    expect(await db.select().from(yardMoves).where(eq(yardMoves.trailerId, a.id))).toHaveLength(0);
  });
});
