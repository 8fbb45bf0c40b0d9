import { tz } from '@date-fns/tz';
import { format } from 'date-fns';

/** "3 Nov 2026 14:05" in the caller's IANA time zone. */
export function formatWhen(at: Date, timeZone: string): string {
  return format(at, 'd MMM yyyy HH:mm', { in: tz(timeZone) });
}
