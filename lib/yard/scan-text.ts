/**
 * What a scanned or typed text names: a label token (from a label link), a VIN (17 characters)
 * or a unit number. The label token is verified by the caller; this only classifies.
 */
export type ScanTarget = { kind: 'label'; token: string } | { kind: 'vin'; vin: string } | { kind: 'unit'; unitNumber: string };

export function classifyScanText(raw: string): ScanTarget {
  const text = raw.trim();
  if (/^https?:\/\//i.test(text)) {
    try {
      const url = new URL(text);
      const token = url.searchParams.get('t') ?? url.pathname.split('/').filter(Boolean).pop() ?? '';
      return { kind: 'label', token };
    } catch {
      return { kind: 'unit', unitNumber: text.toUpperCase() };
    }
  }
  const upper = text.toUpperCase();
  if (/^[A-HJ-NPR-Z0-9]{17}$/.test(upper)) return { kind: 'vin', vin: upper };
  return { kind: 'unit', unitNumber: upper };
}
