import type { Checklist, ChecklistItem, ItemKind, ItemObservation, ItemObservations } from './types';

/** Safety items of a checklist (readings excepted): each needs an answer in every handoff. */
export function safetyItems(checklist: Pick<Checklist, 'zones'>): ChecklistItem[] {
  return checklist.zones.flatMap((z) => z.items).filter((i) => i.isSafety && i.kind !== 'reading');
}

export type SafetyGroupKey = 'tandem_pins' | 'spare' | 'tires' | 'fuel_leak' | 'rear_doors' | 'landing_gear';

/**
 * Safety items answered together by one explicit statement of the driver ("all four pins out
 * and locked: I looked at each"); any item can then be changed one by one (an exception).
 */
export interface SafetyGroup {
  key: SafetyGroupKey;
  label: string;
  /** What the driver states by tapping the group answer. */
  statement: string;
  itemKeys: string[];
  /** True when the statement needs the shallowest tread seen (tires). */
  asksTread: boolean;
}

const GROUP_OF: Array<[SafetyGroupKey, (i: ChecklistItem) => boolean]> = [
  ['tandem_pins', (i) => i.kind === 'pin'],
  ['spare', (i) => i.kind === 'spare'],
  ['tires', (i) => i.kind === 'tire'],
  ['fuel_leak', (i) => i.kind === 'leak'],
  ['rear_doors', (i) => i.kind === 'hinge' || i.key.endsWith('.lock_rods')],
  ['landing_gear', (i) => i.key.startsWith('undercarriage.landing_gear.')],
];

const WORDS = [
  'no',
  'one',
  'two',
  'three',
  'four',
  'five',
  'six',
  'seven',
  'eight',
  'nine',
  'ten',
  'eleven',
  'twelve',
];
const count = (n: number) => WORDS[n] ?? String(n);

function describe(key: SafetyGroupKey, n: number): { label: string; statement: string } {
  switch (key) {
    case 'tandem_pins':
      return {
        label: 'Tandem locking pins',
        statement: `All ${count(n)} tandem pins out and locked: I looked at each`,
      };
    case 'spare':
      return {
        label: 'Spare tire',
        statement: 'Spare present, on its wheel and holding air: I looked at it',
      };
    case 'tires':
      return {
        label: 'Tires and wheels',
        statement: `All ${count(n)} tires hold air and have at least the tread I give: I looked at each`,
      };
    case 'fuel_leak':
      return { label: 'Fuel tank', statement: 'No fuel leaking at the tank: I looked' };
    case 'rear_doors':
      return {
        label: 'Rear door hinges and locks',
        statement: `All ${count(n - 2)} door hinges lock and both doors' lock rods work: I looked at each`,
      };
    case 'landing_gear':
      return {
        label: 'Landing gear',
        statement: 'Both landing gear legs and the cross shaft are sound: I looked at each',
      };
  }
}

/** The safety groups of this checklist, in walk-around order of their first item. */
export function safetyGroups(checklist: Pick<Checklist, 'zones'>): SafetyGroup[] {
  const items = safetyItems(checklist);
  const out: SafetyGroup[] = [];
  for (const [key, test] of GROUP_OF) {
    const keys = items.filter(test).map((i) => i.key);
    if (!keys.length) continue;
    out.push({ key, ...describe(key, keys.length), itemKeys: keys, asksTread: key === 'tires' });
  }
  const order = new Map(checklist.zones.flatMap((z) => z.items).map((i, n) => [i.key, n]));
  return out.sort((a, b) => order.get(a.itemKeys[0])! - order.get(b.itemKeys[0])!);
}

/** The observation a group's statement records for one of its items (ok and the kind's safe answers). */
export function statedObservation(kind: ItemKind, treadThirtySeconds?: number): ItemObservation {
  switch (kind) {
    case 'pin':
      return { condition: 'ok', isEngaged: true };
    case 'spare':
      return { condition: 'ok', isMounted: true, isHoldingAir: true };
    case 'tire':
      if (treadThirtySeconds === undefined) throw new RangeError('a tire statement needs the tread depth');
      return { condition: 'ok', treadThirtySeconds, isHoldingAir: true };
    case 'leak':
      return { condition: 'ok', isLeaking: false };
    case 'hinge':
      return { condition: 'ok', isLocking: true };
    default:
      return { condition: 'ok' };
  }
}

/** Observations for every item of `group` as its statement says (tires: `treadThirtySeconds` each). */
export function answerGroup(
  checklist: Checklist,
  group: SafetyGroup,
  treadThirtySeconds?: number,
): ItemObservations {
  const byKey = new Map(checklist.items.map((i) => [i.key, i]));
  const out: ItemObservations = {};
  for (const key of group.itemKeys) out[key] = statedObservation(byKey.get(key)!.kind, treadThirtySeconds);
  return out;
}

const REQUIRED: Partial<Record<ItemKind, Array<keyof ItemObservation>>> = {
  pin: ['isEngaged'],
  spare: ['isMounted', 'isHoldingAir'],
  tire: ['treadThirtySeconds', 'isHoldingAir'],
  leak: ['isLeaking'],
  hinge: ['isLocking'],
};

/** One safety answer missing from a handoff, keyed as the form's field (`items.<key>` or `reefer.isUnitOn`). */
export interface SafetyGap {
  field: string;
  itemKey: string;
  message: string;
}

export interface SafetyAnswers {
  items: ItemObservations;
  isLoaded: boolean;
  /** The reefer's "unit running" reading; null when not answered. */
  isUnitOn: boolean | null | undefined;
}

/**
 * Safety items this handoff did not answer. An item is answered when it has a condition and,
 * unless missing, every field its kind asks (pin engaged, spare mounted and holding air, tread
 * and air, leaking, hinge locking). A loaded reefer needs the "unit running" answer.
 */
export function safetyGaps(checklist: Checklist, answers: SafetyAnswers): SafetyGap[] {
  const gaps: SafetyGap[] = [];
  for (const item of safetyItems(checklist)) {
    const o = answers.items[item.key];
    if (!o || o.condition === 'not_checked') {
      gaps.push({
        field: `items.${item.key}`,
        itemKey: item.key,
        message: `${item.label} is a safety item: look at it and answer it in this handoff.`,
      });
      continue;
    }
    if (o.condition === 'missing') continue;
    const lacking = (REQUIRED[item.kind] ?? []).filter((f) => o[f] === undefined);
    if (lacking.length) {
      gaps.push({
        field: `items.${item.key}`,
        itemKey: item.key,
        message: `${item.label} is a safety item: answer every question about it.`,
      });
    }
  }
  const unit = checklist.items.find((i) => i.key === 'readings.unit_on');
  if (unit && answers.isLoaded && typeof answers.isUnitOn !== 'boolean') {
    gaps.push({
      field: 'reefer.isUnitOn',
      itemKey: unit.key,
      message: 'The trailer is loaded: say whether the reefer unit is running.',
    });
  }
  return gaps;
}
