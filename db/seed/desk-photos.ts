// Invented demo photos for the desk's seeded cases: a drawn trailer panel, stored like an upload.
import { createHash } from 'node:crypto';
import { PNG } from 'pngjs';
import { db } from '@/db';
import { photos } from '@/db/schema';
import { putObject } from '@/lib/server/storage';

/** An invented picture of a trailer panel: light grey skin with rivet lines; `isTorn` adds a dark tear. */
function panelPng(isTorn: boolean, shade: number): Uint8Array {
  const w = 320;
  const h = 200;
  const png = new PNG({ width: w, height: h });
  for (let y = 0; y < h; y++) {
    for (let x = 0; x < w; x++) {
      const rivet = x % 40 < 2 || y % 50 < 2;
      const tear = isTorn && Math.abs(y - 60 - (x - 80) * 0.45) < 5 && x > 80 && x < 260;
      const v = tear ? 35 : rivet ? 150 : 205 + ((x + y + shade) % 7);
      png.data.set(tear ? [70, 40, 30, 255] : [v, v, v + 6, 255], (y * w + x) * 4);
    }
  }
  return PNG.sync.write(png);
}

export async function demoPhoto(
  trailerId: string,
  uploadedById: string,
  key: string,
  isTorn: boolean,
  shade: number,
) {
  const bytes = panelPng(isTorn, shade);
  const objectKey = `photos/${trailerId}/seed-desk-${key}.png`;
  await putObject(objectKey, bytes, 'image/png');
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const [p] = await db
    .insert(photos)
    .values({
      objectKey,
      uploadedById,
      trailerId,
      status: 'stored',
      contentType: 'image/png',
      byteSize: bytes.length,
      sha256,
    })
    .returning({ id: photos.id });
  return p.id;
}
