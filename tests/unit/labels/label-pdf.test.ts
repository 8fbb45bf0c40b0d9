import jsQR from 'jsqr';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { signLabelToken } from '@/lib/engine/identity/label-token';
import { buildLabelPdf, pdfModulePoints, type PrintableLabel } from '@/lib/labels/label-pdf';
import { labelQrModules } from '@/lib/labels/qr';
import { pageContents, rasterizeBlackRects, shownText } from './pdf-content';

const SECRET = 'a-test-secret-for-hitchmark-labels-0123456789';
const labels: PrintableLabel[] = Array.from({ length: 5 }, (_, i) => ({
  unitNumber: `R5300${i + 1}`,
  vin: '1G4AH59H45G118341', // the sample VIN of 49 CFR 565.15; any valid VIN serves here
  ownerScac: 'BRCL',
  link: `https://gate.hitchmark.example/l/${signLabelToken({ labelId: `label-${i}`, trailerId: `trailer-${i}` }, SECRET)}`,
}));

describe('label PDF', () => {
  it('puts four labels on a Letter page: five labels make two pages', async () => {
    const doc = await PDFDocument.load(await buildLabelPdf(labels));
    expect(doc.getPageCount()).toBe(2);
    expect(doc.getPage(0).getSize()).toEqual({ width: 612, height: 792 });
    expect(doc.getTitle()).toBe('Hitchmark trailer labels');
  });

  it('shows each unit number and VIN as text, in order', async () => {
    const pages = await pageContents(await buildLabelPdf(labels));
    const text = pages.map(shownText);
    expect(text[0].filter((t) => /^R5300\d$/.test(t))).toEqual(['R53001', 'R53002', 'R53003', 'R53004']);
    expect(text[1].filter((t) => /^R5300\d$/.test(t))).toEqual(['R53005']);
    expect(text[0]).toContain('VIN 1G4AH59H45G118341   Owner BRCL');
  });

  it('draws the QR at a whole number of points per module, decodable by jsqr (ISO/IEC 18004)', async () => {
    const size = labelQrModules(labels[0].link).size;
    const m = pdfModulePoints(size);
    expect(Number.isInteger(m)).toBe(true);
    expect(m).toBeGreaterThanOrEqual(3);
    const [first] = await pageContents(await buildLabelPdf([labels[0]]));
    // the first label sits in the top-left quarter of the page
    const image = rasterizeBlackRects(first, { x: 0, y: 396, width: 306, height: 396 });
    const decoded = jsQR(image.data, image.width, image.height);
    expect(decoded?.data).toBe(labels[0].link);
  });
});
