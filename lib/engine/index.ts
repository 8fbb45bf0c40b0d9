/**
 * Hitchmark condition engine: pure functions over plain data. No clock, database, env or
 * framework: callers pass `now`, the policy and a display time zone. Times are `Date`.
 * Label tokens use node:crypto and live in `./identity/label-token` (server only).
 */
export { buildChecklist, ZONE_LABELS } from './checklist';
export { inspectableItems, OBSERVATION_FIELDS } from './observations';
export {
  CONDITION_LABELS,
  CONDITIONS,
  compareSeverity,
  isCondition,
  isInspected,
  severityOf,
  worstCondition,
} from './conditions';
export { classifyChange, compareInspection, damageFindings, inspectionKindOf } from './compare';
export type { CompareInput } from './compare';
export {
  buildCustodyLegs,
  currentCustodian,
  custodianAfter,
  custodianBefore,
  custodianKey,
  custodianName,
  legsAlong,
  legsBetweenEvents,
} from './custody';
export { attributeFindings } from './responsibility';
export type { AttributeInput } from './responsibility';
export { assessFuel, eighthsToGallons, eighthsToLitres, expectedBurnGallons } from './fuel';
export type { FuelInput } from './fuel';
export { evaluateHolds } from './holds';
export type { HoldInput } from './holds';
export {
  NO_PERISHABLE_CAUTION,
  OUT_OF_SERVICE_CAUTION,
  UNDER_TRAILER_CAUTION,
  YARD_ONLY_CAUTION,
} from './hold-parts';
export { eventRef, partyRef, reason } from './codes';
export { blocksHook, decideHook } from './hook';
export type { HookDecision } from './hook';
export { answerGroup, safetyGaps, safetyGroups, safetyItems, statedObservation } from './safety';
export type { SafetyAnswers, SafetyGap, SafetyGroup, SafetyGroupKey } from './safety';
export { reconcileWalk } from './reconcile';
export type { ReconcileInput } from './reconcile';
export { defaultPolicy, defaultPolicySources, makePolicy } from './policy';
export {
  celsiusToFahrenheit,
  fahrenheitToCelsius,
  gallonsToLitres,
  LITRES_PER_US_GALLON,
  litresToGallons,
  MILLIMETRES_PER_INCH,
  roundTo,
  thirtySecondsToMillimetres,
} from './units';
export * from './identity';
export type * from './types';
