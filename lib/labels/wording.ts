// Hitchmark's words for scan outcomes, shared by the scan link page, the lookup API and the scanner.
import { TZDate } from '@date-fns/tz';
import { format } from 'date-fns';

export const NOT_OUR_LABEL = 'This label is not a Hitchmark label or it is damaged.';

/** "This label was replaced on 2 Dec 2026; use the new label." The date is read in the terminal's zone. */
export function replacedMessage(replacedAt: Date | null, timeZone = 'UTC'): string {
  return replacedAt
    ? `This label was replaced on ${format(new TZDate(replacedAt, timeZone), 'd MMM yyyy')}; use the new label.`
    : 'This label was replaced; use the new label.';
}
