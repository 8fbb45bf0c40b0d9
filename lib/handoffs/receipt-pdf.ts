// The handoff receipt as a PDF (US Letter), in the reader's language: the receipt's own lines (times
// in the terminal's zone, through lib/format/time.ts), the verification code, and a QR to the verify page with the code filled in.
import { PDFDocument, rgb, StandardFonts, type PDFFont, type PDFPage } from 'pdf-lib';
import QRCode from 'qrcode';
import { drawQr, modulesOf } from '@/lib/pdf/qr';
import { translatorFor } from '@/lib/i18n/translate';
import { receiptText, type ReceiptView } from './receipt';
import { formatVerificationCode } from './verification-code';

const PAGE = { width: 612, height: 792 }; // US Letter in points
const MARGIN = 54;
const SIZE = 10.5;
const LEADING = 14;
const QR_MARGIN = 4; // the quiet zone ISO/IEC 18004 asks for: four modules
const INK = rgb(0, 0, 0);

/** The link the receipt's QR encodes: the public verify page with this receipt's code. */
export function receiptVerifyLink(verifyUrl: string, code: string): string {
  return `${verifyUrl}?code=${encodeURIComponent(formatVerificationCode(code))}`;
}

// the standard PDF fonts encode WinAnsi only: anything else is written as a plain stand-in
const winAnsi = (s: string) =>
  s
    .replace(/[‘’]/g, "'")
    .replace(/[“”]/g, '"')
    .replace(/[–—]/g, '-')
    .replace(/…/g, '...')
    .replace(/[^\x20-\x7e\xa0-\xff]/g, '?');

function wrap(font: PDFFont, text: string, width: number): string[] {
  const out: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    const next = line ? `${line} ${word}` : word;
    if (font.widthOfTextAtSize(next, SIZE) <= width || !line) line = next;
    else {
      out.push(line);
      line = word;
    }
  }
  out.push(line);
  return out;
}

function drawReceiptQr(page: PDFPage, link: string, x: number, y: number, target: number) {
  const qr = modulesOf(QRCode.create(link, { errorCorrectionLevel: 'M' }).modules);
  const modulePt = Math.max(2, Math.floor(target / (qr.size + 2 * QR_MARGIN)));
  return drawQr(page, qr, { x, y, modulePt, margin: QR_MARGIN, ink: INK });
}

/** Builds the receipt PDF in `locale`. `verifyUrl` is the app's public verify page (…/verify). */
export async function buildReceiptPdf(
  view: ReceiptView,
  verifyUrl: string,
  locale: string = 'en',
): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  const t = translatorFor(locale, 'Mail');
  doc.setTitle(t('receipt.pdfTitle', { code: formatVerificationCode(view.verificationCode) }));
  doc.setLanguage(locale);
  doc.setCreator('Hitchmark');
  const font = await doc.embedFont(StandardFonts.Helvetica);
  const bold = await doc.embedFont(StandardFonts.HelveticaBold);
  let page = doc.addPage([PAGE.width, PAGE.height]);
  let y = PAGE.height - MARGIN;
  const link = receiptVerifyLink(verifyUrl, view.verificationCode);
  const qrSide = drawReceiptQr(page, link, PAGE.width - MARGIN - 120, PAGE.height - MARGIN - 120, 120);
  const textWidth = PAGE.width - 2 * MARGIN - qrSide - 12;
  const lines = receiptText(view, verifyUrl, locale).split('\n');
  lines.forEach((raw, i) => {
    const isTitle = i === 0;
    const width = y > PAGE.height - MARGIN - qrSide - 8 ? textWidth : PAGE.width - 2 * MARGIN;
    for (const line of raw ? wrap(isTitle ? bold : font, winAnsi(raw), width) : ['']) {
      if (y < MARGIN) {
        page = doc.addPage([PAGE.width, PAGE.height]);
        y = PAGE.height - MARGIN;
      }
      if (line)
        page.drawText(line, {
          x: MARGIN,
          y,
          size: isTitle ? 14 : SIZE,
          font: isTitle ? bold : font,
          color: INK,
        });
      y -= isTitle ? 20 : LEADING;
    }
  });
  return doc.save();
}
