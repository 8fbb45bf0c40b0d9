/** US gallon = 231 in³ = 3.785 411 784 L exactly (NIST Handbook 44, Appendix C). */
export const LITRES_PER_US_GALLON = 3.785411784;
/** 1 inch = 25.4 mm exactly (NIST SP 811). */
export const MILLIMETRES_PER_INCH = 25.4;

export function gallonsToLitres(gallons: number): number {
  return gallons * LITRES_PER_US_GALLON;
}

export function litresToGallons(litres: number): number {
  return litres / LITRES_PER_US_GALLON;
}

/** °C = (°F − 32) / 1.8 (NIST SP 811, Appendix B). */
export function fahrenheitToCelsius(f: number): number {
  return (f - 32) / 1.8;
}

/** °F = 1.8 °C + 32 (NIST SP 811, Appendix B). */
export function celsiusToFahrenheit(c: number): number {
  return c * 1.8 + 32;
}

/** Tread depth in 32nds of an inch to millimetres. */
export function thirtySecondsToMillimetres(thirtySeconds: number): number {
  return (thirtySeconds / 32) * MILLIMETRES_PER_INCH;
}

/** Rounds to `digits` decimals for display (half away from zero). */
export function roundTo(value: number, digits: number): number {
  const f = 10 ** digits;
  return (Math.sign(value) * Math.round(Math.abs(value) * f)) / f;
}
