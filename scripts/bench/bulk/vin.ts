// Invented trailer VINs that pass the check digit of 49 CFR 565.15(c) (ISO 3779 layout):
// positions 1–3 a made-up manufacturer code, 4–8 descriptors, 9 the check digit, 10 the model
// year, 11 the plant, 12–17 the serial. The check digit comes from the app's own rule
// (lib/engine/identity/vin.ts), whose tests check it against the regulation's worked example.
import { computeVinCheckDigit } from '@/lib/engine/identity/vin';

/** Model-year codes of position 10 for 2014…2025 (49 CFR 565.15(d), table of year codes). */
const YEARS = 'EFGHJKLMNPRS';
const DESCRIPTORS = ['RF532', 'RF534', 'DV532', 'RF484'];

/** The n-th invented VIN (n ≥ 1); distinct for n up to 9,999,999. */
export function inventedVin(n: number): string {
  const body =
    '1H9' +
    DESCRIPTORS[n % DESCRIPTORS.length] +
    '0' +
    YEARS[n % YEARS.length] +
    'K' +
    String(n % 1_000_000).padStart(6, '0');
  // serials repeat every million; the plant letter then changes so the VIN stays unique
  const vin =
    n >= 1_000_000 ? body.slice(0, 10) + 'LMNPRSTVW'[Math.floor(n / 1_000_000) % 9] + body.slice(11) : body;
  return vin.slice(0, 8) + computeVinCheckDigit(vin) + vin.slice(9);
}
