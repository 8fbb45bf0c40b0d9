import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { auditLog, trailers, yardRows, yardSpots, yardTasks } from '@/db/schema';
import { listOpenTasks } from '@/db/queries/yard-tasks';
import type { YardActor } from '@/lib/server/yard/actor';
import { addRow, addSpot, renameRow, renameSpot } from '@/lib/server/yard/layout';
import { clearTask } from '@/lib/server/yard/tasks';
import {
  createRowWithSlots,
  createStaff,
  ensureTerminal,
  placeTrailers,
  removeTestYard,
  uniqueTag,
} from '../../support/yard-fixture';

let terminalId: string;
let otherTerminalId: string;
let admin: YardActor;

/** The PostgreSQL error a rejected statement threw (drizzle wraps it as `cause`). */
async function pgErrorOf(work: Promise<unknown>): Promise<{ code?: string; constraint?: string }> {
  const error = await work.then(
    () => null,
    (e: unknown) => e as { cause?: { code?: string; constraint?: string } },
  );
  expect(error, 'the statement should have been refused').not.toBeNull();
  return error!.cause ?? {};
}

beforeAll(async () => {
  terminalId = await ensureTerminal(db, 'HMYL');
  otherTerminalId = await ensureTerminal(db, 'HMYO');
  admin = { id: await createStaff(db, terminalId, 'admin'), terminalId };
});
afterAll(async () => {
  await removeTestYard(db, terminalId);
  await removeTestYard(db, otherTerminalId);
  await pool.end();
});

describe('the database keeps the yard consistent', () => {
  // SQLSTATE 23505 is unique_violation (PostgreSQL manual, appendix A "Error Codes").
  it('refuses a second row of the same name in one terminal (index yard_rows_terminal_name)', async () => {
    const name = `Row U${uniqueTag()}`;
    await db.insert(yardRows).values({ terminalId, name });
    expect(await pgErrorOf(db.insert(yardRows).values({ terminalId, name }))).toMatchObject({
      code: '23505',
      constraint: 'yard_rows_terminal_name',
    });
    // the same name in another terminal is another row
    await expect(db.insert(yardRows).values({ terminalId: otherTerminalId, name })).resolves.toBeDefined();
  });

  it('never puts two trailers in one spot (index trailers_current_spot)', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row T${tag}`, 2);
    const [, b] = await placeTrailers(db, terminalId, tag, [spots[0].id, spots[1].id]);
    const error = await pgErrorOf(
      db.update(trailers).set({ currentSpotId: spots[0].id }).where(eq(trailers.id, b.id)),
    );
    expect(error).toMatchObject({ code: '23505', constraint: 'trailers_current_spot' });
  });
});

describe('layout edits', () => {
  it('adds a row after the last one, audited; a taken name comes back under the name field', async () => {
    const name = `Row A${uniqueTag()}`;
    const added = await addRow(admin, { name });
    if (!added.ok) throw new Error(added.message);
    const [row] = await db.select().from(yardRows).where(eq(yardRows.id, added.value.id));
    expect(row).toMatchObject({ terminalId, name });
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.entityId, row.id), eq(auditLog.action, 'yard.row_created')));
    expect(audit).toHaveLength(1);
    expect(await addRow(admin, { name })).toEqual({
      ok: false,
      code: 'conflict',
      message: `A row named ${name} already exists.`,
      fieldErrors: { name: [`A row named ${name} already exists.`] },
    });
  });

  it('refuses renaming a row to a taken name, and a row of another terminal', async () => {
    const tag = uniqueTag();
    const first = await createRowWithSlots(db, terminalId, `Row B${tag}`, 0);
    await createRowWithSlots(db, terminalId, `Row C${tag}`, 0);
    expect(await renameRow(admin, { id: first.rowId, name: `Row C${tag}` })).toMatchObject({
      ok: false,
      code: 'conflict',
      fieldErrors: { name: [`A row named Row C${tag} already exists.`] },
    });
    const elsewhere = await createRowWithSlots(db, otherTerminalId, `Row D${tag}`, 0);
    expect(await renameRow(admin, { id: elsewhere.rowId, name: `Row E${tag}` })).toMatchObject({
      ok: false,
      code: 'not_found',
    });
    const [kept] = await db.select().from(yardRows).where(eq(yardRows.id, first.rowId));
    expect(kept.name).toBe(`Row B${tag}`);
  });

  it('adds slots in row order and doors outside any row; refuses a row of another terminal', async () => {
    const tag = uniqueTag();
    const { rowId, spots } = await createRowWithSlots(db, terminalId, `Row F${tag}`, 2);
    const slot = await addSpot(admin, { kind: 'slot', rowId, label: `F${tag}-9` });
    if (!slot.ok) throw new Error(slot.message);
    const [added] = await db.select().from(yardSpots).where(eq(yardSpots.id, slot.value.id));
    expect(added).toMatchObject({ rowId, kind: 'slot', sortOrder: spots.length });
    const door = await addSpot(admin, { kind: 'door', rowId, label: `Door ${tag}` });
    if (!door.ok) throw new Error(door.message);
    const [d] = await db.select().from(yardSpots).where(eq(yardSpots.id, door.value.id));
    expect(d).toMatchObject({ rowId: null, kind: 'door' });
    const elsewhere = await createRowWithSlots(db, otherTerminalId, `Row G${tag}`, 0);
    expect(await addSpot(admin, { kind: 'slot', rowId: elsewhere.rowId, label: `G${tag}` })).toMatchObject({
      ok: false,
      code: 'not_found',
      fieldErrors: { rowId: ['No such row in this yard.'] },
    });
  });

  it('refuses a taken label under the field each form names it by', async () => {
    const tag = uniqueTag();
    const { rowId, spots } = await createRowWithSlots(db, terminalId, `Row H${tag}`, 2);
    expect(await addSpot(admin, { kind: 'slot', rowId, label: spots[0].label })).toMatchObject({
      ok: false,
      code: 'conflict',
      fieldErrors: { label: [`A slot or door labelled ${spots[0].label} already exists.`] },
    });
    expect(await renameSpot(admin, { id: spots[1].id, name: spots[0].label })).toMatchObject({
      ok: false,
      code: 'conflict',
      fieldErrors: { name: [`A slot or door labelled ${spots[0].label} already exists.`] },
    });
  });
});

describe('yard tasks', () => {
  it('clears an open task once, audited', async () => {
    const tag = uniqueTag();
    const { spots } = await createRowWithSlots(db, terminalId, `Row K${tag}`, 1);
    const [t] = await placeTrailers(db, terminalId, tag, [spots[0].id]);
    const [task] = await db
      .insert(yardTasks)
      .values({ terminalId, trailerId: t.id, kind: 'doors_open', note: 'Doors found open.' })
      .returning({ id: yardTasks.id });
    expect((await listOpenTasks(terminalId)).map((o) => o.id)).toContain(task.id);
    expect(await clearTask(admin, { id: task.id })).toEqual({ ok: true, value: undefined });
    expect((await listOpenTasks(terminalId)).map((o) => o.id)).not.toContain(task.id);
    expect(await clearTask(admin, { id: task.id })).toMatchObject({ ok: false, code: 'not_found' });
    const [cleared] = await db.select().from(yardTasks).where(eq(yardTasks.id, task.id));
    expect(cleared.clearedById).toBe(admin.id);
    const audit = await db.select().from(auditLog).where(eq(auditLog.entityId, task.id));
    expect(audit.map((a) => a.action)).toEqual(['yard.task_cleared']);
  });
});
