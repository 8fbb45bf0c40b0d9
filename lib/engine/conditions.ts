import type { Condition } from './types';

/** All conditions, in severity order, then `not_checked` (which has no severity). */
export const CONDITIONS = [
  'ok',
  'minor',
  'damaged',
  'unsafe',
  'missing',
  'not_checked',
] as const satisfies readonly Condition[];

const SEVERITY: Record<Exclude<Condition, 'not_checked'>, number> = {
  ok: 0,
  minor: 1,
  damaged: 2,
  unsafe: 3,
  missing: 4,
};

export const CONDITION_LABELS: Record<Condition, string> = {
  ok: 'ok',
  minor: 'minor (cosmetic, acceptable)',
  damaged: 'damaged (needs repair)',
  unsafe: 'unsafe (out of service)',
  missing: 'missing',
  not_checked: 'not checked',
};

/** True for every condition except `not_checked`: the item was actually looked at. */
export function isInspected(condition: Condition): boolean {
  return condition !== 'not_checked';
}

/** Severity rank: ok 0 < minor 1 < damaged 2 < unsafe 3 < missing 4; null for `not_checked`. */
export function severityOf(condition: Condition): number | null {
  return condition === 'not_checked' ? null : SEVERITY[condition];
}

/** Negative when `a` is less severe than `b`. Throws when either is `not_checked`. */
export function compareSeverity(a: Condition, b: Condition): number {
  const sa = severityOf(a);
  const sb = severityOf(b);
  if (sa === null || sb === null) throw new RangeError('not_checked has no severity');
  return sa - sb;
}

/** The most severe inspected condition in the list; `not_checked` when none was inspected. */
export function worstCondition(conditions: Iterable<Condition>): Condition {
  let worst: Condition = 'not_checked';
  for (const c of conditions) {
    if (c === 'not_checked') continue;
    if (worst === 'not_checked' || SEVERITY[c] > SEVERITY[worst]) worst = c;
  }
  return worst;
}

/** Type guard for values arriving from forms or JSON. */
export function isCondition(value: unknown): value is Condition {
  return typeof value === 'string' && (CONDITIONS as readonly string[]).includes(value);
}
