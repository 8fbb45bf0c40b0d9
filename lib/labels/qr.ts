// QR settings for trailer labels. Level Q recovers about 25 % of codewords (ISO/IEC 18004), which
// suits a label in a dirty yard; a link of up to 108 bytes then fits version 8 (SOURCES.md).
import QRCode from 'qrcode';

export const LABEL_QR_LEVEL = 'Q' as const;
/** The quiet zone the standard asks for: four modules on every side. */
export const LABEL_QR_MARGIN = 4;

/** The label's QR code as an SVG string, for the printable sheet. */
export function labelQrSvg(link: string): Promise<string> {
  return QRCode.toString(link, { type: 'svg', errorCorrectionLevel: LABEL_QR_LEVEL, margin: LABEL_QR_MARGIN });
}

/** The QR modules (dark = true), row by row, without the quiet zone; for drawing at an integer module size. */
export function labelQrModules(link: string): { size: number; version: number; isDark: (row: number, col: number) => boolean } {
  const qr = QRCode.create(link, { errorCorrectionLevel: LABEL_QR_LEVEL });
  const { size, data } = qr.modules;
  return { size, version: qr.version, isDark: (row, col) => data[row * size + col] === 1 };
}
