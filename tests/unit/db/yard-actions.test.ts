import { and, eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { db, pool } from '@/db';
import { yardRows, yardTasks, yardWalks } from '@/db/schema';
import { IDLE } from '@/lib/result';
import {
  createRowWithSlots,
  createStaff,
  ensureTerminal,
  placeTrailers,
  removeTestYard,
  uniqueTag,
} from '../../support/yard-fixture';

// The yard's entry points without a running Next server. Only the sealed session cookie is
// replaced: it names a user of this database, and everything above it (the account lookup, the
// role check of requireUser and route(), the schemas, the services) is real.
// version 1: the seeded accounts have never ended their sessions (users.session_version starts at 1)
const session = vi.hoisted(() => ({ userId: undefined as string | undefined, version: 1 }));
vi.mock('@/lib/server/session', () => ({
  getSession: async () => ({ userId: session.userId, version: session.version }),
}));
vi.mock('next/cache', () => ({ revalidatePath: () => undefined }));
// next.config.mjs enables experimental.authInterrupts, which the Next build passes to forbidden()
// through this variable; without it forbidden() throws a different error.
process.env.__NEXT_EXPERIMENTAL_AUTH_INTERRUPTS = 'true';

const { clearTaskAction } = await import('@/app/(app)/yard/tasks/actions');
const { finishWalkAction, resolveOutcomeAction, startWalkAction } =
  await import('@/app/(app)/yard/walks/actions');
const layout = await import('@/app/(app)/admin/yard/actions');
const { POST: postMove } = await import('@/app/api/yard/moves/route');

const FORBIDDEN = 'NEXT_HTTP_ERROR_FALLBACK;403';
const form = (fields: Record<string, string | string[]>) => {
  const data = new FormData();
  for (const [k, v] of Object.entries(fields)) for (const one of [v].flat()) data.append(k, one);
  return data;
};
/** The digest of the error an action threw (Next's way of answering 403 or redirecting), or null. */
const thrownDigest = (run: Promise<unknown>) =>
  run.then(
    () => null,
    (e: { digest?: string }) => e.digest ?? String(e),
  );

let terminalId: string;
const ids = { driver: '', jockey: '', clerk: '', admin: '' };
let rowId: string;
let taskId: string;

beforeAll(async () => {
  terminalId = await ensureTerminal(db, 'HMYA');
  for (const role of ['driver', 'jockey', 'clerk', 'admin'] as const)
    ids[role] = await createStaff(db, terminalId, role);
  const tag = uniqueTag();
  const row = await createRowWithSlots(db, terminalId, `Row P${tag}`, 1);
  rowId = row.rowId;
  const [t] = await placeTrailers(db, terminalId, tag, [row.spots[0].id]);
  const [task] = await db
    .insert(yardTasks)
    .values({ terminalId, trailerId: t.id, kind: 'low_fuel', note: 'Fuel read 2/8.' })
    .returning({ id: yardTasks.id });
  taskId = task.id;
});
afterAll(async () => {
  await removeTestYard(db, terminalId);
  await pool.end();
});

const walksOfTerminal = async () =>
  (await db.select({ id: yardWalks.id }).from(yardWalks).where(eq(yardWalks.terminalId, terminalId))).length;

describe('yard server actions refuse roles outside the yard', () => {
  it('a driver gets 403 from every yard action and nothing is written', async () => {
    session.userId = ids.driver;
    const walksBefore = await walksOfTerminal();
    const uuid = '00000000-0000-4000-8000-000000000000';
    const attempts = [
      () => clearTaskAction(IDLE, form({ id: taskId })),
      () => startWalkAction(IDLE, form({ rowIds: [rowId] })),
      () => finishWalkAction(IDLE, form({ walkId: uuid })),
      () => resolveOutcomeAction(IDLE, form({ outcomeId: uuid, resolution: 'investigating' })),
    ];
    for (const attempt of attempts) expect(await thrownDigest(attempt())).toBe(FORBIDDEN);
    expect(await walksOfTerminal()).toBe(walksBefore);
    const [task] = await db.select().from(yardTasks).where(eq(yardTasks.id, taskId));
    expect(task.clearedAt).toBeNull();
  });

  it('without a session every yard action sends to the sign-in page', async () => {
    session.userId = undefined;
    const digest = await thrownDigest(clearTaskAction(IDLE, form({ id: taskId })));
    expect(digest).toMatch(/^NEXT_REDIRECT;replace;\/login;/);
  });

  it('a jockey may start a walk; an empty choice comes back under the rows', async () => {
    session.userId = ids.jockey;
    expect(await startWalkAction(IDLE, form({}))).toMatchObject({
      ok: false,
      fieldErrors: { rowIds: ['Choose at least one row.'] },
    });
    // success ends in a redirect to the new walk
    expect(await thrownDigest(startWalkAction(IDLE, form({ rowIds: [rowId] })))).toMatch(
      /^NEXT_REDIRECT;replace;\/yard\/walks\/[0-9a-f-]{36};/,
    );
  });
});

describe('layout actions are for admins only', () => {
  it('a jockey and a clerk get 403 from every layout action and no row is added', async () => {
    const name = `Row Q${uniqueTag()}`;
    for (const role of ['jockey', 'clerk'] as const) {
      session.userId = ids[role];
      const attempts = [
        () => layout.createRowAction(IDLE, form({ name })),
        () => layout.renameRowAction(IDLE, form({ id: rowId, name })),
        () => layout.createSpotAction(IDLE, form({ kind: 'door', label: name })),
        () => layout.renameSpotAction(IDLE, form({ id: rowId, name })),
        () => layout.retireSpotAction(IDLE, form({ id: rowId })),
      ];
      for (const attempt of attempts) expect(await thrownDigest(attempt())).toBe(FORBIDDEN);
    }
    const rows = await db
      .select()
      .from(yardRows)
      .where(and(eq(yardRows.terminalId, terminalId), eq(yardRows.name, name)));
    expect(rows).toEqual([]);
  });

  it("an admin adds a row; a taken name comes back under the field with the admin's typed value", async () => {
    session.userId = ids.admin;
    const name = `Row S${uniqueTag()}`;
    expect(await layout.createRowAction(IDLE, form({ name }))).toEqual({
      ok: true,
      message: `Row ${name} added.`,
    });
    expect(await layout.createRowAction(IDLE, form({ name }))).toEqual({
      ok: false,
      formError: `A row named ${name} already exists.`,
      fieldErrors: { name: [`A row named ${name} already exists.`] },
      values: { name },
    });
  });
});

describe('POST /api/yard/moves', () => {
  const post = (body: unknown) =>
    postMove(
      new Request('http://localhost/api/yard/moves', {
        method: 'POST',
        body: JSON.stringify(body),
        headers: { 'content-type': 'application/json' },
      }),
    );

  it('answers a bad unit and a bad slot together, each under its field', async () => {
    session.userId = ids.jockey;
    const res = await post({ unit: 'NO-SUCH-UNIT', target: 'NO-SUCH-SLOT' });
    expect(res.status).toBe(404);
    expect(await res.json()).toMatchObject({
      code: 'not_found',
      fieldErrors: {
        unit: ['No trailer with that unit number, VIN or label.'],
        target: ['No such slot or door in this yard.'],
      },
    });
    const empty = await post({ unit: ' ', target: '' });
    expect(empty.status).toBe(422);
    expect((await empty.json()).fieldErrors).toEqual({
      unit: ['Scan or type the unit number.'],
      target: ['Scan or type the target slot or door.'],
    });
  });

  it('refuses a driver with 403', async () => {
    session.userId = ids.driver;
    const res = await post({ unit: 'ANY', target: 'ANY' });
    expect(res.status).toBe(403);
    expect(await res.json()).toMatchObject({ code: 'forbidden' });
  });
});
