import jsQR from 'jsqr';
import QRCode from 'qrcode';
import { describe, expect, it } from 'vitest';
import { LABEL_QR_MARGIN, labelQrModules, labelQrOptions, scannerReadsBack } from '@/lib/labels/qr';

// Links shaped like real label links (origin + /l/ + a 70-character token), from a fixed seed of bytes
// so the run is repeatable: the token bytes are what decides whether a given mask trips the decoder.
const links = Array.from(
  { length: 150 },
  (_, i) =>
    `http://localhost:3000/l/${Buffer.from(
      Array.from({ length: 53 }, (_, j) => (i * 131 + j * j * 17 + i * j) % 256),
    )
      .toString('base64url')
      .slice(0, 70)}`,
);

/** Draws the label's modules at 4 px and decodes them with jsqr, an independent ISO/IEC 18004 decoder. */
function jsqrReads(link: string): boolean {
  const m = labelQrModules(link);
  const px = 4;
  const n = (m.size + 2 * LABEL_QR_MARGIN) * px;
  const rgba = new Uint8ClampedArray(n * n * 4).fill(255);
  for (let y = 0; y < n; y++) {
    for (let x = 0; x < n; x++) {
      const r = Math.floor(y / px) - LABEL_QR_MARGIN;
      const c = Math.floor(x / px) - LABEL_QR_MARGIN;
      if (r >= 0 && c >= 0 && r < m.size && c < m.size && m.isDark(r, c))
        rgba.fill(0, (y * n + x) * 4, (y * n + x) * 4 + 3);
    }
  }
  return jsQR(rgba, n, n)?.data === link;
}

describe('label QR mask chosen for the scanner', () => {
  it("some links trip the scanner with the encoder's own mask — the reason for choosing one", () => {
    const tripping = links.filter((l) => !scannerReadsBack(l));
    expect(tripping.length).toBeGreaterThan(0);
    // … and for each of them another of the eight masks of ISO/IEC 18004 reads back
    for (const l of tripping) expect(labelQrOptions(l).maskPattern).toBeDefined();
  });

  it("every label rendering reads back with the scanner's decoder and with jsqr", () => {
    for (const l of links) {
      const mask = labelQrOptions(l).maskPattern;
      expect(scannerReadsBack(l, mask)).toBe(true);
      expect(jsqrReads(l)).toBe(true);
    }
  });

  it("a link the scanner reads as is keeps the encoder's own mask", () => {
    const fine = links.find((l) => scannerReadsBack(l))!;
    expect(labelQrOptions(fine).maskPattern).toBeUndefined();
    expect(QRCode.create(fine, labelQrOptions(fine)).maskPattern).toBe(
      QRCode.create(fine, { errorCorrectionLevel: 'Q' }).maskPattern,
    );
  });
});
