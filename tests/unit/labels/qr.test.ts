import jsQR from 'jsqr';
import { PNG } from 'pngjs';
import QRCode from 'qrcode';
import { describe, expect, it } from 'vitest';
import { signLabelToken } from '@/lib/engine/identity/label-token';
import { LABEL_QR_LEVEL, LABEL_QR_MARGIN, labelQrModules, labelQrSvg } from '@/lib/labels/qr';

const SECRET = 'a-test-secret-for-hitchmark-labels-0123456789';
const token = signLabelToken(
  { labelId: 'f3b1c2d4-5e6f-4a7b-8c9d-0e1f2a3b4c5d', trailerId: '0a1b2c3d-4e5f-4607-8819-2a3b4c5d6e7f' },
  SECRET,
);
// a production-like address and the e2e one; both links stay under 108 bytes
const LINKS = [`https://gate.hitchmark.example/l/${token}`, `http://localhost:3501/l/${token}`];

// Byte-mode capacity at level Q per ISO/IEC 18004 (docs/sources.md): 108 bytes → version 8.
const SOURCES_Q_VERSION_FOR_108_BYTES = 8;

function decodeRgba(data: Uint8ClampedArray, width: number, height: number) {
  // jsqr: an independent decoder of ISO/IEC 18004 symbols (not the encoder that made them)
  return jsQR(data, width, height, { inversionAttempts: 'dontInvert' });
}

/** Paints qrcode's SVG (horizontal stroke runs, one module high) onto a bitmap at `scale` px per module. */
function rasterizeSvg(svg: string, scale: number) {
  const size = Number(/viewBox="0 0 (\d+) \d+"/.exec(svg)![1]);
  const d = /<path stroke="#000000" d="([^"]+)"/.exec(svg)![1];
  const w = size * scale;
  const rgba = new Uint8ClampedArray(w * w * 4).fill(255);
  let x = 0;
  let y = 0;
  for (const [, op, a, b] of d.matchAll(/([MmHh])(-?[\d.]+)(?: (-?[\d.]+))?/g)) {
    if (op === 'M') [x, y] = [Number(a), Number(b)];
    else if (op === 'm') [x, y] = [x + Number(a), y + Number(b)];
    else {
      const to = op === 'h' ? x + Number(a) : Number(a);
      const row = Math.floor(y);
      for (let py = row * scale; py < (row + 1) * scale; py++) {
        for (let px = x * scale; px < to * scale; px++)
          rgba.fill(0, (py * w + px) * 4, (py * w + px) * 4 + 3);
      }
      x = to;
    }
  }
  return { data: rgba, width: w, height: w };
}

describe('label QR codes (checked with jsqr against ISO/IEC 18004)', () => {
  for (const link of LINKS) {
    it(`a PNG of ${link.slice(0, 30)}… decodes to the link, at version ≤ 8 for level Q`, async () => {
      expect(Buffer.byteLength(link)).toBeLessThanOrEqual(108);
      const png = PNG.sync.read(
        await QRCode.toBuffer(link, {
          errorCorrectionLevel: LABEL_QR_LEVEL,
          margin: LABEL_QR_MARGIN,
          scale: 4,
        }),
      );
      const decoded = decodeRgba(new Uint8ClampedArray(png.data), png.width, png.height);
      expect(decoded?.data).toBe(link);
      // ISO/IEC 18004 capacity: ≤ 108 bytes in byte mode at Q fits version 8
      expect(decoded!.version).toBeLessThanOrEqual(SOURCES_Q_VERSION_FOR_108_BYTES);
      // the encoder's own idea of the version agrees with what the independent decoder read
      expect(labelQrModules(link).version).toBe(decoded!.version);
    });
  }

  it('the SVG printed on the label sheet decodes to the link too', async () => {
    const svg = await labelQrSvg(LINKS[0]);
    const image = rasterizeSvg(svg, 4);
    // quiet zone of four modules on each side (ISO/IEC 18004 asks for 4)
    expect(image.width / 4).toBe(labelQrModules(LINKS[0]).size + 2 * LABEL_QR_MARGIN);
    expect(decodeRgba(image.data, image.width, image.height)?.data).toBe(LINKS[0]);
  });

  // The same smear, at two levels: Q (about 25 % recovery) reads, L (about 7 %) does not (ISO/IEC 18004).
  async function smeared(level: 'L' | 'Q') {
    const png = PNG.sync.read(
      await QRCode.toBuffer(LINKS[0], { errorCorrectionLevel: level, margin: 4, scale: 4 }),
    );
    // a band 3 modules high across the lower data area, clear of the finder patterns
    const top = Math.floor(png.height * 0.6);
    for (let y = top; y < top + 12; y++) {
      for (let x = 4 * 12; x < png.width - 4 * 12; x++)
        png.data.fill(0, (y * png.width + x) * 4, (y * png.width + x) * 4 + 3);
    }
    return decodeRgba(new Uint8ClampedArray(png.data), png.width, png.height)?.data ?? null;
  }

  it('a smeared label still reads at level Q, where level L would not', async () => {
    expect(await smeared('Q')).toBe(LINKS[0]);
    expect(await smeared('L')).toBeNull();
  });
});
