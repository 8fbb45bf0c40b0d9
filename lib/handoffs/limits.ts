// Kept apart from the schema (lib/validation/handoffs.ts) so the gate form can read the limits
// without loading zod with its first page; the schema is loaded when the driver sends.
/**
 * The limits of the gate form's fields: the schema and the browser's own limits
 * (maxLength, min, max) both read them, so the two never disagree.
 */
export const HANDOFF_LIMITS = {
  tread: { min: 0, max: 32 },
  setpointF: { min: -40, max: 90 },
  returnAirF: { min: -60, max: 140 },
  engineHours: { min: 0, max: 200_000 },
  itemNote: 500,
  note: 1000,
  driverName: 80,
  tractorNumber: 20,
  sealNumber: 30,
} as const;
export const TREAD_LIMITS = HANDOFF_LIMITS.tread;
