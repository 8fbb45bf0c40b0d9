// Hitchmark's words for scan outcomes, shared by the scan link page, the lookup API and the scanner.
import { formatTime } from '@/lib/format/time';

export const NOT_OUR_LABEL = 'This label is not a Hitchmark label or it is damaged.';

/**
 * "This label was replaced on Dec 2, 2026; use the new label." The date is read in the terminal's
 * zone and written in the reader's locale, so a screen that says the sentence in Spanish (by its
 * `Refusals` template) shows a Spanish date in it.
 */
export function replacedMessage(replacedAt: Date | null, timeZone = 'UTC', locale = 'en-US'): string {
  return replacedAt
    ? `This label was replaced on ${formatTime(replacedAt, timeZone, 'date', locale)}; use the new label.`
    : 'This label was replaced; use the new label.';
}
