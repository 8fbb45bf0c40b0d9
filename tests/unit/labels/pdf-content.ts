// Test helpers that read what pdf-lib wrote: the page content operators, the text shown, and the
// black filled rectangles painted onto a bitmap (so an independent decoder can read the QR).
import { decodePDFRawStream, PDFArray, PDFDocument, PDFRawStream } from 'pdf-lib';

export async function pageContents(pdf: Uint8Array): Promise<string[]> {
  const doc = await PDFDocument.load(pdf);
  return doc.getPages().map((page) => {
    const contents = page.node.Contents();
    const refs = contents instanceof PDFArray ? contents.asArray() : contents ? [contents] : [];
    return refs
      .map((ref) => doc.context.lookup(ref))
      .map((stream) => Buffer.from(decodePDFRawStream(stream as PDFRawStream).decode()).toString('latin1'))
      .join('\n');
  });
}

/** Strings drawn with `<hex> Tj` (pdf-lib writes standard-font text as WinAnsi hex). */
export function shownText(content: string): string[] {
  return [...content.matchAll(/<([0-9A-Fa-f]+)> Tj/g)].map((m) =>
    Buffer.from(m[1], 'hex').toString('latin1'),
  );
}

/**
 * Paints every black-filled rectangle of one page inside a clip box onto an RGBA bitmap at one
 * pixel per point (white elsewhere), flipping PDF's bottom-up y axis.
 */
export function rasterizeBlackRects(
  content: string,
  clip: { x: number; y: number; width: number; height: number },
) {
  const { width, height } = clip;
  const rgba = new Uint8ClampedArray(width * height * 4).fill(255);
  for (const block of content.split(/\nQ\n?/)) {
    if (!/\n0 0 0 rg\n/.test(`\n${block}\n`) || !/\nf\s*$/.test(block)) continue;
    const at = /1 0 0 1 (-?[\d.]+) (-?[\d.]+) cm/.exec(block);
    const corner = /\n(-?[\d.]+) (-?[\d.]+) l\n(-?[\d.]+) (-?[\d.]+) l\n/.exec(block);
    if (!at || !corner) continue;
    const x0 = Number(at[1]) - clip.x;
    const y0 = Number(at[2]) - clip.y;
    const w = Number(corner[3]);
    const h = Number(corner[4]);
    for (let py = Math.round(y0); py < Math.round(y0 + h); py++) {
      for (let px = Math.round(x0); px < Math.round(x0 + w); px++) {
        if (px < 0 || py < 0 || px >= width || py >= height) continue;
        const i = ((height - 1 - py) * width + px) * 4;
        rgba[i] = rgba[i + 1] = rgba[i + 2] = 0;
      }
    }
  }
  return { data: rgba, width, height };
}
