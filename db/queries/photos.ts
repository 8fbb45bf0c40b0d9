import 'server-only';
import { and, eq } from 'drizzle-orm';
import { db } from '@/db';
import { photos } from '@/db/schema';

type NewPhoto = Omit<typeof photos.$inferInsert, 'id' | 'status' | 'handoffId' | 'caseEventId' | 'createdAt'>;

/** An announced photo, `pending` until its upload is checked; returns its id. */
export async function insertPendingPhoto(photo: NewPhoto): Promise<string> {
  const [row] = await db
    .insert(photos)
    .values({ ...photo, status: 'pending' })
    .returning({ id: photos.id });
  return row.id;
}

/** A photo announced by this user; null for anyone else's. */
export async function getOwnPhoto(photoId: string, uploadedById: string) {
  const [row] = await db
    .select()
    .from(photos)
    .where(and(eq(photos.id, photoId), eq(photos.uploadedById, uploadedById)));
  return row ?? null;
}

export async function setPhotoStatus(photoId: string, status: 'stored' | 'rejected') {
  await db.update(photos).set({ status }).where(eq(photos.id, photoId));
}
