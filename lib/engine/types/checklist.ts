/** Trailer shape, checklist, conditions and observations. */

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
  'condition' | 'skin' | 'hinge' | 'pin' | 'spare' | 'tire' | 'leak' | 'cleanliness' | 'reading';

export type ZoneKey =
  | 'nose'
  | 'reefer_unit'
  | 'left_side'
  | 'right_side'
  | 'undercarriage'
  | 'tires'
  | 'rear'
  | 'interior'
  | 'readings';

/** Which event field a `reading` item fills. */
export type ReadingField =
  'fuelEighths' | 'isUnitOn' | 'setpointF' | 'returnAirF' | 'engineHours' | 'preTrip';

export interface ChecklistItem {
  /** Stable key, e.g. `rear.door_left.hinge_3`; never renamed, so old records still compare. */
  key: string;
  label: string;
  zone: ZoneKey;
  kind: ItemKind;
  /** Only for `kind: 'reading'`. */
  reading?: ReadingField;
  /**
   * A safety item: it must be looked at and answered in every handoff, never copied from the
   * last record ("Same as last" skips it). See `lib/engine/safety.ts`.
   */
  isSafety?: true;
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
