// The daily cleanup job: uploads announced over a day ago and never completed are refused and
// their pending files deleted; newer pending uploads and stored photos stay. Real S3 fake.
import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { photos } from '@/db/schema';
import { removeStaleUploads } from '@/lib/server/photos/cleanup';
import { PENDING_PREFIX } from '@/lib/server/photos/uploads';
import { putObject, readObject } from '@/lib/server/storage';
import { uploaderSetup } from './upload-fixtures';

describe('removing stale pending uploads', () => {
  const ctx = uploaderSetup();

  async function pending(ageHours: number, uploaded: boolean) {
    const { userId, trailerId } = ctx;
    const name = `${randomUUID()}.png`;
    const pendingKey = `${PENDING_PREFIX}${trailerId}/${name}`;
    const [row] = await db
      .insert(photos)
      .values({
        objectKey: `photos/${trailerId}/${name}`,
        pendingKey,
        uploadedById: userId,
        trailerId,
        status: 'pending',
        contentType: 'image/png',
        byteSize: 4,
        sha256: 'a'.repeat(64),
        createdAt: new Date(Date.now() - ageHours * 3_600_000),
      })
      .returning();
    if (uploaded) await putObject(pendingKey, new Uint8Array([1, 2, 3, 4]), 'image/png');
    return row;
  }
  const status = async (id: string) => (await db.select().from(photos).where(eq(photos.id, id)))[0].status;

  it('refuses uploads older than a day, deletes their files, and leaves newer ones', async () => {
    const old = await pending(25, true);
    const oldNeverSent = await pending(30, false);
    const recent = await pending(2, true);
    const result = await removeStaleUploads();
    expect(result.expired).toBeGreaterThanOrEqual(2);
    expect(result.objects).toBeGreaterThanOrEqual(1);
    expect(await status(old.id)).toBe('rejected');
    expect(await status(oldNeverSent.id)).toBe('rejected');
    expect(await readObject(old.pendingKey!, 100)).toBeNull();
    expect(await status(recent.id)).toBe('pending');
    expect(await readObject(recent.pendingKey!, 100)).toEqual(new Uint8Array([1, 2, 3, 4]));
    // a second run finds nothing of these left to do
    const again = await removeStaleUploads();
    expect(await status(recent.id)).toBe('pending');
    expect(again.expired).toBe(0);
  });
});
