/**
 * What the engine says, as a code with parameters instead of a sentence: stored as is and put
 * into words in the reader's language by lib/i18n/reasons.ts. Parameters are plain JSON (names,
 * ids, ISO dates, numbers, item keys), so a stored reason renders the same way years later.
 */
import type { Condition } from './checklist';

export type JsonValue = string | number | boolean | null | JsonValue[] | { [key: string]: JsonValue };
export type ReasonParams = { [key: string]: JsonValue };

/** An inspection named in a reason: its type, time (ISO) and who made it. */
export type EventRef = {
  type: 'drop' | 'hook' | 'walk';
  at: string;
  driverName: string | null;
  carrierName: string | null;
  jockeyName: string | null;
  /** Set when a correction stands in for the record: when it was recorded (ISO). */
  correctedAt: string | null;
};

/** A party named in a reason: a carrier by name, or the terminal (by name when the caller gave one). */
export type PartyRef = { type: 'terminal'; name: string | null } | { type: 'carrier'; name: string };

/** The item a reason is about: its stable key, and its English label as recorded. */
type ItemRef = { item: string; label: string };

/** Every code the engine and the handoff rules produce, with the parameters each needs. */
export type ReasonCodes = {
  'attribution.none': ItemRef & { current: Condition; now: EventRef };
  'attribution.single': ItemRef & {
    previous: Condition;
    current: Condition;
    before: EventRef;
    now: EventRef;
    holder: PartyRef;
    atHook: boolean;
    quick: boolean;
  };
  'attribution.several': ItemRef & {
    previous: Condition;
    current: Condition;
    before: EventRef;
    now: EventRef;
    holders: PartyRef[];
    unrecorded: boolean;
  };
  'finding.repaired': ItemRef & { previous: Condition | null; current: Condition };
  'finding.other': ItemRef & { kind: string };
  'finding.fuel_short': {
    eighths: number;
    gallons: number;
    tankGallons: number;
    requiredEighths: number;
    eventType: 'drop' | 'hook';
    shortfallEighths: number;
    shortfallGallons: number;
  };
  'finding.fuel_unexplained_drop': { dropGallons: number; engineHours: number; expectedBurnGallons: number };
  'hold.pin_not_engaged': ItemRef;
  'hold.spare_unusable': ItemRef & { problem: 'missing' | 'off_wheel' | 'flat' };
  'hold.tire_tread_low': ItemRef & { tread: number; min: number };
  'hold.tire_not_holding_air': ItemRef;
  'hold.insulation_showing': ItemRef;
  'hold.hinge_not_locking': ItemRef;
  'hold.fuel_leak': ItemRef;
  'hold.item_unsafe': ItemRef;
  'hold.pre_trip_missing': Record<string, never>;
  'hold.pre_trip_failed': Record<string, never>;
  'hold.pre_trip_stale': { ageHours: number; maxHours: number };
  /** A hold found by a hook the gate refused: the hold's own reason, marked so. */
  'hold.at_refused_hook': { reason: { code: string; params: ReasonParams } };
  'caution.out_of_service': Record<string, never>;
  'caution.yard_only': Record<string, never>;
  'caution.no_perishable': Record<string, never>;
  'caution.under_trailer': Record<string, never>;
  'case.not_attributed': Record<string, never>;
  /** A row stored before codes existed whose English could not be mapped: shown as stored. */
  legacy_text: { text: string };
};

export type ReasonCode = keyof ReasonCodes;

/** A code with its parameters; `Reason<'hold.fuel_leak'>` narrows the parameters to that code's. */
export type Reason<C extends ReasonCode = ReasonCode> = {
  [K in C]: { code: K; params: ReasonCodes[K] };
}[C];
