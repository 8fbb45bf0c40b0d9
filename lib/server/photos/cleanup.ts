// Uploads announced and never completed: refused after a day, and their pending files deleted.
// Also deletes any file under the pending prefix older than a day (left by a completion that
// could not delete it, or written again through an old upload URL). Run daily by the job queue.
import 'server-only';
import { expirePendingPhotos } from '@/db/queries/photos';
import { deleteObject, listObjects } from '../storage';
import { PENDING_PREFIX } from './uploads';

export const STALE_UPLOAD_MS = 24 * 60 * 60 * 1000;

export async function removeStaleUploads(now = new Date()): Promise<{ expired: number; objects: number }> {
  const before = new Date(now.getTime() - STALE_UPLOAD_MS);
  const expired = await expirePendingPhotos(before);
  const stale = new Set(expired.flatMap((p) => (p.pendingKey ? [p.pendingKey] : [])));
  const stored = await listObjects(PENDING_PREFIX);
  for (const o of stored) if (o.lastModified < before) stale.add(o.key);
  const present = new Set(stored.map((o) => o.key));
  let objects = 0;
  for (const key of stale) {
    if (!present.has(key)) continue; // never uploaded
    await deleteObject(key);
    objects++;
  }
  return { expired: expired.length, objects };
}
