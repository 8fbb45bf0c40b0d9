/** Parties and the timeline of drops, hooks, yard moves and yard walks. Times are `Date`. */
import type { ItemObservations } from './checklist';

// ---------- Parties and timeline ----------

/** The driver at a drop or hook and the carrier they drive for. */
export interface Party {
  carrierId: string;
  carrierName: string;
  driverId?: string;
  driverName?: string;
}

export type Custodian =
  { type: 'terminal' } | { type: 'carrier'; carrierId: string; carrierName: string; driverName?: string };

export interface PreTrip {
  result: 'passed' | 'failed';
  at: Date;
}

export interface ReeferReadings {
  isUnitOn?: boolean | null;
  setpointF?: number | null;
  returnAirF?: number | null;
  engineHours?: number | null;
  preTrip?: PreTrip | null;
}

/** A drop (check-in) or hook (check-out) at the gate: always a full inspection. */
export interface HandoffEvent {
  type: 'drop' | 'hook';
  id: string;
  at: Date;
  party: Party;
  items: ItemObservations;
  /** Reefer fuel gauge in eighths, 0–8; null when not read. */
  fuelEighths?: number | null;
  reefer?: ReeferReadings | null;
  isLoaded?: boolean;
  sealNumber?: string | null;
  /**
   * Set when this record is a correction standing in for an earlier one: `at` is then the time
   * of the record it corrects, and this is when the correction was recorded.
   */
  correctedAt?: Date | null;
}

/** A yard jockey moving the trailer; custody stays with the terminal. */
export interface YardMoveEvent {
  type: 'move';
  id: string;
  at: Date;
  jockeyName?: string;
  fromSlotId?: string | null;
  toSlotId?: string | null;
}

/** A yard walk's quick checks of this trailer: a quick inspection of the items it covers. */
export interface YardWalkEvent {
  type: 'walk';
  id: string;
  at: Date;
  jockeyName?: string;
  items: ItemObservations;
  fuelEighths?: number | null;
  reefer?: ReeferReadings | null;
}

export type TimelineEvent = HandoffEvent | YardMoveEvent | YardWalkEvent;
/** Events that inspect items. */
export type InspectionEvent = HandoffEvent | YardWalkEvent;
export type InspectionKind = 'full' | 'quick';
