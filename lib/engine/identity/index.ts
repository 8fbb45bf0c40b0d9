// Label tokens (node:crypto) are deliberately not re-exported here, so that client components
// can import VIN and SCAC helpers; on the server, import the label-token module directly.
export {
  computeVinCheckDigit,
  decodeTrailerModelYear,
  modelYearCandidates,
  normalizeVin,
  validateVin,
  vinWeightedSum,
} from './vin';
export type { VinError, VinResult } from './vin';
export { isEquipmentScac, isScac, validateScac } from './scac';
export type { ScacResult } from './scac';
