/** Standard Carrier Alpha Code: 2–4 capital letters (National Motor Freight Traffic Association). */
const SCAC_PATTERN = /^[A-Z]{2,4}$/;

export type ScacResult = { ok: true; scac: string } | { ok: false; error: 'format' };

/** Trims and upper-cases, then checks the 2–4 letter format. Never throws. */
export function validateScac(raw: string): ScacResult {
  const scac = raw.trim().toUpperCase();
  return SCAC_PATTERN.test(scac) ? { ok: true, scac } : { ok: false, error: 'format' };
}

/** True for an already-normalised code of 2–4 capital letters. */
export function isScac(value: string): boolean {
  return SCAC_PATTERN.test(value);
}

/**
 * Four-letter codes ending in U (containers), X (private rail cars) or Z (intermodal chassis
 * and trailers) are reserved for equipment, not carriers.
 */
export function isEquipmentScac(scac: string): boolean {
  return scac.length === 4 && isScac(scac) && /[UXZ]$/.test(scac);
}
