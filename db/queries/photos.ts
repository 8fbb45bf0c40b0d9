import 'server-only';
import { and, asc, eq, lt } from 'drizzle-orm';
import { db } from '@/db';
import { handoffs, photos } from '@/db/schema';

type NewPhoto = Omit<typeof photos.$inferInsert, 'id' | 'status' | 'handoffId' | 'caseEventId' | 'createdAt'>;

/** An announced photo, `pending` until its upload is checked; returns its id. */
/** Records an announced photo; null when a photo with the id given is already there. */
export async function insertPendingPhoto(photo: NewPhoto): Promise<string | null> {
  const [row] = await db
    .insert(photos)
    .values({ ...photo, status: 'pending' })
    .onConflictDoNothing({ target: photos.id })
    .returning({ id: photos.id });
  return row?.id ?? null;
}

/** A photo announced by this user; null for anyone else's. */
export async function getOwnPhoto(photoId: string, uploadedById: string) {
  const [row] = await db
    .select()
    .from(photos)
    .where(and(eq(photos.id, photoId), eq(photos.uploadedById, uploadedById)));
  return row ?? null;
}

/** Settles a pending photo; one already settled (a second, racing completion) stays as it is. */
export async function setPhotoStatus(
  photoId: string,
  status: 'stored' | 'rejected',
  capturedAt: Date | null = null,
) {
  await db
    .update(photos)
    .set(status === 'stored' ? { status, capturedAt } : { status })
    .where(and(eq(photos.id, photoId), eq(photos.status, 'pending')));
}

/**
 * The stored photos that handoff records hashed (attached and `stored`), of one trailer or of
 * every trailer recorded at one terminal, oldest record first.
 */
export async function listRecordedPhotos(where: { trailerId: string } | { terminalId: string }) {
  return db
    .select({
      id: photos.id,
      objectKey: photos.objectKey,
      byteSize: photos.byteSize,
      sha256: photos.sha256,
      itemKey: photos.itemKey,
      handoffId: handoffs.id,
      handoffKind: handoffs.kind,
      occurredAt: handoffs.occurredAt,
      trailerId: photos.trailerId,
    })
    .from(photos)
    .innerJoin(handoffs, eq(handoffs.id, photos.handoffId))
    .where(
      and(
        eq(photos.status, 'stored'),
        'trailerId' in where
          ? eq(photos.trailerId, where.trailerId)
          : eq(handoffs.terminalId, where.terminalId),
      ),
    )
    .orderBy(asc(handoffs.occurredAt), asc(photos.createdAt));
}

/** Uploads announced before `before` and never completed: the cleanup job refuses them. */
export async function expirePendingPhotos(before: Date) {
  return db
    .update(photos)
    .set({ status: 'rejected' })
    .where(and(eq(photos.status, 'pending'), lt(photos.createdAt, before)))
    .returning({ id: photos.id, pendingKey: photos.pendingKey });
}
