/** What the engine returns: findings, custody legs, attributions, fuel, holds. */
import type { Condition, ZoneKey } from './checklist';
import type { Reason } from './codes';
import type { Custodian, InspectionKind } from './timeline';

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
  /** `full` for a drop or hook, `quick` for a yard walk; null when there was no earlier inspection. */
  previousInspection: InspectionKind | null;
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
  /** Why, as a code with parameters (put into words in the reader's language by lib/i18n/reasons.ts). */
  reason: Reason<'attribution.none' | 'attribution.single' | 'attribution.several'>;
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
  /** Gallons the policy tolerates beyond expected burn: its eighths of this tank. */
  toleranceGallons: number;
  isPossibleLeakOrTheft: boolean;
}

// ---------- Holds ----------

export type HoldSeverity = 'out_of_service' | 'restricted';
/** What a restricted trailer may not do. `yard_only`: yard moves only, no trip until fixed. */
export type Restriction = 'no_perishable' | 'yard_only';

export interface Hold {
  ruleKey: string;
  itemKey: string | null;
  /** Why the hold is placed, as a code with parameters. */
  reason: Reason;
  severity: HoldSeverity;
  restriction: Restriction | null;
  /** Where the rule comes from: a regulation, or `common practice`, or `terminal policy`. */
  source: string;
  /** Safety caution shown with the hold, as a code (always set for out-of-service holds). */
  caution: Reason | null;
}
