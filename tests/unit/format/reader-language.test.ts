// Dates in the reader's language: the one clock writes a Spanish reader's dates with Spanish month
// names, in the terminal's zone, and the yard board's cells follow the reader's locale.
import { describe, expect, it } from 'vitest';
import { formatStamp, formatTime } from '@/lib/format/time';
import { ENGLISH_CELLS, rowCells } from '@/lib/yard/table';
import { trailer } from '../yard/fixtures';

const ZONE = 'America/Chicago';
// 21:04 UTC on Wed 2 Dec 2026 is 15:04 CST in Chicago (IANA tz database: CST is UTC−6 in winter)
const AT = '2026-12-02T21:04:00Z';

describe('the one clock in Spanish (Unicode CLDR "es" data, as Intl and date-fns/locale/es write it)', () => {
  it('writes the worked example in both languages', () => {
    // CLDR en: medium date "Dec 2, 2026"; CLDR es: medium date "2 dic 2026" (abbreviated month in
    // lower case, no period). CLDR es has no short name for the US zones, so the zone is "GMT-6".
    expect(formatTime(AT, ZONE, 'dateTime', 'en-US')).toBe('Dec 2, 2026, 15:04 CST');
    expect(formatTime(AT, ZONE, 'dateTime', 'es')).toBe('2 dic 2026, 15:04 GMT-6');
    expect(formatTime(AT, ZONE, 'date', 'es')).toBe('2 dic 2026');
    expect(formatTime(AT, ZONE, 'time', 'es')).toBe('15:04 GMT-6');
  });

  it('uses the CLDR es abbreviation "sept" for September and the summer offset', () => {
    // CLDR es (since version 38) abbreviates septiembre as "sept"; CDT is UTC−5 (IANA tz database)
    expect(formatTime('2026-09-15T13:04:00Z', ZONE, 'dateTime', 'es')).toBe('15 sept 2026, 08:04 GMT-5');
    expect(formatStamp('2026-09-15T13:04:00Z', ZONE, 'es')).toBe('15 sept 2026 08:04');
  });

  it('keeps English for a caller that names no reader (e-mails to carriers, the CSV export)', () => {
    expect(formatTime(AT, ZONE)).toBe(formatTime(AT, ZONE, 'dateTime', 'en-US'));
  });
});

describe('the yard board’s times follow the reader', () => {
  const row = {
    trailer: trailer({ id: 'r1', gateInAt: '2026-12-01T14:30:00Z', lastSeenAt: AT }),
    spotLabel: 'A01',
    spotOrder: 1,
  };
  const now = new Date('2026-12-02T22:00:00Z');

  it('writes gate-in and last-seen in Spanish for a Spanish reader, English for the CSV', () => {
    // same CLDR sources as above; 14:30 UTC on 1 Dec is 08:30 CST
    const spanish = rowCells(row, ZONE, now, { ...ENGLISH_CELLS, locale: 'es' });
    expect(spanish.slice(7)).toEqual(['1 dic 2026, 08:30 GMT-6', '2 dic 2026, 15:04 GMT-6']);
    expect(rowCells(row, ZONE, now).slice(7)).toEqual(['Dec 1, 2026, 08:30 CST', 'Dec 2, 2026, 15:04 CST']);
  });
});
