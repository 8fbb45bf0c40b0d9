// Demo photos: small generated PNGs put in object storage, with their stored photo rows.
import { createHash } from 'node:crypto';
import { PNG } from 'pngjs';
import { db } from '@/db';
import { photos } from '@/db/schema';
import { putObject } from '@/lib/server/storage';

/** A small PNG whose pixels depend on `seed`, so each demo photo has its own SHA-256. */
export function demoPng(seed: number): Uint8Array {
  const png = new PNG({ width: 24, height: 16 });
  for (let i = 0; i < png.data.length; i += 4) {
    png.data[i] = (seed * 37 + i) % 256;
    png.data[i + 1] = (seed * 11) % 256;
    png.data[i + 2] = 90;
    png.data[i + 3] = 255;
  }
  return new Uint8Array(PNG.sync.write(png));
}

/** Stores `bytes` as a checked photo of the trailer, ready for a handoff to attach; returns its id. */
export async function storeDemoPhoto(
  photo: { trailerId: string; uploadedById: string; itemKey?: string; name: string },
  bytes: Uint8Array,
): Promise<string> {
  const objectKey = `photos/${photo.trailerId}/${photo.name}.png`;
  await putObject(objectKey, bytes, 'image/png');
  const [row] = await db
    .insert(photos)
    .values({
      objectKey,
      uploadedById: photo.uploadedById,
      trailerId: photo.trailerId,
      itemKey: photo.itemKey ?? null,
      status: 'stored',
      contentType: 'image/png',
      byteSize: bytes.length,
      sha256: createHash('sha256').update(bytes).digest('hex'),
    })
    .returning({ id: photos.id });
  return row.id;
}
