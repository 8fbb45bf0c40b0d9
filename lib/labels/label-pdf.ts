// The label sheet as a PDF: four labels per US Letter page (2 × 2), each with the unit number in
// large type, the QR drawn as filled squares at a whole number of points per module (scanners
// misread fractional module sizes), and the VIN and owner SCAC in small type.
import { PDFDocument, rgb, StandardFonts, type PDFFont, type PDFPage } from 'pdf-lib';
import { drawQr } from '@/lib/pdf/qr';
import { LABEL_QR_MARGIN, labelQrModules } from './qr';

export interface PrintableLabel {
  unitNumber: string;
  vin: string;
  ownerScac: string;
  link: string;
}

const PAGE = { width: 612, height: 792 }; // US Letter in points
const CELL = { width: PAGE.width / 2, height: PAGE.height / 2 };
const QR_TARGET_PT = 230;
const INK = rgb(0, 0, 0);

/** Whole points per module so the QR with its quiet zone fits about QR_TARGET_PT; never below 3 pt. */
export function pdfModulePoints(moduleCount: number): number {
  return Math.max(3, Math.floor(QR_TARGET_PT / (moduleCount + 2 * LABEL_QR_MARGIN)));
}

function fitSize(font: PDFFont, text: string, maxWidth: number, largest: number): number {
  const width = font.widthOfTextAtSize(text, largest);
  return width <= maxWidth ? largest : Math.floor((largest * maxWidth) / width);
}

function drawLabel(
  page: PDFPage,
  label: PrintableLabel,
  x0: number,
  y0: number,
  bold: PDFFont,
  mono: PDFFont,
) {
  page.drawRectangle({
    x: x0 + 8,
    y: y0 + 8,
    width: CELL.width - 16,
    height: CELL.height - 16,
    borderColor: rgb(0.75, 0.75, 0.75),
    borderWidth: 0.75,
  });
  const centre = x0 + CELL.width / 2;
  const unitSize = fitSize(bold, label.unitNumber, CELL.width - 48, 64);
  const unitWidth = bold.widthOfTextAtSize(label.unitNumber, unitSize);
  page.drawText(label.unitNumber, {
    x: centre - unitWidth / 2,
    y: y0 + CELL.height - 30 - unitSize * 0.75,
    size: unitSize,
    font: bold,
    color: INK,
  });

  const qr = labelQrModules(label.link);
  const m = pdfModulePoints(qr.size);
  const side = (qr.size + 2 * LABEL_QR_MARGIN) * m;
  drawQr(page, qr, { x: centre - side / 2, y: y0 + 58, modulePt: m, margin: LABEL_QR_MARGIN, ink: INK });
  const small = `VIN ${label.vin}   Owner ${label.ownerScac}`;
  const smallSize = fitSize(mono, small, CELL.width - 40, 9);
  page.drawText(small, {
    x: centre - mono.widthOfTextAtSize(small, smallSize) / 2,
    y: y0 + 38,
    size: smallSize,
    font: mono,
    color: INK,
  });
  const foot = 'Hitchmark trailer label - scan at the gate';
  page.drawText(foot, {
    x: centre - mono.widthOfTextAtSize(foot, 7) / 2,
    y: y0 + 24,
    size: 7,
    font: mono,
    color: rgb(0.3, 0.3, 0.3),
  });
}

/** Builds the PDF; labels fill pages left to right, top to bottom. */
export async function buildLabelPdf(
  labels: PrintableLabel[],
  title = 'Hitchmark trailer labels',
): Promise<Uint8Array> {
  const doc = await PDFDocument.create();
  doc.setTitle(title);
  doc.setCreator('Hitchmark');
  const bold = await doc.embedFont(StandardFonts.HelveticaBold);
  const mono = await doc.embedFont(StandardFonts.Courier);
  let page: PDFPage | null = null;
  labels.forEach((label, i) => {
    const slot = i % 4;
    if (slot === 0) page = doc.addPage([PAGE.width, PAGE.height]);
    const x0 = (slot % 2) * CELL.width;
    const y0 = slot < 2 ? CELL.height : 0;
    drawLabel(page!, label, x0, y0, bold, mono);
  });
  return doc.save();
}
