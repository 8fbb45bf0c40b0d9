import type { EnginePolicy, FuelAssessment, InspectionEvent, TimelineEvent, TrailerSpec } from './types';
import { gallonsToLitres } from './units';

/** Float slack for comparisons of sums of eighths and rates (far below any gauge reading). */
const EPSILON = 1e-9;

/** Gallons in the tank for a gauge reading in eighths (0–8). */
export function eighthsToGallons(eighths: number, tankGallons: number): number {
  if (!(eighths >= 0 && eighths <= 8)) throw new RangeError(`fuel eighths must be 0–8, got ${eighths}`);
  return (eighths / 8) * tankGallons;
}

/** Litres in the tank for a gauge reading in eighths. */
export function eighthsToLitres(eighths: number, tankGallons: number): number {
  return gallonsToLitres(eighthsToGallons(eighths, tankGallons));
}

/** Reefer fuel burned over `hours` of engine run at the policy rate (US gal). */
export function expectedBurnGallons(hours: number, policy: EnginePolicy): number {
  return hours * policy.reeferBurnGallonsPerHour;
}

function isReading(e: TimelineEvent): e is InspectionEvent & { fuelEighths: number } {
  return e.type !== 'move' && typeof e.fuelEighths === 'number';
}

export interface FuelInput {
  trailer: TrailerSpec;
  /** Earlier events, oldest first; the latest one with a fuel reading is the baseline. */
  history: readonly TimelineEvent[];
  current: InspectionEvent;
  policy: EnginePolicy;
}

/**
 * Fuel at one drop, hook or walk: gallons and litres, shortfall against the policy's required
 * eighths (drops and hooks only), and the drop since the last reading against the burn the
 * engine hours explain. Flags a possible leak or theft only when the drop exceeds expected burn
 * plus the policy tolerance, in eighths of this trailer's tank (a drop exactly at the tolerance
 * is not flagged). Null when the
 * current event has no fuel reading.
 */
export function assessFuel({ trailer, history, current, policy }: FuelInput): FuelAssessment | null {
  if (typeof current.fuelEighths !== 'number') return null;
  const tank = trailer.fuelTankGallons ?? policy.defaultTankGallons;
  const eighths = current.fuelEighths;
  // the gauge reads in eighths of this tank, so the tolerance scales with the tank
  const tolerance = (policy.fuelDropToleranceEighths / 8) * tank;
  const gallons = eighthsToGallons(eighths, tank);
  const required =
    current.type === 'drop'
      ? policy.requiredFuelEighthsAtDrop
      : current.type === 'hook'
        ? policy.requiredFuelEighthsAtHook
        : null;
  const shortfallEighths = required === null ? 0 : Math.max(0, required - eighths);

  let prev: (InspectionEvent & { fuelEighths: number }) | null = null;
  for (let i = history.length - 1; i >= 0; i--) {
    const e = history[i];
    if (isReading(e)) {
      prev = e;
      break;
    }
  }

  let dropGallons: number | null = null;
  let hoursRun: number | null = null;
  let burn: number | null = null;
  let unexplained: number | null = null;
  if (prev) {
    dropGallons = Math.max(0, eighthsToGallons(prev.fuelEighths, tank) - gallons);
    const h0 = prev.reefer?.engineHours;
    const h1 = current.reefer?.engineHours;
    if (typeof h0 === 'number' && typeof h1 === 'number' && h1 >= h0) {
      hoursRun = h1 - h0;
      burn = expectedBurnGallons(hoursRun, policy);
      unexplained = dropGallons - burn;
    }
  }
  return {
    eighths,
    gallons,
    litres: gallonsToLitres(gallons),
    tankGallons: tank,
    requiredEighths: required,
    shortfallEighths,
    shortfallGallons: (shortfallEighths / 8) * tank,
    isShort: shortfallEighths > 0,
    previousEventId: prev?.id ?? null,
    dropGallons,
    engineHoursRun: hoursRun,
    expectedBurnGallons: burn,
    unexplainedGallons: unexplained,
    toleranceGallons: tolerance,
    isPossibleLeakOrTheft: unexplained !== null && unexplained > tolerance + EPSILON,
  };
}
