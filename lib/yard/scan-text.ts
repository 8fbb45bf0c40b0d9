import { classifyScan } from '@/lib/labels/scan-text';

/**
 * What a scanned or typed text names in the yard: a label token (from a label link), a VIN or,
 * failing both, a unit number. Label links and VINs are read the way the scanner reads them
 * (lib/labels/scan-text); the token's signature is checked on the server.
 */
export type ScanTarget =
  { kind: 'label'; token: string } | { kind: 'vin'; vin: string } | { kind: 'unit'; unitNumber: string };

export function classifyScanText(raw: string): ScanTarget {
  const code = classifyScan(raw);
  if (code.kind === 'token') return { kind: 'label', token: code.token };
  if (code.kind === 'vin') return { kind: 'vin', vin: code.vin };
  return { kind: 'unit', unitNumber: raw.trim().toUpperCase() };
}
