// QR settings for trailer labels. Level Q recovers about 25 % of codewords (ISO/IEC 18004), which
// suits a label in a dirty yard; a link of up to 108 bytes then fits version 8 (ISO/IEC 18004).
//
// The mask: ISO/IEC 18004 lets the encoder pick any of eight mask patterns. The scanner's decoder
// (@zxing/library, the one @zxing/browser runs on the phone) fails on a few percent of clean
// symbols with the encoder's own choice, whatever the module size, so each label keeps the first
// mask whose rendering that decoder reads back. Every rendering (sheet SVG, PDF) uses it.
import * as zxingModule from '@zxing/library';
import QRCode from 'qrcode';

export const LABEL_QR_LEVEL = 'Q' as const;
/** The quiet zone the standard asks for: four modules on every side. */
export const LABEL_QR_MARGIN = 4;

type Mask = 0 | 1 | 2 | 3 | 4 | 5 | 6 | 7;

// @zxing/library is CommonJS to Node: under Node's own ES module loader (Playwright's test files)
// its classes sit on `default`; bundlers and vitest give them as named exports. Read through
// Reflect.get, so the bundler does not take it for a static import of a default export it knows is
// missing (a build warning otherwise).
const zxing = (Reflect.get(zxingModule, 'default') as typeof zxingModule | undefined) ?? zxingModule;
const { BinaryBitmap, HybridBinarizer, QRCodeReader, RGBLuminanceSource } = zxing;

/** Whether the scanner's decoder reads `link` back from the symbol drawn with `mask` (4 px modules). */
export function scannerReadsBack(link: string, mask?: Mask): boolean {
  const qr = QRCode.create(link, {
    errorCorrectionLevel: LABEL_QR_LEVEL,
    ...(mask === undefined ? {} : { maskPattern: mask }),
  });
  const { size, data } = qr.modules;
  const px = 4;
  const n = (size + 2 * LABEL_QR_MARGIN) * px;
  const lum = new Uint8ClampedArray(n * n).fill(255);
  for (let r = 0; r < size; r++) {
    for (let c = 0; c < size; c++) {
      if (data[r * size + c] !== 1) continue;
      for (let dy = 0; dy < px; dy++)
        lum.fill(
          0,
          ((r + LABEL_QR_MARGIN) * px + dy) * n + (c + LABEL_QR_MARGIN) * px,
          ((r + LABEL_QR_MARGIN) * px + dy) * n + (c + LABEL_QR_MARGIN + 1) * px,
        );
    }
  }
  return decodeQr(lum, n, n) === link;
}

/** The text the scanner's decoder reads from a grey image (one byte per pixel), or null. */
export function decodeQr(luminance: Uint8ClampedArray, width: number, height: number): string | null {
  try {
    return new QRCodeReader()
      .decode(new BinaryBitmap(new HybridBinarizer(new RGBLuminanceSource(luminance, width, height))))
      .getText();
  } catch {
    return null;
  }
}

const masks = new Map<string, Mask | undefined>();

/** The encoder options for a label link: level Q and a mask the scanner is known to read. */
export function labelQrOptions(link: string): {
  errorCorrectionLevel: typeof LABEL_QR_LEVEL;
  maskPattern?: Mask;
} {
  if (!masks.has(link)) {
    let chosen: Mask | undefined;
    if (!scannerReadsBack(link))
      chosen = ([0, 1, 2, 3, 4, 5, 6, 7] as Mask[]).find((m) => scannerReadsBack(link, m));
    if (masks.size > 5_000) masks.clear();
    masks.set(link, chosen);
  }
  const maskPattern = masks.get(link);
  return { errorCorrectionLevel: LABEL_QR_LEVEL, ...(maskPattern === undefined ? {} : { maskPattern }) };
}

/** The label's QR code as an SVG string, for the printable sheet. */
export function labelQrSvg(link: string): Promise<string> {
  return QRCode.toString(link, { type: 'svg', margin: LABEL_QR_MARGIN, ...labelQrOptions(link) });
}

/** The QR modules (dark = true), row by row, without the quiet zone; for drawing at an integer module size. */
export function labelQrModules(link: string): {
  size: number;
  version: number;
  isDark: (row: number, col: number) => boolean;
} {
  const qr = QRCode.create(link, labelQrOptions(link));
  const { size, data } = qr.modules;
  return { size, version: qr.version, isDark: (row, col) => data[row * size + col] === 1 };
}
