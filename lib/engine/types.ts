/**
 * Public data types of the Hitchmark condition engine.
 * Everything here is plain, serialisable data. Times are `Date` objects (UTC instants);
 * callers convert ISO strings at the edge. Display time zones are passed in explicitly.
 */

// ---------- Trailer and checklist ----------

export type TrailerKind = 'reefer' | 'dry_van';
export type TireLayout = 'dual' | 'wide_single';

/** The physical shape of one trailer; it decides which checklist items exist. */
export interface TrailerSpec {
  kind: TrailerKind;
  hingesPerDoor: 4 | 5;
  /** Number of axles on the tandem (usually 2). */
  axles: number;
  tireLayout: TireLayout;
  /** Reefer fuel tank size in US gallons; `policy.defaultTankGallons` when absent. */
  fuelTankGallons?: number;
}

/**
 * What an item asks for, beyond its condition:
 * - `condition`: condition only
 * - `skin`: condition + `isInsulationShowing` (reefer walls and skin)
 * - `hinge`: condition + `isLocking`
 * - `pin`: condition + `isEngaged` (tandem locking pin)
 * - `spare`: condition (`missing` when absent) + `isMounted` + `isHoldingAir`
 * - `tire`: condition + `treadThirtySeconds` + `isHoldingAir`
 * - `leak`: condition + `isLeaking` (fuel tank)
 * - `cleanliness`: condition + `cleanliness`
 * - `reading`: a reefer or fuel reading, stored on the event, not in `items`
 */
export type ItemKind =
  | 'condition' | 'skin' | 'hinge' | 'pin' | 'spare' | 'tire' | 'leak' | 'cleanliness' | 'reading';

export type ZoneKey =
  | 'nose' | 'reefer_unit' | 'left_side' | 'right_side' | 'undercarriage' | 'tires' | 'rear'
  | 'interior' | 'readings';

/** Which event field a `reading` item fills. */
export type ReadingField =
  | 'fuelEighths' | 'isUnitOn' | 'setpointF' | 'returnAirF' | 'engineHours' | 'preTrip';

export interface ChecklistItem {
  /** Stable key, e.g. `rear.door_left.hinge_3`; never renamed, so old records still compare. */
  key: string;
  label: string;
  zone: ZoneKey;
  kind: ItemKind;
  /** Only for `kind: 'reading'`. */
  reading?: ReadingField;
}

export interface ChecklistZone {
  key: ZoneKey;
  label: string;
  items: ChecklistItem[];
}

export interface Checklist {
  spec: TrailerSpec;
  zones: ChecklistZone[];
  /** All items of all zones, in form order. */
  items: ChecklistItem[];
}

// ---------- Conditions and observations ----------

export type Condition = 'ok' | 'minor' | 'damaged' | 'unsafe' | 'missing' | 'not_checked';

export type Cleanliness = 'clean' | 'sweep' | 'washout';

/** What was seen of one item at one event. Fields not asked by the item's kind stay undefined. */
export interface ItemObservation {
  condition: Condition;
  treadThirtySeconds?: number;
  isHoldingAir?: boolean;
  isEngaged?: boolean;
  isMounted?: boolean;
  isLocking?: boolean;
  isInsulationShowing?: boolean;
  isLeaking?: boolean;
  cleanliness?: Cleanliness;
  note?: string;
  photoIds?: string[];
}

/** Observations by item key. A key that is absent counts as `not_checked`, never as `ok`. */
export type ItemObservations = Record<string, ItemObservation>;

// ---------- Parties and timeline ----------

/** The driver at a drop or hook and the carrier they drive for. */
export interface Party {
  carrierId: string;
  carrierName: string;
  driverId?: string;
  driverName?: string;
}

export type Custodian =
  | { type: 'terminal' }
  | { type: 'carrier'; carrierId: string; carrierName: string; driverName?: string };

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

// ---------- Comparison ----------

export type FindingKind = 'new' | 'worse' | 'unchanged' | 'repaired' | 'first_record' | 'not_checked';

/** One item of one inspection, compared with the latest earlier inspection of that item. */
export interface ItemFinding {
  itemKey: string;
  label: string;
  zone: ZoneKey;
  finding: FindingKind;
  current: Condition;
  /** Condition at the latest earlier inspection of the item; null when there was none. */
  previous: Condition | null;
  previousEventId: string | null;
  previousAt: Date | null;
  /** Index in the history passed in; null when there was no earlier inspection. */
  previousIndex: number | null;
}

// ---------- Custody and responsibility ----------

/** Who held the trailer between two timeline events. */
export interface CustodyLeg {
  custodian: Custodian;
  /** Null for the leg before the first event. */
  fromEventId: string | null;
  from: Date | null;
  /** Null for the current, still open leg. */
  toEventId: string | null;
  to: Date | null;
  /**
   * True when the event that opens the leg and the event that closes it name different
   * custodians (e.g. hooked by one carrier, dropped by another): custody changed hands without
   * a Hitchmark handoff, and both parties get a leg over the same interval.
   */
  isUnrecordedChange: boolean;
}

export type AttributionStatus = 'single' | 'several' | 'none';
export type Confidence = 'high' | 'medium';

/** Responsibility for one new or worse item, or a first record of damage (status `none`). */
export interface Attribution {
  itemKey: string;
  finding: 'new' | 'worse' | 'first_record';
  status: AttributionStatus;
  /** The single responsible custodian; null for `several` and `none`. */
  responsible: Custodian | null;
  /** Every distinct custodian between the two inspections (empty for `none`). */
  candidates: Custodian[];
  confidence: Confidence | null;
  legs: CustodyLeg[];
  previousEventId: string | null;
  currentEventId: string;
  /** A sentence a clerk can read to a carrier. */
  reason: string;
}

// ---------- Fuel ----------

export interface FuelAssessment {
  eighths: number;
  gallons: number;
  litres: number;
  tankGallons: number;
  /** Required eighths for this event type (drop or hook); null for walks. */
  requiredEighths: number | null;
  shortfallEighths: number;
  shortfallGallons: number;
  isShort: boolean;
  previousEventId: string | null;
  /** Gallons lost since the previous fuel reading (0 when the level rose). */
  dropGallons: number | null;
  engineHoursRun: number | null;
  expectedBurnGallons: number | null;
  /** Drop beyond expected burn; positive means more fuel gone than the unit could burn. */
  unexplainedGallons: number | null;
  isPossibleLeakOrTheft: boolean;
}

// ---------- Holds ----------

export type HoldSeverity = 'out_of_service' | 'restricted';
/** What a restricted trailer may not do. `yard_only`: yard moves only, no trip until fixed. */
export type Restriction = 'no_perishable' | 'yard_only';

export interface Hold {
  ruleKey: string;
  itemKey: string | null;
  reason: string;
  severity: HoldSeverity;
  restriction: Restriction | null;
  /** Where the rule comes from: a regulation, or `common practice`, or `terminal policy`. */
  source: string;
  /** Safety caution shown with the hold (always set for out-of-service holds). */
  caution: string | null;
}

// ---------- Policy ----------

/** A terminal's rules as data. See `defaultPolicy` and `defaultPolicySources`. */
export interface EnginePolicy {
  requiredFuelEighthsAtDrop: number;
  requiredFuelEighthsAtHook: number;
  reeferBurnGallonsPerHour: number;
  /** Allowed fuel drop beyond expected burn before flagging a possible leak or theft. */
  fuelDropToleranceGallons: number;
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
