import 'server-only';
import { createHash, randomUUID } from 'node:crypto';
import { and, eq } from 'drizzle-orm';
import { db } from '@/db';
import { photos, trailers } from '@/db/schema';
import { buildChecklist } from '@/lib/engine';
import { isAllowedImageType, MAX_PHOTO_BYTES, sniffImageType } from '@/lib/photos/image-type';
import type { UploadRequestInput } from '@/lib/validation/handoffs';
import type { RefusalCode as ApiErrorCode } from '@/lib/result';
import { deleteObject, presignPhotoUpload, readObject } from './storage';

/** An expected refusal of an upload, with the API error code it maps to. */
export class UploadError extends Error {
  constructor(
    readonly code: ApiErrorCode,
    message: string,
    readonly fieldErrors?: Record<string, string[]>,
  ) {
    super(message);
  }
}

type Uploader = { id: string };
const EXT = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' } as const;

/** Checks the declared type and size, records a pending photo and returns a presigned PUT URL. */
export async function createUpload(input: UploadRequestInput, user: Uploader) {
  if (!isAllowedImageType(input.contentType)) {
    throw new UploadError('unsupported_type', 'Photos must be JPEG, PNG or WebP.', {
      contentType: ['Photos must be JPEG, PNG or WebP.'],
    });
  }
  if (input.byteSize > MAX_PHOTO_BYTES) {
    throw new UploadError('too_large', `A photo may be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`, {
      byteSize: ['The photo is too large.'],
    });
  }
  const [t] = await db.select().from(trailers).where(eq(trailers.id, input.trailerId));
  if (!t) throw new UploadError('not_found', 'No such trailer.');
  const checklist = buildChecklist({
    kind: t.kind,
    hingesPerDoor: t.hingesPerDoor === 5 ? 5 : 4,
    axles: t.axleCount,
    tireLayout: t.tireLayout,
  });
  if (!checklist.items.some((i) => i.key === input.itemKey && i.kind !== 'reading')) {
    throw new UploadError('invalid', "That item is not on this trailer's checklist.", {
      itemKey: ['Unknown checklist item.'],
    });
  }
  const objectKey = `photos/${t.id}/${randomUUID()}.${EXT[input.contentType]}`;
  const [row] = await db
    .insert(photos)
    .values({
      objectKey,
      uploadedById: user.id,
      trailerId: t.id,
      itemKey: input.itemKey,
      status: 'pending',
      contentType: input.contentType,
      byteSize: input.byteSize,
      sha256: input.sha256,
    })
    .returning({ id: photos.id });
  return {
    photoId: row.id,
    uploadUrl: await presignPhotoUpload(objectKey, input.contentType),
    headers: { 'content-type': input.contentType },
  };
}

/**
 * After the browser's PUT: reads the object back and checks its type by content, its size and
 * its SHA-256 against what was declared. Stored, or rejected and the object deleted.
 */
export async function completeUpload(photoId: string, user: Uploader) {
  const [p] = await db
    .select()
    .from(photos)
    .where(and(eq(photos.id, photoId), eq(photos.uploadedById, user.id)));
  if (!p) throw new UploadError('not_found', 'No such upload.');
  if (p.status === 'stored') return { photoId: p.id, status: 'stored' as const };
  if (p.status === 'rejected') throw new UploadError('gone', 'This photo was refused; take it again.');
  const bytes = await readObject(p.objectKey, MAX_PHOTO_BYTES);
  if (!bytes) throw new UploadError('conflict', 'The photo has not arrived yet; upload it again.');

  const sniffed = sniffImageType(bytes);
  const why =
    bytes.length > MAX_PHOTO_BYTES
      ? { code: 'too_large' as const, message: 'The photo is larger than allowed.' }
      : bytes.length !== p.byteSize
        ? { code: 'invalid' as const, message: "The photo's size is not what was announced." }
        : sniffed === null
          ? { code: 'unsupported_type' as const, message: 'That file is not a JPEG, PNG or WebP image.' }
          : sniffed !== p.contentType
            ? {
                code: 'unsupported_type' as const,
                message: `The file is a ${sniffed}, not the ${p.contentType} announced.`,
              }
            : createHash('sha256').update(bytes).digest('hex') !== p.sha256
              ? {
                  code: 'invalid' as const,
                  message: "The photo's checksum does not match; it was changed on the way. Take it again.",
                }
              : null;
  if (why) {
    await db.update(photos).set({ status: 'rejected' }).where(eq(photos.id, p.id));
    await deleteObject(p.objectKey);
    throw new UploadError(why.code, why.message);
  }
  await db.update(photos).set({ status: 'stored' }).where(eq(photos.id, p.id));
  return { photoId: p.id, status: 'stored' as const };
}
