import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { photos } from '@/db/schema';
import { MAX_PHOTO_BYTES } from '@/lib/photos/image-type';
import { readObject } from '@/lib/server/storage';
import { isRefusal, type Refusal } from '@/lib/result';
import { completeUpload, createUpload } from '@/lib/server/photos/uploads';
import { actor } from './handoff-fixtures';
import { announceAndPut, png, sha, uploaderSetup } from './upload-fixtures';

// Runs against the real local S3 fake (scripts/fakes.sh start; scripts/test.sh starts it).
const smallPng = () => png(200);

async function refusedWith(p: Promise<unknown>): Promise<Refusal> {
  const r = await p;
  expect(isRefusal(r)).toBe(true);
  return r as Refusal;
}

describe('photo uploads through presigned URLs (local S3 fake)', () => {
  const ctx = uploaderSetup();

  it('stores a real PNG whose size and SHA-256 match', async () => {
    const png = smallPng();
    const id = await announceAndPut(
      ctx.trailerId,
      ctx.userId,
      { contentType: 'image/png', byteSize: png.length, sha256: sha(png) },
      png,
    );
    expect(await completeUpload(id, { id: ctx.userId })).toEqual({
      ok: true,
      value: { photoId: id, status: 'stored' },
    });
    const [row] = await db.select().from(photos).where(eq(photos.id, id));
    expect(row.status).toBe('stored');
    expect(await readObject(row.objectKey, 1_000_000)).toEqual(png);
  });

  it('stores the capture time the phone read, and refuses an implausible one before any change', async () => {
    const png = smallPng();
    const declared = { contentType: 'image/png', byteSize: png.length, sha256: sha(png) };
    const id = await announceAndPut(ctx.trailerId, ctx.userId, declared, png);
    // 40 days old: beyond the 30-day bound (lib/photos/capture-time.ts; common practice)
    const old = new Date(Date.now() - 40 * 24 * 3_600_000).toISOString();
    const e = await refusedWith(completeUpload(id, { id: ctx.userId }, { capturedAt: old }));
    expect(e.fieldErrors?.capturedAt).toHaveLength(1);
    expect((await db.select().from(photos).where(eq(photos.id, id)))[0].status).toBe('pending');
    // seven minutes before now, written with an offset: stored as that instant
    const taken = new Date(Math.floor((Date.now() - 7 * 60_000) / 1000) * 1000);
    const local = new Date(taken.getTime() - 5 * 3_600_000).toISOString().replace('Z', '-05:00');
    expect((await completeUpload(id, { id: ctx.userId }, { capturedAt: local })).ok).toBe(true);
    const [row] = await db.select().from(photos).where(eq(photos.id, id));
    expect(row.capturedAt?.toISOString()).toBe(taken.toISOString());
  });

  it('refuses content that is not an image although it was announced as PNG, and deletes it', async () => {
    const text = new TextEncoder().encode('this is not a photo, just text pretending to be one');
    const id = await announceAndPut(
      ctx.trailerId,
      ctx.userId,
      { contentType: 'image/png', byteSize: text.length, sha256: sha(text) },
      text,
    );
    const e = await refusedWith(completeUpload(id, { id: ctx.userId }));
    expect(e.code).toBe('unsupported_type');
    const [row] = await db.select().from(photos).where(eq(photos.id, id));
    expect(row.status).toBe('rejected');
    expect(await readObject(row.objectKey, 1000)).toBeNull();
  });

  it('refuses a photo whose checksum does not match what the browser announced', async () => {
    const png = smallPng();
    const other = new Uint8Array(png);
    other[other.length - 20] ^= 0xff; // one byte changed on the way
    const id = await announceAndPut(
      ctx.trailerId,
      ctx.userId,
      { contentType: 'image/png', byteSize: png.length, sha256: sha(png) },
      other,
    );
    const e = await refusedWith(completeUpload(id, { id: ctx.userId }));
    expect(e.message).toMatch(/checksum/);
    expect((await db.select().from(photos).where(eq(photos.id, id)))[0].status).toBe('rejected');
  });

  it('refuses a body larger than announced', async () => {
    const png = smallPng();
    const longer = new Uint8Array([...png, 0, 0, 0, 0]);
    const id = await announceAndPut(
      ctx.trailerId,
      ctx.userId,
      { contentType: 'image/png', byteSize: png.length, sha256: sha(longer) },
      longer,
    );
    const e = await refusedWith(completeUpload(id, { id: ctx.userId }));
    expect(e.message).toMatch(/size/);
  });

  it('refuses an oversize or non-image announcement before any upload URL is given', async () => {
    const announce = (over: { itemKey?: string; contentType?: string; byteSize?: number }) =>
      refusedWith(
        createUpload(
          {
            trailerId: ctx.trailerId,
            itemKey: 'left_side.skin',
            contentType: 'image/jpeg',
            byteSize: 100,
            sha256: 'a'.repeat(64),
            ...over,
          },
          { id: ctx.userId },
        ),
      );
    expect((await announce({ byteSize: 8 * 1024 * 1024 + 1 })).code).toBe('too_large');
    expect((await announce({ contentType: 'application/pdf' })).code).toBe('unsupported_type');
    expect((await announce({ itemKey: 'wheel.of_fortune', contentType: 'image/png' })).code).toBe('invalid');
  });

  it('lets only the uploader complete an upload', async () => {
    const png = smallPng();
    const id = await announceAndPut(
      ctx.trailerId,
      ctx.userId,
      { contentType: 'image/png', byteSize: png.length, sha256: sha(png) },
      png,
    );
    const other = await actor('D2001');
    expect((await refusedWith(completeUpload(id, { id: other.id }))).code).toBe('not_found');
  });

  it('refuses at completion an object over the size limit that the store let through (the fake ignores the signed length)', async () => {
    // a small PNG announced honestly, then a PUT of a much bigger body to the same presigned URL:
    // a real S3 refuses the length mismatch (the URL signs content-length), the local fake does not,
    // so completion's own check must. The body starts with the PNG's bytes, so it still sniffs as PNG.
    const small = smallPng();
    const oversize = new Uint8Array(MAX_PHOTO_BYTES + 64 * 1024);
    oversize.set(small);
    const announced = await createUpload(
      {
        trailerId: ctx.trailerId,
        itemKey: 'left_side.skin',
        contentType: 'image/png',
        byteSize: small.length,
        sha256: sha(small),
      },
      { id: ctx.userId },
    );
    if (!announced.ok) throw new Error(announced.message);
    const put = await fetch(announced.value.uploadUrl, {
      method: 'PUT',
      headers: announced.value.headers,
      body: new Blob([oversize]),
    });
    expect(put.status).toBe(200); // the fake took it: this is the hole completion closes
    const [before] = await db.select().from(photos).where(eq(photos.id, announced.value.photoId));
    expect((await readObject(before.pendingKey!, MAX_PHOTO_BYTES * 2))?.length).toBe(oversize.length);

    const e = await refusedWith(completeUpload(announced.value.photoId, { id: ctx.userId }));
    expect(e.code).toBe('too_large');
    const [row] = await db.select().from(photos).where(eq(photos.id, announced.value.photoId));
    expect(row.status).toBe('rejected');
    // neither the pending object nor a final one is left
    expect(await readObject(row.pendingKey!, 1000)).toBeNull();
    expect(await readObject(row.objectKey, 1000)).toBeNull();
  }, 30_000);
});
