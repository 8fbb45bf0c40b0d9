import { custodianKey, custodianName, legsAlong } from './custody';
import type {
  Attribution,
  Custodian,
  CustodyLeg,
  InspectionEvent,
  ItemFinding,
  TimelineEvent,
} from './types';
import { conditionWords, describeEvent, listWords } from './wording';

export interface AttributeInput {
  /** The same history passed to `compareInspection`, oldest first. */
  history: readonly TimelineEvent[];
  current: InspectionEvent;
  findings: readonly ItemFinding[];
  /** IANA zone for dates in reasons, e.g. `America/Chicago`. */
  timeZone: string;
  /** How reasons name the terminal; default "the terminal". */
  terminalName?: string;
}

interface Interval {
  legs: CustodyLeg[];
  candidates: Custodian[];
}

function intervalFrom(k: number, history: readonly TimelineEvent[], current: InspectionEvent): Interval {
  const span = history.slice(k);
  span.push(current);
  const legs = legsAlong(span);
  const seen = new Map<string, Custodian>();
  for (const l of legs)
    if (!seen.has(custodianKey(l.custodian))) seen.set(custodianKey(l.custodian), l.custodian);
  return { legs, candidates: [...seen.values()] };
}

/**
 * Responsibility for each `new` or `worse` finding, and `none` for damage seen for the first
 * time. The custody legs between the latest earlier inspection and this one decide: one
 * custodian → that party (confidence high when both inspections were full handoffs, medium when
 * either was a yard-walk quick check); several → no single party, candidates listed.
 * Damage recorded at a hook falls in the leg that ends at the hook, the terminal's, so the
 * hooking driver's pickup report protects them.
 */
export function attributeFindings(input: AttributeInput): Attribution[] {
  const { history, current, findings, timeZone } = input;
  const terminal = input.terminalName ?? 'the terminal';
  const cache = new Map<number, Interval>();
  const out: Attribution[] = [];
  const now = describeEvent(current, timeZone);

  for (const f of findings) {
    const isDamage =
      f.finding === 'new' || f.finding === 'worse' || (f.finding === 'first_record' && f.current !== 'ok');
    if (!isDamage) continue;
    const base = {
      itemKey: f.itemKey,
      finding: f.finding as Attribution['finding'],
      currentEventId: current.id,
    };
    if (f.previousIndex === null || f.previous === null) {
      out.push({
        ...base,
        status: 'none',
        responsible: null,
        candidates: [],
        confidence: null,
        legs: [],
        previousEventId: null,
        reason:
          `${f.label}: found ${conditionWords(f.current)} at ${now}; no earlier inspection of this item ` +
          'is on record, so it cannot be attributed to anyone.',
      });
      continue;
    }
    const k = f.previousIndex;
    let interval = cache.get(k);
    if (!interval) {
      interval = intervalFrom(k, history, current);
      cache.set(k, interval);
    }
    const before = history[k] as InspectionEvent;
    const head =
      `${f.label}: inspected ${conditionWords(f.previous)} at ${describeEvent(before, timeZone)}; ` +
      `found ${conditionWords(f.current)} at ${now}; `;
    const names = interval.candidates.map((c) => custodianName(c, terminal));

    if (interval.candidates.length === 1) {
      const quick = f.previousInspection === 'quick' || current.type === 'walk';
      let reason = `${head}only ${names[0]} held the trailer between.`;
      if (current.type === 'hook') {
        reason += " A hook is the driver's pickup report, so this is not charged to the hooking driver.";
      }
      if (quick)
        reason += ' One of the two inspections was a quick yard-walk check, so confidence is medium.';
      out.push({
        ...base,
        status: 'single',
        responsible: interval.candidates[0],
        candidates: interval.candidates,
        confidence: quick ? 'medium' : 'high',
        legs: interval.legs,
        previousEventId: before.id,
        reason,
      });
      continue;
    }
    const gap = interval.legs.some((l) => l.isUnrecordedChange)
      ? ' Custody changed hands at least once without a Hitchmark handoff.'
      : '';
    out.push({
      ...base,
      status: 'several',
      responsible: null,
      candidates: interval.candidates,
      confidence: null,
      legs: interval.legs,
      previousEventId: before.id,
      reason:
        `${head}${listWords(names)} held the trailer between, so no single party is responsible; ` +
        `the clerk decides.${gap}`,
    });
  }
  return out;
}
