import { randomUUID } from 'node:crypto';
import { and, eq, inArray, isNotNull, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { isLockNotAvailable, isUniqueViolation } from '@/db/errors';
import { getPhotoForViewer, getReceipt } from '@/db/queries/handoffs';
import { seed } from '@/db/seed';
import {
  carriers,
  caseEvents,
  cases,
  emailOutbox,
  findings,
  handoffItems,
  handoffs,
  holds,
  photos,
  terminals,
  trailers,
  users,
} from '@/db/schema';
import { hashableFromRows } from '@/lib/handoffs/canonical';
import { handoffContentHash, verifyChain } from '@/lib/handoffs/hash';
import { OUT_OF_SERVICE_CAUTION } from '@/lib/engine';
import { renderCoded, renderReason } from '@/lib/i18n/reasons';
import { isRefusal } from '@/lib/result';
import { chainKey } from '@/lib/server/env';
import { verifyTrailerChain } from '@/lib/server/handoffs/chain';
import { submitHandoff } from '@/lib/server/handoffs/submit';
import { actor, allOk, freshTrailer, recorded, refused, storedPhoto, submitInput } from './handoff-fixtures';

const HOUR = 3_600_000;
const T0 = new Date('2026-11-02T15:00:00Z');
const at = (h: number) => new Date(T0.getTime() + h * HOUR);

describe('handoff submit service (real database)', () => {
  let d1: Awaited<ReturnType<typeof actor>>;
  let d2: Awaited<ReturnType<typeof actor>>;
  beforeAll(async () => {
    await seed();
    d1 = await actor('D1001');
    d2 = await actor('D2001');
  });
  afterAll(async () => {
    await pool.end();
  });

  it('damage with no earlier inspection opens a case marked "no earlier inspection: not attributed"', async () => {
    const { trailer, checklist } = await freshTrailer();
    const items = allOk(checklist);
    items['rear.door_right.panel'] = { condition: 'damaged', note: 'Panel bent at the bottom corner' };
    items['left_side.rivets'] = { condition: 'minor', note: 'A few rivets dull' }; // cosmetic: no case
    const h = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', items, at(0)), d1, {
      now: at(0),
      sendReceipt: false,
    });
    const [c] = await db.select().from(cases).where(eq(cases.handoffId, h.handoffId));
    expect(c).toMatchObject({
      state: 'open',
      proposedCarrierId: null,
      attributionNote: 'no earlier inspection: not attributed',
      attributionNoteCode: 'case.not_attributed',
      attributionNoteParams: {},
    });
    const rows = await db.select().from(findings).where(eq(findings.handoffId, h.handoffId));
    const panel = rows.find((f) => f.itemKey === 'rear.door_right.panel')!;
    expect(panel).toMatchObject({ kind: 'first_record', caseId: c.id, responsibleParty: null });
    expect(panel.reasonCode).toBe('attribution.none');
    const [{ zone }] = await db
      .select({ zone: terminals.timeZone })
      .from(terminals)
      .where(eq(terminals.id, c.terminalId));
    expect(renderReason(panel.reasonCode!, panel.reasonParams, 'en', zone)).toBe(panel.reason);
    expect(panel.reason).toContain('cannot be attributed to anyone');
    expect(rows.find((f) => f.itemKey === 'left_side.rivets')?.caseId).toBeNull();
    const [opened] = await db.select().from(caseEvents).where(eq(caseEvents.caseId, c.id));
    expect(opened.note).toContain('Marked "no earlier inspection: not attributed"');
  });

  it('a first record with every item ok or only cosmetic marks opens no case', async () => {
    const { trailer, checklist } = await freshTrailer('dry_van');
    const items = allOk(checklist);
    items['left_side.skin'] = { condition: 'minor' };
    const h = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', items, at(0)), d1, {
      now: at(0),
      sendReceipt: false,
    });
    expect(await db.select().from(cases).where(eq(cases.handoffId, h.handoffId))).toHaveLength(0);
  });

  it('a retried submit with the same key returns the same handoff and stores one', async () => {
    const { trailer, checklist } = await freshTrailer();
    const input = submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0));
    const first = await recorded(input, d1, { now: at(0) });
    const second = await recorded(input, d1, { now: at(0.1) });
    expect(first.isReplay).toBe(false);
    expect(second).toEqual({ ...first, isReplay: true });
    const rows = await db
      .select({ id: handoffs.id })
      .from(handoffs)
      .where(eq(handoffs.trailerId, trailer.id));
    expect(rows).toHaveLength(1);
    const [t] = await db.select().from(trailers).where(eq(trailers.id, trailer.id));
    expect(t.status).toBe('in_yard');
    expect(t.currentSpotId).not.toBeNull();
    expect(t.gateInAt?.getTime()).toBe(at(0).getTime());
    // the receipt e-mail went into the outbox in the same transaction, to the carrier (D1001 has no e-mail)
    const mail = await db.select().from(emailOutbox).where(eq(emailOutbox.relatedId, first.handoffId));
    expect(mail).toHaveLength(1);
    expect(mail[0].toAddress).toBe('claims@bramblecrest.example');
    expect(mail[0].ccAddress).toBeNull();
    expect(mail[0].textBody).toContain(trailer.unitNumber);
    expect(mail[0].textBody).toContain(
      `${first.verificationCode.slice(0, 4)}-${first.verificationCode.slice(4)}`,
    );
  });

  it('a driver with an e-mail address gets the receipt, with the carrier contact in copy', async () => {
    const { trailer, checklist } = await freshTrailer();
    const [carrier] = await db.select().from(carriers).where(eq(carriers.id, d2.carrierId!));
    await db.update(users).set({ email: 'driver.d2001@example.test' }).where(eq(users.id, d2.id));
    try {
      const h = await recorded(submitInput(trailer.id, d2.carrierId!, 'drop', allOk(checklist), at(0)), d2, {
        now: at(0),
      });
      const [mail] = await db.select().from(emailOutbox).where(eq(emailOutbox.relatedId, h.handoffId));
      expect(mail.toAddress).toBe('driver.d2001@example.test');
      expect(mail.ccAddress).toBe(carrier.contactEmail);
    } finally {
      await db.update(users).set({ email: null }).where(eq(users.id, d2.id));
    }
  });

  it("a Spanish-reading driver's receipt is in Spanish; the carrier's copy follows the carrier's language", async () => {
    const [carrier] = await db.select().from(carriers).where(eq(carriers.id, d2.carrierId!));
    await db
      .update(users)
      .set({ email: 'driver.d2001@example.test', locale: 'es' })
      .where(eq(users.id, d2.id));
    try {
      // carrier in English: two letters, each in its reader's language
      const first = await freshTrailer();
      const h = await recorded(
        submitInput(first.trailer.id, d2.carrierId!, 'drop', allOk(first.checklist), at(0)),
        d2,
        { now: at(0) },
      );
      const mails = await db.select().from(emailOutbox).where(eq(emailOutbox.relatedId, h.handoffId));
      const toDriver = mails.find((m) => m.toAddress === 'driver.d2001@example.test');
      const toCarrier = mails.find((m) => m.toAddress === carrier.contactEmail);
      expect(mails).toHaveLength(2);
      expect(toDriver?.ccAddress).toBeNull();
      expect(toDriver?.subject).toMatch(/^Comprobante de Hitchmark: entrega de la caja /);
      expect(toDriver?.textBody).toContain(`Caja: ${first.trailer.unitNumber}`);
      expect(toDriver?.textBody).toContain('Código de verificación:');
      expect(toCarrier?.subject).toMatch(/^Hitchmark receipt: drop of trailer /);
      expect(toCarrier?.textBody).toContain('Verification code:');
      // carrier in Spanish too: one Spanish letter, the carrier's contact in copy
      await db.update(carriers).set({ locale: 'es' }).where(eq(carriers.id, carrier.id));
      const second = await freshTrailer();
      const h2 = await recorded(
        submitInput(second.trailer.id, d2.carrierId!, 'drop', allOk(second.checklist), at(1)),
        d2,
        { now: at(1) },
      );
      const [only, ...rest] = await db
        .select()
        .from(emailOutbox)
        .where(eq(emailOutbox.relatedId, h2.handoffId));
      expect(rest).toEqual([]);
      expect(only.ccAddress).toBe(carrier.contactEmail);
      expect(only.textBody).toContain('Hallazgos (0):');
    } finally {
      await db.update(users).set({ email: null, locale: 'en' }).where(eq(users.id, d2.id));
      await db.update(carriers).set({ locale: carrier.locale }).where(eq(carriers.id, carrier.id));
    }
  });

  it('refuses a second submit while another one holds the trailer row (55P03 → conflict)', async () => {
    const { trailer, checklist } = await freshTrailer();
    const client = await pool.connect();
    try {
      await client.query('begin');
      await client.query('select id from trailers where id = $1 for update', [trailer.id]);
      const e = await refused(submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0)), d1, {
        now: at(0),
      });
      expect(e.code).toBe('conflict');
      expect(e.message).toMatch(/being recorded right now/);
    } finally {
      await client.query('rollback');
      client.release();
    }
    expect(await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id))).toHaveLength(0);
  });

  it('two simultaneous submits for one trailer: one succeeds, the other gets a conflict', async () => {
    const { trailer, checklist } = await freshTrailer();
    const results = await Promise.all([
      submitHandoff(submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0)), d1, {
        now: at(0),
      }),
      submitHandoff(submitInput(trailer.id, d2.carrierId!, 'drop', allOk(checklist), at(0)), d2, {
        now: at(0),
      }),
    ]);
    const ok = results.filter((r) => r.ok);
    const refusals = results.filter(isRefusal);
    expect(ok).toHaveLength(1);
    expect(refusals).toHaveLength(1);
    expect(refusals[0].code).toBe('conflict');
    expect(await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id))).toHaveLength(1);
  });

  it('a pin not engaged places an out-of-service hold, and a hook of that trailer is refused with the reason', async () => {
    const { trailer, checklist } = await freshTrailer();
    const items = allOk(checklist);
    // 49 CFR 393.207(b): locking pins must not be disengaged; common practice: any one pin counts
    items['undercarriage.tandem_pin.left_rear'] = { condition: 'ok', isEngaged: false };
    const drop = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', items, at(0)), d1, {
      now: at(0),
    });
    const placed = await db.select().from(holds).where(eq(holds.handoffId, drop.handoffId));
    expect(placed.map((h) => [h.ruleKey, h.severity])).toEqual([['pin_not_engaged', 'out_of_service']]);
    const f = await db
      .select()
      .from(findings)
      .where(and(eq(findings.handoffId, drop.handoffId), eq(findings.kind, 'pin_not_engaged')));
    expect(f).toHaveLength(1);

    const e = await refused(submitInput(trailer.id, d2.carrierId!, 'hook', allOk(checklist), at(2)), d2, {
      now: at(2),
    });
    expect(e.code).toBe('conflict');
    expect(e.detail?.holds).toMatchObject([
      {
        reason: 'Tandem locking pin, left rear is not engaged.',
        // the stored hold keeps its code beside the English, so the gate can say it in the driver's language
        reasonCoded: {
          code: 'hold.pin_not_engaged',
          params: { item: 'undercarriage.tandem_pin.left_rear', label: 'Tandem locking pin, left rear' },
        },
        severity: 'out_of_service',
        restriction: null,
        caution: renderCoded(OUT_OF_SERVICE_CAUTION, 'en', 'UTC'),
        cautionCoded: OUT_OF_SERVICE_CAUTION,
      },
    ]);
    const [t] = await db.select().from(trailers).where(eq(trailers.id, trailer.id));
    expect(t.status).toBe('in_yard');
    expect(await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id))).toHaveLength(1);
  });

  it('a hook whose own pickup report finds a pin not engaged is refused, and the trailer is held for the next driver', async () => {
    const { trailer, checklist } = await freshTrailer();
    await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0)), d1, {
      now: at(0),
    });
    const items = allOk(checklist);
    // 49 CFR 393.207(b): locking pins must not be disengaged; 49 CFR 396.7: not operated likely to break down
    items['undercarriage.tandem_pin.right_front'] = { condition: 'ok', isEngaged: false };
    const e = await refused(submitInput(trailer.id, d2.carrierId!, 'hook', items, at(1)), d2, { now: at(1) });
    expect(e.code).toBe('conflict');
    // the caller reads the reasons only; the holds themselves were placed by the service
    expect(e.detail).toEqual({
      holds: [
        {
          reason: 'Tandem locking pin, right front is not engaged.',
          reasonCoded: {
            code: 'hold.pin_not_engaged',
            params: {
              item: 'undercarriage.tandem_pin.right_front',
              label: 'Tandem locking pin, right front',
            },
          },
          severity: 'out_of_service',
          restriction: null,
          caution: renderCoded(OUT_OF_SERVICE_CAUTION, 'en', 'UTC'),
          cautionCoded: OUT_OF_SERVICE_CAUTION,
        },
      ],
    });
    const placed = await db
      .select()
      .from(holds)
      .where(and(eq(holds.trailerId, trailer.id), sql`${holds.releasedAt} is null`));
    expect(placed.map((h) => [h.ruleKey, h.severity, h.handoffId])).toEqual([
      ['pin_not_engaged', 'out_of_service', null],
    ]);
    // the next driver's hook is refused by that stored hold, even with a clean report
    const next = await refused(submitInput(trailer.id, d2.carrierId!, 'hook', allOk(checklist), at(2)), d2, {
      now: at(2),
    });
    expect(next.message).toMatch(/out of service/);
    expect(await db.select().from(handoffs).where(eq(handoffs.trailerId, trailer.id))).toHaveLength(1);
  });

  it('new damage after another carrier held the trailer: finding attributed to them, one case, hash chain links', async () => {
    const { trailer, checklist } = await freshTrailer();
    const h1 = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0)), d1, {
      now: at(0),
    });
    const h2 = await recorded(submitInput(trailer.id, d2.carrierId!, 'hook', allOk(checklist), at(5)), d2, {
      now: at(5),
    });

    const damaged = allOk(checklist);
    damaged['left_side.skin'] = {
      condition: 'damaged',
      isInsulationShowing: true,
      note: 'Torn skin, 30 cm, insulation showing',
    };
    // damage without a photo is refused, and nothing is stored
    const missing = await refused(submitInput(trailer.id, d2.carrierId!, 'drop', damaged, at(30)), d2, {
      now: at(30),
    });
    expect(missing.code).toBe('invalid');
    expect(missing.fieldErrors?.['items.left_side.skin']).toEqual([
      'New or worse damage needs at least one photo.',
    ]);

    const photoId = await storedPhoto(trailer.id, d2.id);
    damaged['left_side.skin'].photoIds = [photoId];
    const h3 = await recorded(submitInput(trailer.id, d2.carrierId!, 'drop', damaged, at(30)), d2, {
      now: at(30),
    });

    const [f] = await db
      .select()
      .from(findings)
      .where(and(eq(findings.handoffId, h3.handoffId), eq(findings.itemKey, 'left_side.skin')));
    expect(f.kind).toBe('new');
    expect(f.previousCondition).toBe('ok');
    expect(f.previousHandoffId).toBe(h2.handoffId);
    expect(f.responsibleCarrierId).toBe(d2.carrierId);
    expect(f.confidence).toBe('high');
    const [c] = await db.select().from(cases).where(eq(cases.handoffId, h3.handoffId));
    expect(c.state).toBe('open');
    expect(c.proposedCarrierId).toBe(d2.carrierId);
    expect(f.caseId).toBe(c.id);
    const events = await db
      .select()
      .from(caseEvents)
      .where(eq(caseEvents.caseId, c.id))
      .orderBy(caseEvents.createdAt);
    expect(events.map((e) => e.kind).sort()).toEqual(['estimated', 'opened']);
    expect(c.estimateCents).toBeGreaterThan(0);
    // insulation showing → restricted, no perishable loads (common practice, engine rule)
    const hl = await db.select().from(holds).where(eq(holds.handoffId, h3.handoffId));
    expect(hl.map((h) => [h.ruleKey, h.severity, h.restriction])).toEqual([
      ['insulation_showing', 'restricted', 'no_perishable'],
    ]);
    const [p] = await db.select().from(photos).where(eq(photos.id, photoId));
    expect(p.handoffId).toBe(h3.handoffId);

    // chain: each handoff names the one before; recomputing from the stored rows gives the stored hashes
    const ids = [h1.handoffId, h2.handoffId, h3.handoffId];
    const rows = await db.select().from(handoffs).where(inArray(handoffs.id, ids));
    rows.sort((a, b) => a.occurredAt.getTime() - b.occurredAt.getTime());
    expect(rows.map((r) => r.prevHash)).toEqual([null, rows[0].contentHash, rows[1].contentHash]);
    const links = await Promise.all(
      rows.map(async (r) => {
        const it = await db.select().from(handoffItems).where(eq(handoffItems.handoffId, r.id));
        const ph = await db.select({ sha256: photos.sha256 }).from(photos).where(eq(photos.handoffId, r.id));
        return {
          id: r.id,
          storedHash: r.contentHash,
          storedPrevHash: r.prevHash,
          hashVersion: r.hashVersion,
          recomputed: hashableFromRows(
            r,
            it,
            ph.map((x) => x.sha256),
            r.hashVersion,
          ),
        };
      }),
    );
    expect(verifyChain(links, chainKey())).toEqual({ ok: true, count: 3 });
    // a changed pin reading in the middle record would not match its stored hash
    const tampered = structuredClone(links);
    tampered[1].recomputed.items = tampered[1].recomputed.items.map((i) =>
      i.itemKey === 'undercarriage.tandem_pin.left_front' ? { ...i, details: { isEngaged: false } } : i,
    );
    expect(handoffContentHash(tampered[1].recomputed, chainKey())).not.toBe(rows[1].contentHash);
    expect(verifyChain(tampered, chainKey())).toEqual({
      ok: false,
      brokenAt: rows[1].id,
      why: 'content_changed',
    });
  });

  it('the database refuses to change or delete a stored handoff', async () => {
    const { trailer, checklist } = await freshTrailer();
    const h = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0)), d1, {
      now: at(0),
    });
    // 42501 insufficient_privilege: the app's role has no UPDATE or DELETE on record tables
    // (db/migrations/0004_app-role-grants.sql); the owner meets the append-only trigger (HM001) behind it
    const refused = {
      cause: expect.objectContaining({ code: '42501', message: expect.stringMatching(/permission denied/) }),
    };
    await expect(
      db.update(handoffs).set({ driverName: 'Someone else' }).where(eq(handoffs.id, h.handoffId)),
    ).rejects.toMatchObject(refused);
    await expect(
      db.delete(handoffItems).where(eq(handoffItems.handoffId, h.handoffId)),
    ).rejects.toMatchObject(refused);
  });

  it('a second row with the same draft key violates handoffs_idempotency_key_unique, the constraint the submit retries on', async () => {
    const { trailer, checklist } = await freshTrailer();
    const h = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', allOk(checklist), at(0)), d1, {
      now: at(0),
    });
    const [row] = await db.select().from(handoffs).where(eq(handoffs.id, h.handoffId));
    const copy = { ...row, id: randomUUID(), verificationCode: 'ZZZZ0000', createdAt: new Date() };
    const error = await db
      .insert(handoffs)
      .values(copy)
      .then(
        () => null,
        (e: unknown) => e,
      );
    // 23505 is PostgreSQL's unique_violation (PostgreSQL manual, appendix "PostgreSQL Error Codes")
    expect(error).toMatchObject({ cause: { code: '23505', constraint: 'handoffs_idempotency_key_unique' } });
    expect(isUniqueViolation(error, 'handoffs_idempotency_key_unique')).toBe(true);
    expect(isUniqueViolation(error, 'handoffs_verification_code_unique')).toBe(false);
    expect(isLockNotAvailable(error)).toBe(false);
  });

  it('the chain counts the photos the submit hashed: a photo that stops being stored breaks it', async () => {
    const { trailer, checklist } = await freshTrailer();
    const items = allOk(checklist);
    const photoId = await storedPhoto(trailer.id, d1.id);
    items['rear.door_right.panel'] = { condition: 'minor', note: 'Scuff', photoIds: [photoId] };
    await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', items, at(0)), d1, { now: at(0) });
    const h = await recorded(submitInput(trailer.id, d1.carrierId!, 'hook', allOk(checklist), at(3)), d1, {
      now: at(3),
    });
    expect(await verifyTrailerChain(trailer.id)).toEqual({ check: { ok: true, count: 2 }, brokenAt: null });
    // the receipt no longer shows the photo, so the record is not what was hashed
    await db.update(photos).set({ status: 'rejected' }).where(eq(photos.id, photoId));
    const [drop] = await db.select().from(photos).where(eq(photos.id, photoId));
    expect(await verifyTrailerChain(trailer.id)).toEqual({
      check: { ok: false, brokenAt: drop.handoffId, why: 'content_changed' },
      brokenAt: at(0),
    });
    // a photo pointed at a record afterwards, never stored, is not part of it
    await db.update(photos).set({ status: 'stored' }).where(eq(photos.id, photoId));
    const stray = await storedPhoto(trailer.id, d1.id);
    await db.update(photos).set({ status: 'pending', handoffId: h.handoffId }).where(eq(photos.id, stray));
    expect((await verifyTrailerChain(trailer.id)).check).toEqual({ ok: true, count: 2 });
  });

  it("a driver reads only their own carrier's receipts and photos; staff read all", async () => {
    const { trailer, checklist } = await freshTrailer();
    const items = allOk(checklist);
    const photoId = await storedPhoto(trailer.id, d1.id);
    items['rear.door_left.panel'] = {
      condition: 'minor',
      note: 'Scuff on the left door',
      photoIds: [photoId],
    };
    const h = await recorded(submitInput(trailer.id, d1.carrierId!, 'drop', items, at(0)), d1, {
      now: at(0),
    });
    const clerk = await actor('clerk@bramblecrest.example');
    expect((await getReceipt(h.handoffId, d1))?.unitNumber).toBe(trailer.unitNumber);
    expect(await getReceipt(h.handoffId, d2)).toBeNull();
    expect((await getReceipt(h.handoffId, clerk))?.photos.map((p) => p.id)).toEqual([photoId]);
    expect(await getPhotoForViewer(photoId, d1)).not.toBeNull();
    expect(await getPhotoForViewer(photoId, d2)).toBeNull();
    expect(await getPhotoForViewer(photoId, clerk)).not.toBeNull();
  });

  it("refuses items that are not on the trailer's checklist and pins without an answer", async () => {
    const { trailer, checklist } = await freshTrailer('dry_van');
    const items = allOk(checklist);
    items['reefer_unit.housing'] = { condition: 'ok' }; // a dry van has no reefer unit
    items['undercarriage.tandem_pin.right_front'] = { condition: 'ok' };
    const e = await refused(submitInput(trailer.id, d1.carrierId!, 'drop', items, at(0)), d1, { now: at(0) });
    expect(e.code).toBe('invalid');
    expect(Object.keys(e.fieldErrors ?? {}).sort()).toEqual([
      'items.reefer_unit.housing',
      'items.undercarriage.tandem_pin.right_front',
    ]);
  });

  it('the seeded history went through the submit service: outside trips, cases, holds, and intact chains', async () => {
    const outsideTrips = await db
      .select({ n: sql<number>`count(*)::int` })
      .from(handoffs)
      .innerJoin(carriers, eq(carriers.id, handoffs.carrierId))
      .where(and(eq(carriers.isHomeCarrier, false), sql`${handoffs.idempotencyKey} like 'seed-%'`));
    expect(outsideTrips[0].n).toBeGreaterThan(10);
    const seededCases = await db
      .select({ proposed: cases.proposedCarrierId, home: carriers.isHomeCarrier })
      .from(cases)
      .innerJoin(handoffs, eq(handoffs.id, cases.handoffId))
      .leftJoin(carriers, eq(carriers.id, cases.proposedCarrierId))
      .where(sql`${handoffs.idempotencyKey} like 'seed-%'`);
    // every seeded damage trip was an outside carrier's hook and drop, so the case proposes that carrier
    expect(seededCases.length).toBeGreaterThan(3);
    expect(seededCases.every((c) => c.home === false)).toBe(true);
    const rules = await db
      .selectDistinct({ rule: holds.ruleKey })
      .from(holds)
      .innerJoin(handoffs, eq(handoffs.id, holds.handoffId))
      .where(sql`${handoffs.idempotencyKey} like 'seed-%'`);
    expect(rules.map((r) => r.rule)).toEqual(expect.arrayContaining(['pin_not_engaged', 'spare_unusable']));
    const withHistory = await db
      .selectDistinct({ id: handoffs.trailerId })
      .from(handoffs)
      .where(isNotNull(handoffs.prevHash))
      .limit(25);
    expect(withHistory.length).toBeGreaterThan(10);
    for (const t of withHistory) expect((await verifyTrailerChain(t.id)).check.ok).toBe(true);
  });
});
