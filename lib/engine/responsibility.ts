import { eventRef, partyRef, reason } from './codes';
import { custodianKey, legsAlong } from './custody';
import type {
  Attribution,
  Custodian,
  CustodyLeg,
  InspectionEvent,
  ItemFinding,
  TimelineEvent,
} from './types';

export interface AttributeInput {
  /** The same history passed to `compareInspection`, oldest first. */
  history: readonly TimelineEvent[];
  current: InspectionEvent;
  findings: readonly ItemFinding[];
  /** How reasons name the terminal; by default the reader's words for "the terminal". */
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
  const { history, current, findings } = input;
  const terminal = input.terminalName ?? null;
  const cache = new Map<number, Interval>();
  const out: Attribution[] = [];
  const now = eventRef(current);

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
        reason: reason('attribution.none', { item: f.itemKey, label: f.label, current: f.current, now }),
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
    const head = {
      item: f.itemKey,
      label: f.label,
      previous: f.previous,
      current: f.current,
      before: eventRef(before),
      now,
    };
    const parties = interval.candidates.map((c) => partyRef(c, terminal));

    if (interval.candidates.length === 1) {
      const quick = f.previousInspection === 'quick' || current.type === 'walk';
      out.push({
        ...base,
        status: 'single',
        responsible: interval.candidates[0],
        candidates: interval.candidates,
        confidence: quick ? 'medium' : 'high',
        legs: interval.legs,
        previousEventId: before.id,
        reason: reason('attribution.single', {
          ...head,
          holder: parties[0],
          atHook: current.type === 'hook',
          quick,
        }),
      });
      continue;
    }
    out.push({
      ...base,
      status: 'several',
      responsible: null,
      candidates: interval.candidates,
      confidence: null,
      legs: interval.legs,
      previousEventId: before.id,
      reason: reason('attribution.several', {
        ...head,
        holders: parties,
        unrecorded: interval.legs.some((l) => l.isUnrecordedChange),
      }),
    });
  }
  return out;
}
