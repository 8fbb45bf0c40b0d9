/**
 * WCAG 2.x contrast, written out from the definitions in WCAG 2.2 ("relative luminance" and
 * "contrast ratio" in the glossary): sRGB channels linearised, L = 0.2126 R + 0.7152 G + 0.0722 B,
 * ratio = (L1 + 0.05) / (L2 + 0.05) with L1 the lighter.
 */
export function parseHex(hex: string): [number, number, number] {
  const m = /^#([0-9a-f]{6})$/i.exec(hex.trim());
  if (!m) throw new Error(`not a #rrggbb colour: ${hex}`);
  const n = parseInt(m[1], 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

function channel(c8: number): number {
  const c = c8 / 255;
  // WCAG 2.2 prints 0.04045 (older versions printed 0.03928; no 8-bit value falls between them)
  return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
}

export function relativeLuminance(hex: string): number {
  const [r, g, b] = parseHex(hex).map(channel);
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

export function contrastRatio(a: string, b: string): number {
  const [hi, lo] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/** WCAG 2.2 AA: 1.4.3 text 4.5:1; 1.4.11 non-text (shapes, borders, icons) 3:1. */
export const AA_TEXT = 4.5;
export const AA_NON_TEXT = 3;
