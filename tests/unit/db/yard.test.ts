import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { auditLog, trailers, walkOutcomes, walkScans, yardMoves, yardTasks } from '@/db/schema';
import { getBoard } from '@/db/queries/yard-board';
import { seed } from '@/db/seed';
import type { YardActor } from '@/lib/server/yard/actor';
import { finishWalk } from '@/lib/server/yard/finish-walk';
import { retireSpot } from '@/lib/server/yard/layout';
import { recordMove } from '@/lib/server/yard/moves';
import { resolveOutcome } from '@/lib/server/yard/outcomes';
import { addWalkScan, startWalk } from '@/lib/server/yard/walks';
import {
  createStaff,
  createRowWithSlots,
  ensureTerminal,
  placeTrailers,
  removeTestYard,
  uniqueTag,
} from '../../support/yard-fixture';

let terminalId: string;
let jockeyId: string;
let jockey: YardActor;
const checks = {
  isUnitRunning: true,
  setpointTenthsF: 340,
  fuelEighths: 6,
  areDoorsClosed: true,
  isSealPresent: true,
};
const scanAt = (n: number) => new Date(Date.UTC(2030, 0, 1, 12, n)).toISOString();

beforeAll(async () => {
  // the demo seed first (idempotent), so its placement of trailers is not skipped because ours exist
  await seed();
  terminalId = await ensureTerminal(db, 'HMYT');
  jockeyId = await createStaff(db, terminalId);
  jockey = { id: jockeyId, terminalId };
});
afterAll(async () => {
  await removeTestYard(db, terminalId);
  await pool.end();
});

describe('moves', () => {
  it('refuses a move into an occupied slot, naming the occupant, and changes nothing', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row M${tag}`, 3);
    const [a, b] = await placeTrailers(db, terminalId, tag, [spots[0].id, spots[1].id]);
    const refused = await recordMove(jockey, { unit: a.unitNumber, target: spots[1].label });
    expect(refused).toMatchObject({ ok: false, code: 'conflict' });
    expect(!refused.ok && refused.message).toContain(b.unitNumber);
    expect(!refused.ok && refused.fieldErrors?.target?.[0]).toContain(b.unitNumber);
    const [still] = await db
      .select({ spot: trailers.currentSpotId })
      .from(trailers)
      .where(eq(trailers.id, a.id));
    expect(still.spot).toBe(spots[0].id);
    expect(await db.select().from(yardMoves).where(eq(yardMoves.trailerId, a.id))).toHaveLength(0);
  });

  it('moves into an empty slot: records the yard move and the audit entry, updates the board', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row N${tag}`, 2);
    const [a] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    // typed in lower case: unit numbers and labels are matched without regard to case
    const moved = await recordMove(jockey, {
      unit: a.unitNumber.toLowerCase(),
      target: spots[1].label.toLowerCase(),
    });
    expect(moved).toMatchObject({
      ok: true,
      value: {
        unitNumber: a.unitNumber,
        fromLabel: spots[0].label,
        toLabel: spots[1].label,
        isOutOfService: false,
      },
    });
    const moves = await db.select().from(yardMoves).where(eq(yardMoves.trailerId, a.id));
    expect(moves).toMatchObject([{ fromSpotId: spots[0].id, toSpotId: spots[1].id, movedById: jockeyId }]);
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, a.id), eq(auditLog.action, 'yard.move')));
    expect(audit).toHaveLength(1);
    const board = await getBoard(terminalId);
    expect(board!.spots.find((s) => s.id === spots[1].id)?.trailer?.unitNumber).toBe(a.unitNumber);
    expect(board!.spots.find((s) => s.id === spots[0].id)?.trailer).toBeNull();
  });

  it('records a move sent twice under the same phone key once, and answers the first move again', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row K${tag}`, 3);
    const [a] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    const clientKey = `move-${tag}-0001`;
    const input = { unit: a.unitNumber, target: spots[1].label, clientKey };
    // the outbox's second send (its first answer was lost) and a double tap arriving together
    const [first, second] = await Promise.all([recordMove(jockey, input), recordMove(jockey, input)]);
    const third = await recordMove(jockey, input);
    for (const answer of [first, second, third])
      expect(answer).toMatchObject({
        ok: true,
        value: { unitNumber: a.unitNumber, toLabel: spots[1].label },
      });
    const moveIds = [first, second, third].map((r) => (r.ok ? r.value.moveId : null));
    expect(new Set(moveIds).size).toBe(1);
    expect([first, second, third].filter((r) => r.ok && r.value.isReplay)).toHaveLength(2);
    expect(await db.select().from(yardMoves).where(eq(yardMoves.trailerId, a.id))).toHaveLength(1);
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, a.id), eq(auditLog.action, 'yard.move')));
    expect(audit).toHaveLength(1);
    // a new key is a new move: the same trailer on to the third slot
    const onward = await recordMove(jockey, {
      ...input,
      target: spots[2].label,
      clientKey: `${clientKey}-b`,
    });
    expect(onward).toMatchObject({ ok: true, value: { fromLabel: spots[1].label, toLabel: spots[2].label } });
    expect(onward.ok && onward.value.isReplay).toBeFalsy();
    // the first key sent once more, after the trailer moved on: still the first move, nothing written
    const late = await recordMove(jockey, input);
    expect(late).toMatchObject({
      ok: true,
      value: { moveId: moveIds[0], toLabel: spots[1].label, isReplay: true },
    });
    expect(await db.select().from(yardMoves).where(eq(yardMoves.trailerId, a.id))).toHaveLength(2);
  });

  it('refuses a trailer that is not in this yard', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row O${tag}`, 1);
    const [away] = await placeTrailers(db, terminalId, tag, [null]);
    expect(await recordMove(jockey, { unit: away.unitNumber, target: spots[0].label })).toMatchObject({
      ok: false,
      code: 'not_found',
      fieldErrors: { unit: [`${away.unitNumber} is not in this terminal's yard.`] },
    });
  });

  it('names both fields when neither the unit nor the slot or door exists', async () => {
    const tag = uniqueTag();
    expect(await recordMove(jockey, { unit: `NOUNIT${tag}`, target: `NOSLOT${tag}` })).toEqual({
      ok: false,
      code: 'not_found',
      message: `No trailer matches NOUNIT${tag}. No slot or door NOSLOT${tag} in this yard.`,
      fieldErrors: {
        unit: ['No trailer with that unit number, VIN or label.'],
        target: ['No such slot or door in this yard.'],
      },
    });
  });

  it('names both fields when the unit is known but not in this yard and the slot does not exist', async () => {
    const tag = uniqueTag();
    const [away] = await placeTrailers(db, terminalId, tag, [null]);
    expect(await recordMove(jockey, { unit: away.unitNumber, target: `NOSLOT${tag}` })).toEqual({
      ok: false,
      code: 'not_found',
      message: `${away.unitNumber} is not in this terminal's yard. No such slot or door in this yard.`,
      fieldErrors: {
        unit: [`${away.unitNumber} is not in this terminal's yard.`],
        target: ['No such slot or door in this yard.'],
      },
    });
  });

  it('refuses an account without a home terminal before reading anything', async () => {
    expect(await recordMove({ id: jockeyId, terminalId: null }, { unit: 'X', target: 'Y' })).toMatchObject({
      ok: false,
      code: 'not_found',
      message: 'Your account has no home terminal; ask an admin to set one.',
    });
  });
});

describe('slot retirement', () => {
  it('is refused while the slot holds a trailer (occupant named) and allowed after moving it', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row R${tag}`, 2);
    const [a] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    const refused = await retireSpot(jockey, { id: spots[0].id });
    expect(refused).toMatchObject({ ok: false, code: 'conflict' });
    expect(!refused.ok && refused.message).toBe(
      `${spots[0].label} still holds ${a.unitNumber}: move it first.`,
    );
    expect((await recordMove(jockey, { unit: a.unitNumber, target: spots[1].label })).ok).toBe(true);
    expect(await retireSpot(jockey, { id: spots[0].id })).toEqual({ ok: true, value: { id: spots[0].id } });
    const board = await getBoard(terminalId);
    expect(board!.spots.some((s) => s.id === spots[0].id)).toBe(false);
    // a retired slot is no longer a move target
    expect(await recordMove(jockey, { unit: a.unitNumber, target: spots[0].label })).toMatchObject({
      ok: false,
      code: 'not_found',
      fieldErrors: { target: ['No such slot or door in this yard.'] },
    });
  });
});

describe('yard walk', () => {
  it('stores a scan once per client key and updates the trailer readings', async () => {
    const tag = uniqueTag();
    const { rowId, spots } = await createRowWithSlots(db, terminalId, `Row W${tag}`, 1);
    const [a] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    const started = await startWalk(jockey, { rowIds: [rowId] });
    if (!started.ok) throw new Error(started.message);
    const walk = started.value;
    const scan = {
      ...checks,
      clientKey: `k-${tag}-1`,
      scannedText: a.unitNumber.toLowerCase(),
      spotId: spots[0].id,
      scannedAt: scanAt(1),
      fuelEighths: 2,
      isUnitRunning: false,
    };
    const first = await addWalkScan(jockey, walk.id, scan);
    const again = await addWalkScan(jockey, walk.id, scan);
    expect(first).toEqual({ ok: true, value: { seq: 1, isRepeat: false, unitNumber: a.unitNumber } });
    expect(again).toEqual({ ok: true, value: { seq: 1, isRepeat: true, unitNumber: a.unitNumber } });
    expect(await db.select().from(walkScans).where(eq(walkScans.walkId, walk.id))).toHaveLength(1);
    const [t] = await db
      .select({ fuel: trailers.fuelEighths, on: trailers.isReeferOn, seen: trailers.lastSeenAt })
      .from(trailers)
      .where(eq(trailers.id, a.id));
    expect(t).toEqual({ fuel: 2, on: false, seen: new Date(scanAt(1)) });
  });

  it('reconciles on finish: stores outcomes, summary and tasks; corrections update the board', async () => {
    const tag = uniqueTag();
    const { rowId, spots } = await createRowWithSlots(db, terminalId, `Row X${tag}`, 4);
    // board: s1 = t1, s2 = t2, s3 = t3, s4 empty
    const [t1, t2, t3] = await placeTrailers(db, terminalId, tag, [spots[0].id, spots[1].id, spots[2].id]);
    const started = await startWalk(jockey, { rowIds: [rowId] });
    if (!started.ok) throw new Error(started.message);
    const walk = started.value;
    const scans = [
      { text: t1.unitNumber, spot: spots[0].id, fuelEighths: 3 }, // matched, low fuel (policy default 4/8)
      { text: `NOPE${tag}`, spot: spots[1].id, fuelEighths: 6 }, // unknown label where t2 should be
      { text: t3.unitNumber, spot: spots[3].id, fuelEighths: 6 }, // t3 found in the wrong slot
    ];
    for (const [i, s] of scans.entries()) {
      const r = await addWalkScan(jockey, walk.id, {
        ...checks,
        clientKey: `k-${tag}-${i}`,
        scannedText: s.text,
        spotId: s.spot,
        scannedAt: scanAt(i),
        fuelEighths: s.fuelEighths,
      });
      expect(r.ok).toBe(true);
    }
    const done = await finishWalk(jockey, { walkId: walk.id });
    const summary = {
      matched: 1,
      wrong_slot: 1,
      missing: 1,
      unknown: 1,
      duplicate: 0,
      scans: 3,
      repeatScans: 0,
    };
    expect(done).toEqual({ ok: true, value: { summary } });
    const outcomes = await db.select().from(walkOutcomes).where(eq(walkOutcomes.walkId, walk.id));
    const by = (o: string) => outcomes.filter((x) => x.outcome === o);
    expect(by('matched')).toMatchObject([{ trailerId: t1.id, spotId: spots[0].id }]);
    expect(by('wrong_slot')).toMatchObject([
      { trailerId: t3.id, spotId: spots[3].id, expectedSpotId: spots[2].id },
    ]);
    expect(by('missing')).toMatchObject([{ trailerId: t2.id, expectedSpotId: spots[1].id, spotId: null }]);
    expect(by('unknown')).toMatchObject([
      { trailerId: null, scannedText: `NOPE${tag}`, spotId: spots[1].id },
    ]);
    const tasks = await db
      .select({ kind: yardTasks.kind, trailerId: yardTasks.trailerId })
      .from(yardTasks)
      .where(eq(yardTasks.walkId, walk.id));
    expect(tasks).toEqual([{ kind: 'low_fuel', trailerId: t1.id }]);
    // finishing twice adds nothing and answers the stored summary
    expect(await finishWalk(jockey, { walkId: walk.id })).toEqual({ ok: true, value: { summary } });
    expect(await db.select().from(walkOutcomes).where(eq(walkOutcomes.walkId, walk.id))).toHaveLength(4);

    expect(
      await resolveOutcome(jockey, { outcomeId: by('wrong_slot')[0].id, resolution: 'accepted' }),
    ).toEqual({ ok: true, value: undefined });
    expect(
      await resolveOutcome(jockey, { outcomeId: by('missing')[0].id, resolution: 'marked_gone' }),
    ).toEqual({ ok: true, value: undefined });
    expect(
      await resolveOutcome(jockey, { outcomeId: by('unknown')[0].id, resolution: 'accepted' }),
    ).toMatchObject({ ok: false, code: 'invalid' });
    expect(
      await resolveOutcome(jockey, { outcomeId: by('unknown')[0].id, resolution: 'investigating' }),
    ).toEqual({ ok: true, value: undefined });
    expect(
      await resolveOutcome(jockey, { outcomeId: by('unknown')[0].id, resolution: 'investigating' }),
    ).toMatchObject({ ok: false, code: 'conflict' });
    const [moved3] = await db
      .select({ spot: trailers.currentSpotId })
      .from(trailers)
      .where(eq(trailers.id, t3.id));
    expect(moved3.spot).toBe(spots[3].id);
    const [gone2] = await db
      .select({ status: trailers.status, spot: trailers.currentSpotId })
      .from(trailers)
      .where(eq(trailers.id, t2.id));
    expect(gone2).toEqual({ status: 'gone', spot: null });
    expect(await db.select().from(yardMoves).where(eq(yardMoves.trailerId, t3.id))).toHaveLength(1);
  });

  it('refuses scans once the walk is finished, unless it is a re-send of a stored one', async () => {
    const tag = uniqueTag();
    const { rowId, spots } = await createRowWithSlots(db, terminalId, `Row Z${tag}`, 1);
    const started = await startWalk(jockey, { rowIds: [rowId] });
    if (!started.ok) throw new Error(started.message);
    const walk = started.value;
    const scan = {
      ...checks,
      clientKey: `k-${tag}-a`,
      scannedText: 'X',
      spotId: spots[0].id,
      scannedAt: scanAt(1),
    };
    expect((await addWalkScan(jockey, walk.id, scan)).ok).toBe(true);
    await finishWalk(jockey, { walkId: walk.id });
    expect(await addWalkScan(jockey, walk.id, scan)).toMatchObject({ ok: true, value: { isRepeat: true } });
    expect(await addWalkScan(jockey, walk.id, { ...scan, clientKey: `k-${tag}-b` })).toMatchObject({
      ok: false,
      code: 'conflict',
    });
  });
});
