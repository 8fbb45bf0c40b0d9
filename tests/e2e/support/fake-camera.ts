// A fake camera for Playwright: any text becomes a QR image drawn in Node (integer module size,
// white quiet zone), written as a one-frame .y4m that Chromium loops as its camera
// (--use-file-for-fake-video-capture). Shared by the gate, yard and label journeys.
import { writeFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import { devices, type Browser, type BrowserContext, type Page } from '@playwright/test';
import { PNG } from 'pngjs';
import QRCode from 'qrcode';
import { decodeQr, labelQrOptions } from '../../../lib/labels/qr';
import { baseURL } from '../../../playwright.config';
import { launchChromium } from '../../support/chromium';

// 640×480 is the size Chromium captures at when the page asks for no resolution: a frame of that size reaches
// the decoder unscaled, so QR modules stay whole pixels (scaled frames gave fractional modules and missed reads).
export const FRAME = { width: 640, height: 480 };

/** The QR of `text` as RGBA at `scale` pixels per module (whole pixels: the decoder misreads fractions). */
export async function qrImage(text: string, { scale = 6 } = {}) {
  // encoded exactly as the app prints labels (level Q, the mask chosen for the scanner)
  const png = PNG.sync.read(await QRCode.toBuffer(text, { ...labelQrOptions(text), margin: 4, scale }));
  return { data: png.data, width: png.width, height: png.height };
}

/** A frame wide enough for a 17-character Code 39 barcode (1-D codes survive rescaling; QR modules may not). */
export const WIDE_FRAME = { width: 1280, height: 720 };

/** RGBA centred on a white frame → I420 planes, BT.601 limited range (Y 16–235, Cb/Cr 16–240). */
export function toI420(image: { data: Uint8Array; width: number; height: number }, frame = FRAME): Buffer {
  const { width: W, height: H } = frame;
  if (image.width > W || image.height > H) throw new RangeError('image larger than the camera frame');
  const left = Math.floor((W - image.width) / 2);
  const top = Math.floor((H - image.height) / 2);
  const rgbAt = (x: number, y: number): [number, number, number] => {
    const ix = x - left;
    const iy = y - top;
    if (ix < 0 || iy < 0 || ix >= image.width || iy >= image.height) return [255, 255, 255];
    const i = (iy * image.width + ix) * 4;
    return [image.data[i], image.data[i + 1], image.data[i + 2]];
  };
  const y = Buffer.alloc(W * H);
  const u = Buffer.alloc((W / 2) * (H / 2));
  const v = Buffer.alloc((W / 2) * (H / 2));
  for (let row = 0; row < H; row++) {
    for (let col = 0; col < W; col++) {
      const [r, g, b] = rgbAt(col, row);
      y[row * W + col] = Math.round(16 + 0.257 * r + 0.504 * g + 0.098 * b);
    }
  }
  for (let row = 0; row < H / 2; row++) {
    for (let col = 0; col < W / 2; col++) {
      let r = 0,
        g = 0,
        b = 0;
      for (const [dx, dy] of [
        [0, 0],
        [1, 0],
        [0, 1],
        [1, 1],
      ]) {
        const px = rgbAt(col * 2 + dx, row * 2 + dy);
        r += px[0] / 4;
        g += px[1] / 4;
        b += px[2] / 4;
      }
      u[row * (W / 2) + col] = Math.round(128 - 0.148 * r - 0.291 * g + 0.439 * b);
      v[row * (W / 2) + col] = Math.round(128 + 0.439 * r - 0.368 * g - 0.071 * b);
    }
  }
  return Buffer.concat([y, u, v]);
}

// Code 39 (ISO/IEC 16388), the symbology of VIN barcodes: per character nine elements, bar first,
// 1 = wide. Table transcribed from @zxing/library's Code39Reader; '*' is the start/stop character.
const CODE39_ALPHABET = '0123456789ABCDEFGHIJKLMNOPQRSTUVWXYZ-. $/+%*';
const CODE39_PATTERNS = [
  0x034, 0x121, 0x061, 0x160, 0x031, 0x130, 0x070, 0x025, 0x124, 0x064, 0x109, 0x049, 0x148, 0x019, 0x118,
  0x058, 0x00d, 0x10c, 0x04c, 0x01c, 0x103, 0x043, 0x142, 0x013, 0x112, 0x052, 0x007, 0x106, 0x046, 0x016,
  0x181, 0x0c1, 0x1c0, 0x091, 0x190, 0x0d0, 0x085, 0x184, 0x0c4, 0x0a8, 0x0a2, 0x08a, 0x02a, 0x094,
];

/** A Code 39 barcode of `text` as RGBA: narrow = `narrow` px, wide = 3 × narrow, 10-narrow quiet zones. */
export function code39Image(text: string, { narrow = 3, height = 200 } = {}) {
  const widths: { isBar: boolean; units: number }[] = [{ isBar: false, units: 10 }];
  for (const ch of `*${text}*`) {
    const i = CODE39_ALPHABET.indexOf(ch);
    if (i < 0) throw new RangeError(`Code 39 cannot show ${ch}`);
    for (let e = 0; e < 9; e++)
      widths.push({ isBar: e % 2 === 0, units: (CODE39_PATTERNS[i] >> (8 - e)) & 1 ? 3 : 1 });
    widths.push({ isBar: false, units: 1 });
  }
  widths.push({ isBar: false, units: 9 });
  const width = widths.reduce((n, w) => n + w.units * narrow, 0);
  const data = new Uint8Array(width * height * 4).fill(255);
  let x = 0;
  for (const w of widths) {
    if (w.isBar)
      for (let y = 0; y < height; y++)
        data.fill(0, (y * width + x) * 4, (y * width + x + w.units * narrow) * 4);
    x += w.units * narrow;
  }
  for (let i = 3; i < data.length; i += 4) data[i] = 255;
  return { data, width, height };
}

/** Writes a one-frame .y4m of an RGBA image centred on white; returns the absolute path. */
export async function writeImageVideo(
  image: { data: Uint8Array; width: number; height: number },
  file: string,
  frame = FRAME,
): Promise<string> {
  return writeFrame(toI420(image, frame), file, frame);
}

async function writeFrame(planes: Buffer, file: string, frame: { width: number; height: number }) {
  const path = resolve(file);
  const header = Buffer.from(`YUV4MPEG2 W${frame.width} H${frame.height} F30:1 Ip A1:1 C420jpeg\n`);
  await writeFile(path, Buffer.concat([header, Buffer.from('FRAME\n'), planes]));
  return path;
}

/** Whole module sizes from `preferred` outwards: 6, 5, 7, 4, 8, 3, 9 … */
function sizesNear(preferred: number): number[] {
  const sizes = [preferred];
  for (let d = 1; d <= 6; d++) sizes.push(preferred - d, preferred + d);
  return sizes.filter((s) => s >= 3);
}

/**
 * Writes a one-frame .y4m showing the QR of `text` (a label link, a slot code…); returns the
 * absolute path. A phone moving towards a label sees it at many sizes, but the fake camera loops
 * one frame, and the scanner's decoder misses some symbols at some module sizes (about one label
 * link in eight at 6 px). So the frame uses the first whole module size, from `scale` outwards,
 * at which that decoder reads the text back from this very frame.
 */
export async function writeLabelVideo(
  text: string,
  file: string,
  options?: { scale?: number },
): Promise<string> {
  for (const scale of sizesNear(options?.scale ?? 6)) {
    const image = await qrImage(text, { scale });
    if (image.width > FRAME.width || image.height > FRAME.height) continue;
    const planes = toI420(image, FRAME);
    const luminance = new Uint8ClampedArray(planes.subarray(0, FRAME.width * FRAME.height));
    if (decodeQr(luminance, FRAME.width, FRAME.height) === text) return writeFrame(planes, file, FRAME);
  }
  throw new Error(`the scanner's decoder reads "${text}" at no module size that fits the frame`);
}

/** A phone-sized Chromium whose camera shows `file`, with the camera permission granted. */
export async function launchWithCamera(
  file: string,
): Promise<{ browser: Browser; context: BrowserContext; page: Page }> {
  const browser = await launchChromium([
    '--use-fake-ui-for-media-stream',
    '--use-fake-device-for-media-stream',
    `--use-file-for-fake-video-capture=${resolve(file)}`,
  ]);
  const context = await browser.newContext({ ...devices['Pixel 7'], baseURL, permissions: ['camera'] });
  return { browser, context, page: await context.newPage() };
}
