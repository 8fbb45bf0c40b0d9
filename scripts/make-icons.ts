// Draws Hitchmark's app icons (public/icons/*.png): a white ring and pin (a coupling seen from
// above) on the brand blue. Run once after a design change: `npx tsx scripts/make-icons.ts`.
import { writeFileSync } from 'node:fs';
import { PNG } from 'pngjs';

function icon(size: number, safeZone: number): Buffer {
  const png = new PNG({ width: size, height: size });
  const c = size / 2;
  const scale = (size / 2) * safeZone; // maskable icons keep the mark inside the central 80 %
  for (let y = 0; y < size; y++)
    for (let x = 0; x < size; x++) {
      const d = Math.hypot(x + 0.5 - c, y + 0.5 - c) / scale;
      const isMark =
        (d > 0.62 && d < 0.86) || d < 0.22 || (Math.abs(x + 0.5 - c) < scale * 0.09 && y > c && d < 0.86);
      const i = (y * size + x) * 4;
      const [r, g, b] = isMark ? [255, 255, 255] : [11, 92, 138];
      png.data[i] = r;
      png.data[i + 1] = g;
      png.data[i + 2] = b;
      png.data[i + 3] = 255;
    }
  return PNG.sync.write(png);
}

writeFileSync('public/icons/icon-192.png', icon(192, 0.9));
writeFileSync('public/icons/icon-512.png', icon(512, 0.9));
writeFileSync('public/icons/icon-maskable-512.png', icon(512, 0.7));
writeFileSync('app/apple-icon.png', icon(180, 0.8));
