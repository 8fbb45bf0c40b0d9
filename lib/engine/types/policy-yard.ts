/** Terminal policy and yard-walk reconciliation. */
import type { HoldSeverity } from './results';

// ---------- Policy ----------

/** A terminal's rules as data. See `defaultPolicy` and `defaultPolicySources`. */
export interface EnginePolicy {
  requiredFuelEighthsAtDrop: number;
  requiredFuelEighthsAtHook: number;
  reeferBurnGallonsPerHour: number;
  /**
   * Allowed fuel drop beyond expected burn before flagging a possible leak or theft, in gauge
   * eighths of this trailer's own tank (1 = one eighth: 6.25 gal of a 50 gal tank, 15 gal of 120).
   */
  fuelDropToleranceEighths: number;
  defaultTankGallons: number;
  preTripMaxAgeHours: number;
  minTreadThirtySeconds: number;
  spareHoldSeverity: HoldSeverity;
}

// ---------- Yard-walk reconciliation ----------

export interface BoardSlot {
  slotId: string;
  rowId: string;
  /** Trailer the board expects here; null for an empty slot. */
  expectedTrailerId: string | null;
}

export interface WalkScan {
  slotId: string;
  /** Resolved trailer id; null when the scanned code matched no known trailer. */
  trailerId: string | null;
  /** What was scanned or typed (label, VIN, unit number). */
  code: string;
}

/**
 * `duplicate`: the same trailer scanned in two or more different slots (one scan is wrong).
 * `unknown`: scanned but not on the board, or not a known unit.
 */
export type TrailerWalkStatus = 'matched' | 'wrong_slot' | 'missing' | 'unknown' | 'duplicate';
export type SlotWalkStatus = 'matched' | 'empty' | 'missing' | 'wrong_trailer' | 'unexpected';

export interface SlotResult {
  slotId: string;
  rowId: string | null;
  expectedTrailerId: string | null;
  /** Trailer ids (or codes for unknown units) scanned in this slot, in scan order. */
  found: string[];
  status: SlotWalkStatus;
}

export interface TrailerResult {
  /** Trailer id, or the scanned code when the unit is unknown. */
  trailerId: string;
  isKnownTrailer: boolean;
  status: TrailerWalkStatus;
  expectedSlotId: string | null;
  foundSlotIds: string[];
}

export interface ReconcileResult {
  slots: SlotResult[];
  trailers: TrailerResult[];
  summary: {
    slots: Record<SlotWalkStatus, number>;
    trailers: Record<TrailerWalkStatus, number>;
    scans: number;
    /** Scans of the same trailer in the same slot again (ignored, counted). */
    repeatScans: number;
  };
}
