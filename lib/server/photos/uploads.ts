// A photo reaches storage in two calls: the announcement (type, size, SHA-256) answers a presigned
// PUT URL to a pending key (short-lived, type and length signed); after the browser's PUT,
// completion reads the pending object, checks it, and writes the very bytes it checked to the
// photo's final key, which no presigned URL ever names. A later PUT to the old URL only reaches
// the pending key, which nothing serves (and the daily cleanup removes).
import 'server-only';
import { randomUUID } from 'node:crypto';
import { getOwnPhoto, insertPendingPhoto, setPhotoStatus } from '@/db/queries/photos';
import { getTrailerForGate } from '@/db/queries/trailers';
import { uploadProblem } from '@/lib/photos/check';
import { isAllowedImageType, MAX_PHOTO_BYTES } from '@/lib/photos/image-type';
import { done, refuse, type Result } from '@/lib/result';
import { checklistOf } from '@/lib/trailers/checklist';
import { isSaneCaptureTime } from '@/lib/photos/capture-time';
import type { UploadCompleteInput, UploadRequestInput } from '@/lib/validation/handoffs';
import { deleteObject, presignPhotoUpload, putObject, readObject } from '../storage';

type Uploader = { id: string };
type Stored = { photoId: string; status: 'stored' };
/** Checked photos (written by the server only) and uploads waiting for their check (presigned). */
export const PHOTO_PREFIX = 'photos/';
export const PENDING_PREFIX = 'uploads/';
const EXT = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' } as const;

/** Checks the declared type and size, records a pending photo and returns a presigned PUT URL. */
export async function createUpload(input: UploadRequestInput, user: Uploader) {
  if (!isAllowedImageType(input.contentType)) {
    return refuse('unsupported_type', 'Photos must be JPEG, PNG or WebP.', {
      contentType: ['Photos must be JPEG, PNG or WebP.'],
    });
  }
  if (input.byteSize > MAX_PHOTO_BYTES) {
    return refuse('too_large', `A photo may be at most ${MAX_PHOTO_BYTES / 1024 / 1024} MB.`, {
      byteSize: ['The photo is too large.'],
    });
  }
  const trailer = await getTrailerForGate(input.trailerId);
  if (!trailer) return refuse('not_found', 'No such trailer.');
  if (!checklistOf(trailer).items.some((i) => i.key === input.itemKey && i.kind !== 'reading')) {
    return refuse('invalid', "That item is not on this trailer's checklist.", {
      itemKey: ['Unknown checklist item.'],
    });
  }
  const name = `${randomUUID()}.${EXT[input.contentType]}`;
  const objectKey = `${PHOTO_PREFIX}${trailer.id}/${name}`;
  const pendingKey = `${PENDING_PREFIX}${trailer.id}/${name}`;
  const photoId = await insertPendingPhoto({
    ...(input.photoId ? { id: input.photoId } : {}),
    objectKey,
    pendingKey,
    uploadedById: user.id,
    trailerId: trailer.id,
    itemKey: input.itemKey,
    contentType: input.contentType,
    byteSize: input.byteSize,
    sha256: input.sha256,
  });
  if (!photoId) return announcedAgain(input, user);
  return done({
    photoId,
    uploadUrl: await presignPhotoUpload(pendingKey, input.contentType, input.byteSize),
    headers: { 'content-type': input.contentType },
  });
}

/**
 * The same photo announced again under the phone's id (a photo queued without signal, sent again
 * after a lost answer): stored → nothing to upload; pending → a fresh URL to the same pending key.
 * An id that names someone else's photo, or other bytes, is refused.
 */
async function announcedAgain(input: UploadRequestInput, user: Uploader) {
  const p = input.photoId ? await getOwnPhoto(input.photoId, user.id) : null;
  if (!p || p.sha256 !== input.sha256 || p.trailerId !== input.trailerId || p.byteSize !== input.byteSize)
    return refuse('conflict', 'That photo id is already taken.', {
      photoId: ['That photo id is already taken.'],
    });
  if (p.status === 'rejected') return refuse('gone', 'This photo was refused; take it again.');
  if (p.status === 'stored') return done({ photoId: p.id, status: 'stored' as const });
  if (!p.pendingKey) return refuse('conflict', 'This upload has no pending file; take the photo again.');
  return done({
    photoId: p.id,
    uploadUrl: await presignPhotoUpload(p.pendingKey, p.contentType, p.byteSize),
    headers: { 'content-type': p.contentType },
  });
}

/**
 * After the browser's PUT: reads the object back and checks its type by content, its size and
 * its SHA-256 against what was declared. Stored, or rejected and the object deleted.
 */
export async function completeUpload(
  photoId: string,
  user: Uploader,
  claimed: UploadCompleteInput = {},
): Promise<Result<Stored>> {
  // the phone's claim of when the picture was taken: stored only within sane bounds of now
  const capturedAt = claimed.capturedAt ? new Date(claimed.capturedAt) : null;
  if (capturedAt && !isSaneCaptureTime(capturedAt, new Date())) {
    const why = 'The capture time is not plausible (more than 30 days old or in the future).';
    return refuse('invalid', why, { capturedAt: [why] });
  }
  const p = await getOwnPhoto(photoId, user.id);
  if (!p) return refuse('not_found', 'No such upload.');
  if (p.status === 'stored') return done({ photoId: p.id, status: 'stored' });
  if (p.status === 'rejected') return refuse('gone', 'This photo was refused; take it again.');
  if (!p.pendingKey) return refuse('conflict', 'This upload has no pending file; take the photo again.');
  const bytes = await readObject(p.pendingKey, MAX_PHOTO_BYTES);
  if (!bytes) return refuse('conflict', 'The photo has not arrived yet; upload it again.');
  const problem = uploadProblem(bytes, p);
  if (problem) {
    await setPhotoStatus(p.id, 'rejected');
    await deleteObject(p.pendingKey);
    return refuse(problem.code, problem.message);
  }
  // the bytes just checked, not a server-side copy of the pending key: a PUT racing this
  // completion could change the pending object between the check and a copy
  await putObject(p.objectKey, bytes, p.contentType);
  await setPhotoStatus(p.id, 'stored', capturedAt);
  await deleteObject(p.pendingKey);
  return done({ photoId: p.id, status: 'stored' });
}
