// One handoff of the bulk pass as the chain hashes it and as COPY writes it.
import type { HandoffHashRow } from '@/lib/handoffs/canonical';
import { hashableFromRows } from '@/lib/handoffs/canonical';
import { allOkObservations } from '@/lib/handoffs/all-ok';
import { canonicalJson, handoffContentHash, hmacSha256Hex, WRITTEN_HASH_VERSION } from '@/lib/handoffs/hash';
import { normalizeItems, type ItemRowInput } from '@/lib/handoffs/items';
import { checklistOf } from '@/lib/trailers/checklist';
import type { Buffers } from './buffers';
import type { PassTrailer } from './handoffs';

export type Shape = { okRows: ItemRowInput[]; itemsJson: string };

/** The trailer's all-ok item rows and their canonical JSON as the hash covers them (sorted by key). */
export function shapeOf(shapes: Map<string, Shape>, t: PassTrailer, b: Buffers) {
  const key = `${t.kind}/${t.hingesPerDoor}/${t.axleCount}/${t.tireLayout}/${t.fuelTankGallons}`;
  let s = shapes.get(key);
  if (!s) {
    const checklist = checklistOf(t);
    const okRows = normalizeItems(
      checklist,
      allOkObservations(checklist, (k) => 8 + (k.length % 5)),
    ).rows;
    const hashed = hashableFromRows(
      { occurredAt: new Date(0) } as HandoffHashRow,
      okRows,
      [],
      WRITTEN_HASH_VERSION,
    ).items;
    hashed.sort((a, c) => (a.itemKey < c.itemKey ? -1 : 1));
    s = { okRows, itemsJson: canonicalJson(hashed) };
    shapes.set(key, s);
    for (const i of okRows)
      b.templates.push([
        key,
        i.itemKey,
        i.condition,
        i.treadThirtySeconds,
        i.isHoldingAir,
        i.details,
        i.note,
      ]);
  }
  b.shapes.push([t.id, key]);
  return { key, ...s };
}

/**
 * The keyed content hash of one handoff. A handoff that found something is hashed with the app's
 * own functions; an all-ok one reuses its shape's item JSON (computed once), and with `check`
 * the result is compared with the app's hashing so the two cannot drift apart unnoticed.
 */
export function linkHash(
  row: HandoffHashRow,
  shape: Shape,
  found: { items: ItemRowInput[]; shas: string[] } | null,
  chainKey: string,
  check: boolean,
): string {
  const appHash = () =>
    handoffContentHash(
      hashableFromRows(row, found?.items ?? shape.okRows, found?.shas ?? [], WRITTEN_HASH_VERSION),
      chainKey,
    );
  if (found) return appHash();
  const content = canonicalJson(hashableFromRows(row, [], [], WRITTEN_HASH_VERSION).content);
  const prev = canonicalJson(row.prevHash);
  const hash = hmacSha256Hex(
    chainKey,
    `{"content":${content},"items":${shape.itemsJson},"photoSha256s":[],"prevHash":${prev}}`,
  );
  if (check && appHash() !== hash) throw new Error('the fast hash path differs from the app');
  return hash;
}

/** The COPY row of `handoffs` (column order of buffers.ts). */
export function handoffCopyRow(r: HandoffHashRow, contentHash: string): unknown[] {
  return [
    r.id,
    r.trailerId,
    r.terminalId,
    r.kind,
    r.level,
    r.carrierId,
    r.driverId,
    r.driverName,
    r.tractorNumber,
    r.recordedById,
    r.isLoaded,
    r.sealNumber,
    r.fuelEighths,
    r.isReeferOn,
    r.setpointTenthsF,
    r.returnAirTenthsF,
    r.engineHoursTenths,
    r.pretripResult,
    r.pretripAt,
    r.note,
    r.occurredAt,
    `bulk-${r.id}`,
    r.correctsHandoffId,
    r.verificationCode,
    r.prevHash,
    contentHash,
    WRITTEN_HASH_VERSION,
    r.occurredAt,
  ];
}
