import { tz } from '@date-fns/tz';
import { format } from 'date-fns';
import type { Condition, InspectionEvent } from './types';

/** "3 Nov 2026 14:05" in the caller's IANA time zone. */
export function formatWhen(at: Date, timeZone: string): string {
  return format(at, 'd MMM yyyy HH:mm', { in: tz(timeZone) });
}

const CONDITION_WORDS: Record<Condition, string> = {
  ok: 'ok',
  minor: 'with minor marks',
  damaged: 'damaged',
  unsafe: 'unsafe',
  missing: 'missing',
  not_checked: 'not checked',
};

export function conditionWords(c: Condition): string {
  return CONDITION_WORDS[c];
}

/**
 * "the drop on 3 Nov 2026 14:05 by driver D. Example (Carrier X)"; a correction standing in for
 * it adds ", as corrected on 3 Nov 2026 14:20", so a reason names the record it used.
 */
export function describeEvent(e: InspectionEvent, timeZone: string): string {
  const when = formatWhen(e.at, timeZone);
  if (e.type === 'walk') {
    const by = e.jockeyName ? ` by yard jockey ${e.jockeyName}` : '';
    return `the yard walk on ${when}${by} (quick check)`;
  }
  const by = e.party.driverName
    ? ` by driver ${e.party.driverName} (${e.party.carrierName})`
    : ` by ${e.party.carrierName}`;
  const corrected = e.correctedAt ? `, as corrected on ${formatWhen(e.correctedAt, timeZone)}` : '';
  return `the ${e.type} on ${when}${by}${corrected}`;
}

/** "A", "A and B", "A, B and C". */
export function listWords(names: readonly string[]): string {
  if (names.length <= 1) return names.join('');
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
}
