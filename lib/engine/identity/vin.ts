/** VIN rules of 49 CFR 565.15 (17 characters, check digit in position 9, model year in 10). */

const TRANSLITERATION: Record<string, number> = {
  A: 1,
  B: 2,
  C: 3,
  D: 4,
  E: 5,
  F: 6,
  G: 7,
  H: 8,
  J: 1,
  K: 2,
  L: 3,
  M: 4,
  N: 5,
  P: 7,
  R: 9,
  S: 2,
  T: 3,
  U: 4,
  V: 5,
  W: 6,
  X: 7,
  Y: 8,
  Z: 9,
};
const WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2];
const VIN_PATTERN = /^[A-HJ-NPR-Z0-9]{17}$/;
/** Position-10 codes in cycle order; index 0 = 1980 (or 2010, 2040, …). U, Z and 0 are unused. */
const YEAR_CODES = 'ABCDEFGHJKLMNPRSTVWXY123456789';

export type VinError = 'length' | 'characters' | 'check_digit';

export type VinResult =
  { ok: true; vin: string; checkDigit: string } | { ok: false; error: VinError; expectedCheckDigit?: string };

/** Trims and upper-cases a typed or scanned VIN. */
export function normalizeVin(raw: string): string {
  return raw.trim().toUpperCase();
}

/**
 * The check digit a VIN should carry (0–9 or `X`), per 565.15(c): transliterate, weight,
 * sum, remainder mod 11. Expects 17 valid characters; position 9 itself is ignored.
 */
export function computeVinCheckDigit(vin: string): string {
  const r = vinWeightedSum(vin) % 11;
  return r === 10 ? 'X' : String(r);
}

/** Sum of transliterated values × position weights (565.15(c)); 411 for the regulation's sample. */
export function vinWeightedSum(vin: string): number {
  let sum = 0;
  for (let i = 0; i < 17; i++) {
    const ch = vin[i];
    const value = ch >= '0' && ch <= '9' ? ch.charCodeAt(0) - 48 : TRANSLITERATION[ch];
    sum += value * WEIGHTS[i];
  }
  return sum;
}

/** Validates length, alphabet (no I, O, Q) and the check digit. Never throws. */
export function validateVin(raw: string): VinResult {
  const vin = normalizeVin(raw);
  if (vin.length !== 17) return { ok: false, error: 'length' };
  if (!VIN_PATTERN.test(vin)) return { ok: false, error: 'characters' };
  const expected = computeVinCheckDigit(vin);
  if (vin[8] !== expected) return { ok: false, error: 'check_digit', expectedCheckDigit: expected };
  return { ok: true, vin, checkDigit: expected };
}

/** Every model year the position-10 code can mean (30-year cycle from 1980), or [] if unused. */
export function modelYearCandidates(code: string): number[] {
  const i = YEAR_CODES.indexOf(code.toUpperCase());
  if (i < 0 || code.length !== 1) return [];
  const years: number[] = [];
  for (let y = 1980 + i; y <= 2100; y += 30) years.push(y);
  return years;
}

/**
 * A trailer's model year: the latest candidate not after `referenceYear + 1` (a trailer may
 * carry next year's model year). The position-7 rule for light vehicles does not apply to
 * trailers. Callers pass the reference year (usually the current year); null if undecodable.
 */
export function decodeTrailerModelYear(vin: string, referenceYear: number): number | null {
  const v = normalizeVin(vin);
  if (v.length !== 17) return null;
  const limit = referenceYear + 1;
  const fitting = modelYearCandidates(v[9]).filter((y) => y <= limit);
  return fitting.length === 0 ? null : fitting[fitting.length - 1];
}
