// Every time a person reads is shown in the terminal's IANA zone, through these functions only
// (the lint rule in eslint.config.mjs refuses other ways of writing a date in app/, lib/ and db/).
import { TZDate } from '@date-fns/tz';

export type TimeStyle = 'date' | 'time' | 'dateTime';

// the day and the minute as every screen, e-mail and PDF writes them; the styles add the zone name
const DAY = { day: 'numeric', month: 'short', year: 'numeric' } as const;
const MINUTE = { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' } as const;

const OPTIONS: Record<TimeStyle, Intl.DateTimeFormatOptions> = {
  date: DAY,
  time: { ...MINUTE, timeZoneName: 'short' },
  dateTime: { ...DAY, ...MINUTE, timeZoneName: 'short' },
};

const cache = new Map<string, Intl.DateTimeFormat>();

/**
 * `at` in `timeZone`, in the reader's `locale` (next-intl's `getLocale()` / `useLocale()`):
 * `Mar 12, 2026, 14:05 CDT` in English, `12 mar 2026, 14:05 GMT-5` in Spanish. Intl carries the
 * month names, so no date-fns locale ships to the phone pages. English is for callers with no reader.
 */
export function formatTime(
  at: Date | string | number,
  timeZone: string,
  style: TimeStyle = 'dateTime',
  locale = 'en-US',
): string {
  const key = `${locale}|${timeZone}|${style}`;
  let f = cache.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(locale, { ...OPTIONS[style], timeZone });
    cache.set(key, f);
  }
  return f.format(new Date(at));
}

/** The value a `datetime-local` input shows for `at` in the terminal's zone. */
export function toLocalInput(at: Date, timeZone: string): string {
  const l = new TZDate(at.getTime(), timeZone);
  return `${localDay(l)}T${two(l.getHours())}:${two(l.getMinutes())}`;
}

// written from the zone's wall-clock fields, not with date-fns' format: that formatter and its
// locale data would ship to every phone page that reads a time (the pages' JavaScript budget)
const two = (n: number) => String(n).padStart(2, '0');
const localDay = (l: TZDate) =>
  `${String(l.getFullYear()).padStart(4, '0')}-${two(l.getMonth() + 1)}-${two(l.getDate())}`;

/** A `datetime-local` value (`2026-03-08T02:30`) read as wall time in the terminal's zone. */
export function fromLocalInput(value: string, timeZone: string): Date | null {
  const m = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})$/.exec(value);
  if (!m) return null;
  const [y, mo, d, h, mi] = m.slice(1).map(Number);
  return new Date(new TZDate(y, mo - 1, d, h, mi, timeZone).getTime());
}

/** The terminal's local calendar day before the one `at` falls on, as `yyyy-MM-dd`. */
export function previousLocalDay(at: Date, timeZone: string): string {
  const local = new TZDate(at.getTime(), timeZone);
  return localDay(new TZDate(local.getFullYear(), local.getMonth(), local.getDate() - 1, 12, 0, timeZone));
}

const stampCache = new Map<string, Intl.DateTimeFormat>();

/**
 * `at` in `timeZone` as the engine's reasons write it, day first and 24 h with no zone name:
 * `3 Nov 2026 14:05` in English, `3 nov 2026 14:05` in Spanish.
 */
export function formatStamp(at: Date | string | number, timeZone: string, locale = 'en'): string {
  const key = `${locale}|${timeZone}`;
  let f = stampCache.get(key);
  if (!f) {
    f = new Intl.DateTimeFormat(locale, { ...DAY, ...MINUTE, timeZone });
    stampCache.set(key, f);
  }
  const part = (type: Intl.DateTimeFormatPartTypes, parts: Intl.DateTimeFormatPart[]) =>
    parts.find((p) => p.type === type)?.value ?? '';
  const parts = f.formatToParts(new Date(at));
  const month = part('month', parts).replace(/\.$/, '');
  return `${part('day', parts)} ${month} ${part('year', parts)} ${part('hour', parts)}:${part('minute', parts)}`;
}
