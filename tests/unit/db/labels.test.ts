import { and, eq, isNull } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db, pool } from '@/db';
import { getCurrentLabel, getLabel } from '@/db/queries/labels';
import { getTrailerByUnit, getTrailerByVin } from '@/db/queries/trailer-lookup';
import { auditLog, labels, trailers, users, yardRows, yardSpots } from '@/db/schema';
import { seed } from '@/db/seed';
import { signLabelToken } from '@/lib/engine/identity/label-token';
import { labelStanding } from '@/lib/labels/standing';
import {
  labelLink,
  labelToken,
  prepareLabelSheet,
  reissueLabel,
  resolveLabelToken,
} from '@/lib/server/labels';

process.env.LABEL_SECRET ??= 'a-test-secret-for-hitchmark-labels-0123456789';
let clerk: { id: string };

async function reissue(trailerId: string) {
  const result = await reissueLabel(clerk, { trailerId });
  if (!result.ok) throw new Error(`re-issue refused: ${result.message}`);
  return result.value;
}

async function trailerByUnit(unit: string) {
  const [t] = await db
    .select({ id: trailers.id, vin: trailers.vin })
    .from(trailers)
    .where(eq(trailers.unitNumber, unit));
  return t;
}

describe('labels and trailer lookup (fresh test database)', () => {
  beforeAll(async () => {
    await seed();
    [clerk] = await db
      .select({ id: users.id })
      .from(users)
      .where(eq(users.email, 'clerk@bramblecrest.example'));
  });
  afterAll(async () => {
    await pool.end();
  });

  it('re-issue revokes the old label, makes the new one current and writes the audit log', async () => {
    const t = await trailerByUnit('R53010');
    const before = await getCurrentLabel(t.id);
    expect(before).not.toBeNull();
    const result = await reissue(t.id);
    expect(result.revokedLabelIds).toEqual([before!.id]);
    const after = await getCurrentLabel(t.id);
    expect(after!.id).toBe(result.label.id);
    expect(after!.id).not.toBe(before!.id);
    const old = labelStanding((await getLabel(before!.id))!, after);
    expect(old).toEqual({ isCurrent: false, replacedAt: expect.any(Date) });
    const audit = await db
      .select()
      .from(auditLog)
      .where(and(eq(auditLog.action, 'label.reissue'), eq(auditLog.entityId, t.id)));
    expect(audit).toHaveLength(1);
    expect(audit[0].detail).toMatchObject({ labelId: after!.id, revokedLabelIds: [before!.id] });
  });

  it('two re-issues at once leave exactly one unrevoked label (row lock on the trailer)', async () => {
    const t = await trailerByUnit('R53011');
    await Promise.all([reissue(t.id), reissue(t.id)]);
    const open = await db
      .select({ id: labels.id })
      .from(labels)
      .where(and(eq(labels.trailerId, t.id), isNull(labels.revokedAt)));
    expect(open).toHaveLength(1);
  });

  it('re-issuing an unknown trailer is refused as not found and writes nothing', async () => {
    const before = await db.select({ id: labels.id }).from(labels);
    const result = await reissueLabel(clerk, { trailerId: '00000000-0000-4000-8000-000000000000' });
    expect(result).toMatchObject({ ok: false, code: 'not_found' });
    expect(await db.select({ id: labels.id }).from(labels)).toHaveLength(before.length);
  });

  it('resolves a current token, refuses a revoked one with its date and a forged one as not ours', async () => {
    const t = await trailerByUnit('R53012');
    const old = (await getCurrentLabel(t.id))!;
    const oldToken = labelToken({ id: old.id, trailerId: t.id });
    expect(await resolveLabelToken(oldToken)).toEqual({ ok: true, trailerId: t.id, labelId: old.id });
    const { label } = await reissue(t.id);
    expect(await resolveLabelToken(oldToken)).toMatchObject({
      ok: false,
      error: 'revoked',
      replacedAt: expect.any(Date),
    });
    expect(await resolveLabelToken(labelToken({ id: label.id, trailerId: t.id }))).toMatchObject({
      ok: true,
      labelId: label.id,
    });
    // signed with another secret, or a real label id paired with another trailer: not ours
    const other = await trailerByUnit('R53013');
    expect(
      await resolveLabelToken(signLabelToken({ labelId: label.id, trailerId: t.id }, 'x'.repeat(40))),
    ).toEqual({ ok: false, error: 'not_ours' });
    expect(await resolveLabelToken(labelToken({ id: label.id, trailerId: other.id }))).toEqual({
      ok: false,
      error: 'not_ours',
    });
    const flipped = oldToken.slice(0, 10) + (oldToken[10] === 'A' ? 'B' : 'A') + oldToken.slice(11);
    expect(await resolveLabelToken(flipped)).toEqual({ ok: false, error: 'not_ours' });
  });

  it('keeps the label link short enough for a version 8 QR at level Q (≤ 108 bytes, ISO/IEC 18004)', async () => {
    const t = await trailerByUnit('R53014');
    const label = (await getCurrentLabel(t.id))!;
    const link = labelLink({ id: label.id, trailerId: t.id });
    expect(link).toMatch(/\/l\/[A-Za-z0-9_-]{68}$/);
    expect(Buffer.byteLength(link)).toBeLessThanOrEqual(108);
  });

  it('looks trailers up by unit number (any case) and by VIN', async () => {
    const t = await trailerByUnit('R53020');
    expect((await getTrailerByUnit('r53020'))?.id).toBe(t.id);
    expect(await getTrailerByVin(t.vin)).toMatchObject({ id: t.id, unitNumber: 'R53020', ownerScac: 'BRCL' });
    expect(await getTrailerByUnit('R99999')).toBeNull();
  });

  it('a sheet issues a label for a trailer without a current one, and reuses it the second time', async () => {
    const t = await trailerByUnit('R53030');
    await db.update(labels).set({ revokedAt: new Date() }).where(eq(labels.trailerId, t.id));
    const [first] = await prepareLabelSheet(clerk, { trailerIds: [t.id] });
    const [again] = await prepareLabelSheet(clerk, { trailerIds: [t.id] });
    expect(first.labelId).toBe(again.labelId);
    expect((await getCurrentLabel(t.id))!.id).toBe(first.labelId);
  });

  it('a row sheet lists the trailers standing in that row, in slot order', async () => {
    const [row] = await db
      .select({ id: yardRows.id })
      .from(yardRows)
      .where(eq(yardRows.name, 'Row A'))
      .limit(1);
    const standing = await db
      .select({ id: trailers.id, order: yardSpots.sortOrder })
      .from(trailers)
      .innerJoin(yardSpots, eq(yardSpots.id, trailers.currentSpotId))
      .where(eq(yardSpots.rowId, row.id));
    const sheet = await prepareLabelSheet(clerk, { rowId: row.id });
    expect(standing.length).toBeGreaterThan(0);
    expect(sheet.map((s) => s.id)).toEqual(standing.sort((a, b) => a.order - b.order).map((s) => s.id));
  });
});
