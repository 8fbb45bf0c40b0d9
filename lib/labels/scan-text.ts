// What a scanned or typed code means, decided in one place for the scanner, the lookup API and
// the tests. Pure and client-safe: no node:crypto, no db. The signature is checked on the server.
import { validateVin } from '@/lib/engine/identity';

/** A label token is base64url; a signed Hitchmark token of two UUIDs is 68 characters. */
export const LABEL_TOKEN_PATTERN = /^[A-Za-z0-9_-]{20,400}$/;
const LABEL_PATH = /^\/l\/([A-Za-z0-9_-]{20,400})\/?$/;

/**
 * The token of a Hitchmark label link (`https://host/l/<token>`), or null. Any host is accepted:
 * the server decides by the signature whether the label is ours, not by the address.
 */
export function extractLabelToken(text: string): string | null {
  let url: URL;
  try {
    url = new URL(text.trim());
  } catch {
    return null;
  }
  if (url.protocol !== 'https:' && url.protocol !== 'http:') return null;
  return LABEL_PATH.exec(url.pathname)?.[1] ?? null;
}

/**
 * Trims and upper-cases a typed or scanned VIN. Some Code 39 VIN barcodes carry a leading `I`
 * (an import marker; `common practice`): it is dropped only when the remaining 17 characters
 * form a valid VIN, since I never appears in a VIN itself (49 CFR 565.15).
 */
export function normalizeScannedVin(raw: string): string {
  const v = raw.trim().toUpperCase();
  if (v.length === 18 && v.startsWith('I') && validateVin(v.slice(1)).ok) return v.slice(1);
  return v;
}

export type ScannedCode =
  { kind: 'token'; token: string } | { kind: 'vin'; vin: string } | { kind: 'unknown'; text: string };

/** Classifies decoded text: a label link, a VIN (17 characters, maybe with the `I` marker), or unknown. */
export function classifyScan(text: string): ScannedCode {
  const token = extractLabelToken(text);
  if (token) return { kind: 'token', token };
  const vin = normalizeScannedVin(text);
  if (/^[A-Z0-9]{17}$/.test(vin)) return { kind: 'vin', vin };
  return { kind: 'unknown', text: text.slice(0, 200) };
}
