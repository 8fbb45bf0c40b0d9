// Drawing a QR symbol into a PDF page, shared by the handoff receipt and the label sheet: a white
// square with the quiet zone, then one filled square per dark module at a whole number of points
// per module (scanners misread fractional module sizes). Row 0 is at the top of the symbol.
import { rgb, type Color, type PDFPage } from 'pdf-lib';

/** A QR symbol's modules: `size` × `size`, dark or light. */
export type QrModules = { size: number; isDark: (row: number, col: number) => boolean };

/** The modules of a symbol made by the `qrcode` package (`QRCode.create(…).modules`). */
export const modulesOf = (m: { size: number; data: Uint8Array | ArrayLike<number> }): QrModules => ({
  size: m.size,
  isDark: (r, c) => m.data[r * m.size + c] === 1,
});

/**
 * Draws `qr` with its lower-left corner at (x, y), `modulePt` points per module and a quiet zone
 * of `margin` modules on every side. Returns the side of the square drawn, in points.
 */
export function drawQr(
  page: PDFPage,
  qr: QrModules,
  at: { x: number; y: number; modulePt: number; margin: number; ink: Color },
): number {
  const { x, y, modulePt: m, margin, ink } = at;
  const side = (qr.size + 2 * margin) * m;
  page.drawRectangle({ x, y, width: side, height: side, color: rgb(1, 1, 1) });
  for (let r = 0; r < qr.size; r++)
    for (let c = 0; c < qr.size; c++)
      if (qr.isDark(r, c))
        page.drawRectangle({
          x: x + (c + margin) * m,
          y: y + side - (r + 1 + margin) * m,
          width: m,
          height: m,
          color: ink,
        });
  return side;
}
