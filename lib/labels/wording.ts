// Hitchmark's words for scan outcomes, shared by the scan link page, the lookup API and the scanner.
import { formatTime } from '@/lib/format/time';

export const NOT_OUR_LABEL = 'This label is not a Hitchmark label or it is damaged.';

/** "This label was replaced on Dec 2, 2026; use the new label." The date is read in the terminal's zone. */
export function replacedMessage(replacedAt: Date | null, timeZone = 'UTC'): string {
  return replacedAt
    ? `This label was replaced on ${formatTime(replacedAt, timeZone, 'date')}; use the new label.`
    : 'This label was replaced; use the new label.';
}
