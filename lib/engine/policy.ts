import type { EnginePolicy } from './types';

/**
 * Starting values for a terminal's policy. Every figure is data a terminal manager may change;
 * where each one comes from is in `defaultPolicySources`.
 */
export const defaultPolicy: EnginePolicy = {
  requiredFuelEighthsAtDrop: 8,
  requiredFuelEighthsAtHook: 8,
  reeferBurnGallonsPerHour: 0.8,
  fuelDropToleranceEighths: 1,
  defaultTankGallons: 50,
  preTripMaxAgeHours: 72,
  minTreadThirtySeconds: 2,
  spareHoldSeverity: 'restricted',
};

/** Where each default comes from (shown on the policy screen). */
export const defaultPolicySources: Record<keyof EnginePolicy, string> = {
  requiredFuelEighthsAtDrop: 'common practice: a reefer tank is expected full at every drop and hook',
  requiredFuelEighthsAtHook: 'common practice: a reefer tank is expected full at every drop and hook',
  reeferBurnGallonsPerHour:
    'secondary source: modern trailer refrigeration units burn about 0.4–1.1 US gal/h; 0.8 is a middle figure',
  fuelDropToleranceEighths:
    "terminal policy: one gauge eighth of the trailer's own tank, because the gauge reads only in eighths",
  defaultTankGallons: 'secondary source: reefer tanks are commonly about 50 US gal (25–120 seen)',
  preTripMaxAgeHours: 'terminal policy: no published figure; 72 h is a starting value',
  minTreadThirtySeconds: '49 CFR 393.75(c): at least 2/32 inch on trailer tires',
  spareHoldSeverity:
    'common practice: a trailer without a usable spare stays in the yard until one is fitted; ' +
    'from memory: no federal rule requires a trailer to carry a spare, so restricted (yard only), not out of service',
};

/** The default policy with some values replaced. */
export function makePolicy(overrides: Partial<EnginePolicy> = {}): EnginePolicy {
  return { ...defaultPolicy, ...overrides };
}
