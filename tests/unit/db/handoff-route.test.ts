import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { eq } from 'drizzle-orm';
import { db, pool } from '@/db';
import { handoffs, holds } from '@/db/schema';
import { seed } from '@/db/seed';
import { handoffSubmitSchema, verificationCodeSchema } from '@/lib/validation/handoffs';
import { CAUTIONS } from '@/app/_components/caution';
import { actor, allOk, freshTrailer, recorded, submitInput } from './handoff-fixtures';

// The route handler with a signed-in driver, without a running Next server: auth is replaced,
// everything below it (zod, the submit service, the database) is real.
const signedIn = vi.hoisted(() => ({ user: null as unknown }));
vi.mock('@/lib/server/auth', () => ({ currentUser: async () => signedIn.user }));
vi.mock('next/server', () => ({ after: () => undefined }));
const { POST } = await import('@/app/api/handoffs/route');

const post = (body: string) =>
  POST(
    new Request('http://localhost/api/handoffs', {
      method: 'POST',
      body,
      headers: { 'content-type': 'application/json' },
    }),
  );

describe('POST /api/handoffs answers bad input with 4xx, never 500', () => {
  let carrierId: string;
  beforeAll(async () => {
    await seed();
    const d = await actor('D1001');
    carrierId = d.carrierId!;
    signedIn.user = { id: d.id, role: 'driver', carrierId: d.carrierId, terminalId: d.terminalId };
  });
  afterAll(async () => {
    await pool.end();
  });

  it('a body that is not JSON is a 400', async () => {
    const res = await post('{"kind": "drop",');
    expect(res.status).toBe(400);
    expect(await res.json()).toMatchObject({ code: 'bad_request' });
  });

  it('missing and wrong fields are a 422 with field messages', async () => {
    const res = await post(
      JSON.stringify({ kind: 'park', fuelEighths: 9, items: { 'left_side.skin': { condition: 'shiny' } } }),
    );
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.code).toBe('invalid');
    expect(Object.keys(body.fieldErrors)).toEqual(
      expect.arrayContaining(['kind', 'fuelEighths', 'trailerId', 'driverName', 'items']),
    );
  });

  it('bad values of every kind stay 4xx', async () => {
    const { trailer, checklist } = await freshTrailer();
    const good = submitInput(trailer.id, carrierId, 'drop', allOk(checklist), new Date());
    const variants: unknown[] = [
      null,
      [],
      'drop',
      42,
      { ...good, trailerId: 'not-a-uuid' },
      { ...good, trailerId: randomUUID() }, // unknown trailer → 404
      { ...good, carrierId: randomUUID() }, // not the driver's own carrier → 422
      { ...good, idempotencyKey: 'short' },
      { ...good, tractorNumber: '<script>' },
      // PostgreSQL refuses NUL in text: it must be refused as input, not fail the insert
      { ...good, driverName: 'Test\u0000Driver' },
      { ...good, note: 'gate\u0000note' },
      { ...good, items: { 'left_side.skin': { condition: 'ok', note: 'scuff\u0000' } } },
      { ...good, reefer: { ...good.reefer, setpointF: 'cold' } },
      { ...good, reefer: { ...good.reefer, preTripResult: 'pass', preTripAt: null } },
      {
        ...good,
        items: { 'tires.axle1.left_outer': { condition: 'ok', treadThirtySeconds: -3, isHoldingAir: true } },
      },
      { ...good, items: { 'not.on.this.trailer': { condition: 'ok' } } },
      { ...good, items: { 'left_side.skin': { condition: 'ok', photoIds: ['x'] } } },
    ];
    for (const v of variants) {
      const res = await post(JSON.stringify(v));
      expect(res.status, JSON.stringify(v).slice(0, 80)).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(await res.json()).toHaveProperty('message');
    }
  });

  it('a control character in a typed field is refused under that field', async () => {
    const { trailer, checklist } = await freshTrailer();
    const good = submitInput(trailer.id, carrierId, 'drop', allOk(checklist), new Date());
    const res = await post(JSON.stringify({ ...good, driverName: 'Test\u0000Driver', note: 'a\u0007b' }));
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.fieldErrors.driverName).toEqual(['Remove the special characters from this field.']);
    expect(body.fieldErrors.note).toEqual(['Remove the special characters from this note.']);
  });

  it('a handoff with a safety item unanswered is a 422 naming that item, and nothing is stored', async () => {
    const { trailer, checklist } = await freshTrailer();
    const items = allOk(checklist);
    delete items['undercarriage.tandem_pin.right_rear'];
    delete items['undercarriage.landing_gear.cross_shaft'];
    items['undercarriage.fuel_tank.leaks'] = { condition: 'ok' }; // leaking or not: unanswered
    const input = submitInput(trailer.id, carrierId, 'drop', items, new Date(), { isLoaded: true });
    input.reefer = { ...input.reefer!, isUnitOn: null };
    const res = await post(JSON.stringify(input));
    expect(res.status).toBe(422);
    const body = await res.json();
    expect(body.message).toBe('4 safety items are not answered: look at each and answer it.');
    expect(Object.keys(body.fieldErrors).sort()).toEqual([
      'items.undercarriage.fuel_tank.leaks',
      'items.undercarriage.landing_gear.cross_shaft',
      'items.undercarriage.tandem_pin.right_rear',
      'reefer.isUnitOn',
    ]);
    expect(body.fieldErrors['items.undercarriage.tandem_pin.right_rear']).toEqual([
      'Tandem locking pin, right rear is a safety item: look at it and answer it in this handoff.',
    ]);
    expect(await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id))).toHaveLength(0);
  });

  it('a hook of an out-of-service trailer is a 409 naming the holds, with the cautions to read', async () => {
    const { trailer, checklist } = await freshTrailer();
    const items = allOk(checklist);
    // 49 CFR 393.207(b): locking pins must not be disengaged
    items['undercarriage.tandem_pin.left_front'] = { condition: 'ok', isEngaged: false };
    const d = await actor('D1001');
    await recorded(submitInput(trailer.id, carrierId, 'drop', items, new Date(Date.now() - 60_000)), d, {
      now: new Date(Date.now() - 60_000),
      sendReceipt: false,
    });
    const res = await post(
      JSON.stringify(submitInput(trailer.id, carrierId, 'hook', allOk(checklist), new Date())),
    );
    expect(res.status).toBe(409);
    const body = await res.json();
    expect(body).toMatchObject({
      code: 'conflict',
      holds: [{ reason: 'Tandem locking pin, left front is not engaged.', severity: 'out_of_service' }],
      cautions: [CAUTIONS.outOfService, CAUTIONS.inspection],
    });
    expect(body.holds[0].caution).toContain('qualified technician');
  });

  it('a "yard moves only" trailer is refused at the hook like out of service, with reason and cautions', async () => {
    const { trailer, checklist } = await freshTrailer();
    const items = allOk(checklist);
    // common practice: a trailer without a usable spare stays in the yard (default policy: restricted, yard only)
    items['undercarriage.spare_tire'] = { condition: 'missing' };
    const d = await actor('D1001');
    await recorded(submitInput(trailer.id, carrierId, 'drop', items, new Date(Date.now() - 60_000)), d, {
      now: new Date(Date.now() - 60_000),
      sendReceipt: false,
    });
    const [stored] = await db.select().from(holds).where(eq(holds.trailerId, trailer.id));
    expect(stored).toMatchObject({ restriction: 'yard_only' });
    expect(stored.caution).toContain('Chock the wheels'); // the hold's caution is kept with it
    const res = await post(
      JSON.stringify(submitInput(trailer.id, carrierId, 'hook', allOk(checklist), new Date())),
    );
    expect(res.status).toBe(409);
    const body = await res.json();
    expect(body.message).toBe(
      `Trailer ${trailer.unitNumber} is restricted to yard moves only and may not leave the gate.`,
    );
    expect(body.holds).toMatchObject([
      {
        reason: 'Spare tire is missing.',
        severity: 'restricted',
        restriction: 'yard_only',
        caution: stored.caution,
      },
    ]);
    expect(body.cautions).toEqual([CAUTIONS.yardOnly, CAUTIONS.inspection]);
    expect(await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id))).toHaveLength(1);
  });

  it('a "no perishable loads" trailer: the hook asks, refuses a perishable load, records "not perishable"', async () => {
    const { trailer, checklist } = await freshTrailer();
    const items = allOk(checklist);
    // common practice: a hinge that does not lock leaves an air gap at the door
    items['rear.door_left.hinge_2'] = { condition: 'ok', isLocking: false };
    const d = await actor('D1001');
    await recorded(submitInput(trailer.id, carrierId, 'drop', items, new Date(Date.now() - 60_000)), d, {
      now: new Date(Date.now() - 60_000),
      sendReceipt: false,
    });
    const hook = (extra: object) =>
      post(JSON.stringify(submitInput(trailer.id, carrierId, 'hook', allOk(checklist), new Date(), extra)));

    const asked = await hook({});
    expect(asked.status).toBe(422);
    expect((await asked.json()).fieldErrors).toEqual({
      isLoadPerishable: [
        'This trailer may not carry a perishable load: say whether this load is perishable.',
      ],
    });

    const perishable = await hook({ isLoadPerishable: true });
    expect(perishable.status).toBe(409);
    const refusal = await perishable.json();
    expect(refusal.message).toContain('may not carry a perishable load');
    expect(refusal.holds[0]).toMatchObject({
      restriction: 'no_perishable',
      reason: 'Left door hinge 2 (from top) does not lock.',
    });
    expect(refusal.cautions).toEqual([CAUTIONS.noPerishable, CAUTIONS.inspection]);

    const dry = await hook({ isLoadPerishable: false });
    expect(dry.status).toBe(201);
    const rows = await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id));
    expect(rows.map((r) => [r.kind, r.isLoadPerishable])).toEqual(
      expect.arrayContaining([
        ['drop', null],
        ['hook', false],
      ]),
    );
  });

  it('only gate roles record a handoff: a jockey gets 403, nobody signed in 401, and nothing is stored', async () => {
    const { trailer, checklist } = await freshTrailer();
    const body = JSON.stringify(submitInput(trailer.id, carrierId, 'drop', allOk(checklist), new Date()));
    const driver = signedIn.user;
    try {
      const j = await actor('jockey@bramblecrest.example');
      signedIn.user = { id: j.id, role: 'jockey', carrierId: j.carrierId, terminalId: j.terminalId };
      const asJockey = await post(body);
      expect(asJockey.status).toBe(403);
      expect(await asJockey.json()).toMatchObject({ code: 'forbidden' });
      signedIn.user = null;
      const signedOut = await post(body);
      expect(signedOut.status).toBe(401);
      expect(await signedOut.json()).toMatchObject({ code: 'unauthenticated' });
    } finally {
      signedIn.user = driver;
    }
    expect(await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id))).toHaveLength(0);
  });

  it('a good body is 201, and the same body again is 200 with the same handoff', async () => {
    const { trailer, checklist } = await freshTrailer();
    const body = JSON.stringify(submitInput(trailer.id, carrierId, 'drop', allOk(checklist), new Date()));
    const first = await post(body);
    expect(first.status).toBe(201);
    const again = await post(body);
    expect(again.status).toBe(200);
    expect((await again.json()).handoff.id).toBe((await first.json()).handoff.id);
  });
});

describe('verification code input', () => {
  it('reads a code typed with a dash, lower case, and O/I/L misread for 0/1', () => {
    // Crockford base32 decoding rules (Douglas Crockford, "Base32", crockford.com): O→0, I and L→1
    expect(verificationCodeSchema.parse(' 7kq2-m9xd ')).toBe('7KQ2M9XD');
    expect(verificationCodeSchema.parse('O1IL-2345')).toBe('01112345');
    expect(verificationCodeSchema.safeParse('7KQ2-M9XU').success).toBe(false); // U is not a Crockford symbol
    expect(verificationCodeSchema.safeParse('7KQ2M9X').success).toBe(false);
  });

  it('the submit schema turns an empty seal number into null and upper-cases the tractor', () => {
    const parsed = handoffSubmitSchema.parse({
      idempotencyKey: 'k'.repeat(20),
      trailerId: randomUUID(),
      kind: 'drop',
      carrierId: randomUUID(),
      driverName: 'A B',
      tractorNumber: 'tr-9',
      isLoaded: false,
      sealNumber: '',
      fuelEighths: null,
      reefer: null,
      items: {},
    });
    expect(parsed.sealNumber).toBeNull();
    expect(parsed.tractorNumber).toBe('TR-9');
  });
});
