// Shared by the photo tests that run against the local S3 fake: a real PNG, its SHA-256, the
// announce-and-PUT step, and the usual setup (demo seed, a driver, a trailer of their own).
import { createHash } from 'node:crypto';
import { PNG } from 'pngjs';
import { afterAll, beforeAll, expect } from 'vitest';
import { pool } from '@/db';
import { seed } from '@/db/seed';
import { createUpload } from '@/lib/server/photos/uploads';
import { actor, freshTrailer } from './handoff-fixtures';

export const sha = (b: Uint8Array) => createHash('sha256').update(b).digest('hex');

/** A real 8 × 8 PNG of one grey level (different levels give different bytes). */
export function png(level = 200): Uint8Array {
  const img = new PNG({ width: 8, height: 8 });
  img.data.fill(level);
  return new Uint8Array(PNG.sync.write(img));
}

/** Announces a photo as `declared` and PUTs `body` with the presigned URL; the photo id. */
export async function announceAndPut(
  trailerId: string,
  userId: string,
  declared: { contentType: string; byteSize: number; sha256: string },
  body: Uint8Array,
) {
  const announced = await createUpload({ trailerId, itemKey: 'left_side.skin', ...declared }, { id: userId });
  if (!announced.ok) throw new Error(`announcement refused: ${announced.message}`);
  if (!('uploadUrl' in announced.value)) throw new Error('announced photo is already stored');
  const put = await fetch(announced.value.uploadUrl, {
    method: 'PUT',
    headers: announced.value.headers,
    body: new Blob([new Uint8Array(body)]),
  });
  expect(put.status).toBe(200);
  return announced.value.photoId;
}

/** Seeds, then fills in a driver (D1001) and a fresh trailer before the file's tests; closes the pool after. */
export function uploaderSetup() {
  const ctx = { userId: '', trailerId: '' };
  beforeAll(async () => {
    await seed();
    ctx.userId = (await actor('D1001')).id;
    ctx.trailerId = (await freshTrailer()).trailer.id;
  });
  afterAll(async () => {
    await pool.end();
  });
  return ctx;
}
