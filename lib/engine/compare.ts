import { inspectableItems } from './observations';
import { isInspected, severityOf } from './conditions';
import type {
  Checklist,
  Condition,
  FindingKind,
  InspectionEvent,
  InspectionKind,
  ItemFinding,
  TimelineEvent,
} from './types';

/**
 * Classifies one item: `current` against the condition at the latest earlier inspection of it
 * (`previous`, null when there was none). `not_checked` is never read as `ok`.
 * `new` = was ok, now worse; `worse` = was already minor or damaged, now more severe;
 * `repaired` = less severe than before.
 */
export function classifyChange(current: Condition, previous: Condition | null): FindingKind {
  if (current === 'not_checked') return 'not_checked';
  if (previous === null || previous === 'not_checked') return 'first_record';
  const diff = (severityOf(current) as number) - (severityOf(previous) as number);
  if (diff === 0) return 'unchanged';
  if (diff < 0) return 'repaired';
  return previous === 'ok' ? 'new' : 'worse';
}

/** A drop or hook is a full inspection; a yard walk's checks are quick. */
export function inspectionKindOf(event: InspectionEvent): InspectionKind {
  return event.type === 'walk' ? 'quick' : 'full';
}

function hasItems(e: TimelineEvent): e is InspectionEvent {
  return e.type !== 'move';
}

export interface CompareInput {
  checklist: Checklist;
  /** Earlier events of this trailer, oldest first; `current` is not included. */
  history: readonly TimelineEvent[];
  current: InspectionEvent;
}

/**
 * Compares an inspection with the trailer's history, item by item: for every checklist item
 * (readings excepted) the latest earlier drop, hook or walk that inspected it, and a finding.
 * One backward pass over the history, stopping once every item is placed: O(history × items)
 * in the worst case, usually a few events.
 */
export function compareInspection({ checklist, history, current }: CompareInput): ItemFinding[] {
  const items = inspectableItems(checklist);
  const prevIndex: Array<number | null> = new Array(items.length).fill(null);
  // Items still looking for an earlier inspection; shrinks as the scan goes back.
  const pending = items.map((_, i) => i);

  for (let h = history.length - 1; h >= 0 && pending.length > 0; h--) {
    const event = history[h];
    if (!hasItems(event)) continue;
    const observed = event.items;
    let kept = 0;
    for (let p = 0; p < pending.length; p++) {
      const i = pending[p];
      const o = observed[items[i].key];
      if (o !== undefined && isInspected(o.condition)) prevIndex[i] = h;
      else pending[kept++] = i;
    }
    pending.length = kept;
  }

  return items.map((item, i): ItemFinding => {
    const cur = current.items[item.key]?.condition ?? 'not_checked';
    const h = prevIndex[i];
    const prevEvent = h === null ? null : (history[h] as InspectionEvent);
    const prev = prevEvent ? prevEvent.items[item.key].condition : null;
    return {
      itemKey: item.key,
      label: item.label,
      zone: item.zone,
      finding: classifyChange(cur, prev),
      current: cur,
      previous: prev,
      previousEventId: prevEvent?.id ?? null,
      previousAt: prevEvent?.at ?? null,
      previousInspection: prevEvent ? inspectionKindOf(prevEvent) : null,
      previousIndex: h,
    };
  });
}

/** Findings that may open a case: new or worse damage. */
export function damageFindings(findings: readonly ItemFinding[]): ItemFinding[] {
  return findings.filter((f) => f.finding === 'new' || f.finding === 'worse');
}
