// What the engine says about one handoff, shaped for storage: finding rows, holds, and whether
// a case opens. Pure: the submit service loads the inputs and writes the output.
import {
  assessFuel,
  attributeFindings,
  compareInspection,
  damageFindings,
  evaluateHolds,
  reason,
  type Attribution,
  type Checklist,
  type EnginePolicy,
  type FuelAssessment,
  type HandoffEvent,
  type Hold,
  type ItemFinding,
  type Reason,
  type TimelineEvent,
} from '@/lib/engine';
import { englishReason } from '@/lib/i18n/reasons';
import { isChargeableDamage, isUnattributedDamage, NOT_ATTRIBUTED_NOTE } from './damage';

export type FindingRow = {
  itemKey: string;
  kind: string;
  condition: ItemFinding['current'] | null;
  previousCondition: ItemFinding['previous'];
  previousEventId: string | null;
  responsibleCarrierId: string | null;
  responsibleParty: string | null;
  confidence: 'high' | 'medium' | 'none' | null;
  candidates: unknown[] | null;
  /** Why, as a code with parameters: stored, and rendered in each reader's language. */
  coded: Reason;
  /** The English words of `coded`, receipted with the row at the time. */
  reason: string;
  isDamage: boolean;
};

export type Evaluation = {
  compared: ItemFinding[];
  attributions: Attribution[];
  fuel: FuelAssessment | null;
  holds: Hold[];
  rows: FindingRow[];
  /** Item keys with new or worse damage: each needs a photo and a note, and together they open one case. */
  damageKeys: string[];
  /** Item keys with damage no earlier inspection saw: they open a case too, marked not attributed. */
  unattributedKeys: string[];
  /** The carrier to propose on the case: set only when every damage attribution names the same single carrier. */
  proposedCarrierId: string | null;
  /** `NOT_ATTRIBUTED_NOTE` when the case holds damage with no earlier inspection, else null. */
  attributionNote: string | null;
  /** The attribution note as a code (`case.not_attributed`), else null. */
  attributionNoteCoded: Reason | null;
};

const gal = (n: number) => Math.round(n * 10) / 10;

function attributionRow(
  f: ItemFinding,
  a: Attribution | undefined,
  terminalName: string,
  timeZone: string,
): FindingRow {
  const responsible = a?.responsible ?? null;
  const coded: Reason =
    a?.reason ??
    (f.finding === 'repaired'
      ? reason('finding.repaired', {
          item: f.itemKey,
          label: f.label,
          previous: f.previous,
          current: f.current,
        })
      : reason('finding.other', { item: f.itemKey, label: f.label, kind: f.finding }));
  return {
    itemKey: f.itemKey,
    kind: f.finding,
    condition: f.current,
    previousCondition: f.previous,
    previousEventId: f.previousEventId,
    responsibleCarrierId: responsible?.type === 'carrier' ? responsible.carrierId : null,
    responsibleParty: responsible
      ? responsible.type === 'carrier'
        ? responsible.carrierName
        : terminalName
      : null,
    confidence: a ? (a.confidence ?? 'none') : null,
    candidates: a ? a.candidates : null,
    coded,
    reason: englishReason(coded, timeZone),
    isDamage: isChargeableDamage(f.finding, f.current) || isUnattributedDamage(f.finding, f.current),
  };
}

function ruleRow(itemKey: string, kind: string, coded: Reason, timeZone: string): FindingRow {
  return {
    itemKey,
    kind,
    condition: null,
    previousCondition: null,
    previousEventId: null,
    responsibleCarrierId: null,
    responsibleParty: null,
    confidence: null,
    candidates: null,
    coded,
    reason: englishReason(coded, timeZone),
    isDamage: false,
  };
}

/** Runs compare, attribution, fuel and hold rules on `current` against `history` (oldest first, without current). */
export function evaluateHandoff(input: {
  checklist: Checklist;
  history: readonly TimelineEvent[];
  current: HandoffEvent;
  policy: EnginePolicy;
  now: Date;
  timeZone: string;
  terminalName: string;
}): Evaluation {
  const { checklist, history, current, policy, now, timeZone, terminalName } = input;
  const compared = compareInspection({ checklist, history, current });
  const attributions = attributeFindings({ history, current, findings: compared, terminalName });
  const byKey = new Map(attributions.map((a) => [a.itemKey, a]));
  const fuel =
    checklist.spec.kind === 'reefer'
      ? assessFuel({ trailer: checklist.spec, history, current, policy })
      : null;
  const holds = evaluateHolds({ checklist, event: current, now, policy });

  const rows: FindingRow[] = [];
  for (const f of compared) {
    const isFirstDamage = f.finding === 'first_record' && f.current !== 'ok';
    if (f.finding === 'new' || f.finding === 'worse' || f.finding === 'repaired' || isFirstDamage) {
      rows.push(attributionRow(f, byKey.get(f.itemKey), terminalName, timeZone));
    }
  }
  if (fuel?.isShort) {
    rows.push(
      ruleRow(
        'readings.fuel',
        'fuel_short',
        reason('finding.fuel_short', {
          eighths: fuel.eighths,
          gallons: gal(fuel.gallons),
          tankGallons: fuel.tankGallons,
          requiredEighths: fuel.requiredEighths ?? 8,
          eventType: current.type,
          shortfallEighths: fuel.shortfallEighths,
          shortfallGallons: gal(fuel.shortfallGallons),
        }),
        timeZone,
      ),
    );
  }
  if (fuel?.isPossibleLeakOrTheft) {
    rows.push(
      ruleRow(
        'readings.fuel',
        'fuel_unexplained_drop',
        reason('finding.fuel_unexplained_drop', {
          dropGallons: gal(fuel.dropGallons ?? 0),
          engineHours: fuel.engineHoursRun ?? 0,
          expectedBurnGallons: gal(fuel.expectedBurnGallons ?? 0),
        }),
        timeZone,
      ),
    );
  }
  for (const h of holds) {
    if (h.ruleKey === 'pin_not_engaged' || h.ruleKey === 'spare_unusable')
      rows.push(ruleRow(h.itemKey ?? '', h.ruleKey, h.reason, timeZone));
  }

  const damage = damageFindings(compared).filter((f) => isChargeableDamage(f.finding, f.current));
  const damageKeys = damage.map((f) => f.itemKey);
  const parties = new Set(
    damage.map((f) => {
      const r = byKey.get(f.itemKey)?.responsible;
      return r?.type === 'carrier' && byKey.get(f.itemKey)?.status === 'single' ? r.carrierId : '';
    }),
  );
  const unattributedKeys = compared
    .filter((f) => isUnattributedDamage(f.finding, f.current))
    .map((f) => f.itemKey);
  const [only] = [...parties];
  // damage nobody can be charged for leaves the case with no single carrier to propose
  const proposedCarrierId = parties.size === 1 && only && !unattributedKeys.length ? only : null;
  const attributionNote = unattributedKeys.length ? NOT_ATTRIBUTED_NOTE : null;
  const attributionNoteCoded = unattributedKeys.length ? reason('case.not_attributed', {}) : null;
  return {
    compared,
    attributions,
    fuel,
    holds,
    rows,
    damageKeys,
    unattributedKeys,
    proposedCarrierId,
    attributionNote,
    attributionNoteCoded,
  };
}
