import { TZDate } from '@date-fns/tz';
import { describe, expect, it } from 'vitest';
import {
  dwellMinutes,
  filterRows,
  formatDwell,
  isLowFuel,
  isOverFreeTime,
  tableRows,
} from '@/lib/yard/board';
import { rowCells, sortRows } from '@/lib/yard/table';
import { board, spot, trailer } from './fixtures';

const CHICAGO = 'America/Chicago';
const policy = { freeTimeHours: 48, lowFuelEighths: 4 };

describe('dwell across a daylight-saving change', () => {
  // Source: IANA tz database (America/Chicago follows the US rule, 15 U.S.C. 260a: DST starts at
  // 02:00 local on the second Sunday of March, i.e. 8 March 2026). Local times are built with
  // @date-fns/tz, which reads the IANA data through the platform's Intl.
  it('counts 47 h, not 48, from Sat 7 Mar 12:00 to Mon 9 Mar 12:00 local in Chicago', () => {
    const gateIn = new TZDate(2026, 2, 7, 12, 0, CHICAGO);
    const now = new TZDate(2026, 2, 9, 12, 0, CHICAGO);
    expect(dwellMinutes(gateIn.toISOString(), now)).toBe(47 * 60);
    expect(formatDwell(dwellMinutes(gateIn.toISOString(), now))).toBe('1 d 23 h');
  });

  it('counts 25 h across the November change back (first Sunday of November, 1 Nov 2026)', () => {
    // Same source: DST ends at 02:00 local on the first Sunday of November.
    const gateIn = new TZDate(2026, 9, 31, 12, 0, CHICAGO);
    const now = new TZDate(2026, 10, 1, 12, 0, CHICAGO);
    expect(dwellMinutes(gateIn.toISOString(), now)).toBe(25 * 60);
  });

  it('shows gate-in and last-seen times in the zone of the day (CST before, CDT after the change)', () => {
    // IANA tz database: America/Chicago is CST (UTC-6) in winter, CDT (UTC-5) in summer time.
    const row = {
      trailer: trailer({ id: 'r1', gateInAt: '2026-03-07T18:00:00Z', lastSeenAt: '2026-03-09T17:00:00Z' }),
      spotLabel: 'A01',
      spotOrder: 1,
    };
    const cells = rowCells(row, CHICAGO, new Date('2026-03-09T18:00:00Z'));
    expect(cells.slice(7)).toEqual(['Mar 7, 2026, 12:00 CST', 'Mar 9, 2026, 12:00 CDT']);
    expect(rowCells({ ...row, trailer: { ...row.trailer, gateInAt: null } }, CHICAGO, new Date())[7]).toBe(
      '—',
    );
  });

  it('is over the 48 h free time only after 48 elapsed hours', () => {
    const t = trailer({ id: 'r1', gateInAt: new TZDate(2026, 2, 7, 12, 0, CHICAGO).toISOString() });
    expect(isOverFreeTime(t, policy, new TZDate(2026, 2, 9, 12, 0, CHICAGO))).toBe(false); // 47 h
    expect(isOverFreeTime(t, policy, new TZDate(2026, 2, 9, 13, 1, CHICAGO))).toBe(true); // 48 h 01 min
  });
});

describe('formatDwell', () => {
  it('writes days and hours, hours and minutes, or minutes', () => {
    expect(formatDwell(null)).toBe('—');
    expect(formatDwell(12)).toBe('12 min');
    expect(formatDwell(5 * 60 + 7)).toBe('5 h 07 min');
    expect(formatDwell(2 * 1440 + 5 * 60 + 59)).toBe('2 d 5 h');
  });
});

describe('board filters', () => {
  const now = new Date('2026-03-09T18:00:00Z');
  const held = trailer({
    id: 'held',
    holds: [{ severity: 'out_of_service', reason: 'Tandem pin not engaged' }],
  });
  const low = trailer({ id: 'low', fuelEighths: 4 });
  const justOver = trailer({ id: 'enough', fuelEighths: 5 });
  const off = trailer({ id: 'off', isReeferOn: false });
  const van = trailer({
    id: 'van',
    kind: 'dry_van',
    fuelEighths: null,
    isReeferOn: null,
    gateInAt: '2026-03-09T12:00:00Z',
  });
  const rows = tableRows(
    board([
      spot('A01', 1, held),
      spot('A02', 2, low),
      spot('A03', 3, justOver),
      spot('A04', 4, off),
      spot('A05', 5, van),
      spot('A06', 6, null),
    ]),
  );

  it('lists only occupied spots', () => {
    expect(rows.map((r) => r.spotLabel)).toEqual(['A01', 'A02', 'A03', 'A04', 'A05']);
  });
  it('held: trailers with an open hold', () => {
    expect(filterRows(rows, ['held'], policy, now).map((r) => r.trailer.id)).toEqual(['held']);
  });
  it('low fuel: at or below the policy eighths, reefers only', () => {
    expect(isLowFuel(low, policy)).toBe(true);
    expect(isLowFuel(justOver, policy)).toBe(false);
    expect(filterRows(rows, ['low_fuel'], policy, now).map((r) => r.trailer.id)).toEqual(['low']);
  });
  it('reefer off: a reefer whose unit is not running (a dry van has none)', () => {
    expect(filterRows(rows, ['reefer_off'], policy, now).map((r) => r.trailer.id)).toEqual(['off']);
  });
  it('over free time: every trailer gated in on 1 Mar, not the van gated in 6 h ago', () => {
    expect(filterRows(rows, ['over_free_time'], policy, now).map((r) => r.trailer.id)).toEqual([
      'held',
      'low',
      'enough',
      'off',
    ]);
  });
  it('several filters combine with AND; none means all', () => {
    expect(filterRows(rows, ['held', 'low_fuel'], policy, now)).toEqual([]);
    expect(filterRows(rows, [], policy, now)).toHaveLength(5);
  });
});

describe('sorting the table', () => {
  const now = new Date('2026-03-09T18:00:00Z');
  const rows = tableRows(
    board([
      spot(
        'A01',
        1,
        trailer({ id: 'r10', unitNumber: 'R10', fuelEighths: 2, gateInAt: '2026-03-08T18:00:00Z' }),
      ),
      spot(
        'A02',
        2,
        trailer({ id: 'r9', unitNumber: 'R9', fuelEighths: null, gateInAt: '2026-03-09T06:00:00Z' }),
      ),
      spot('A03', 3, trailer({ id: 'r11', unitNumber: 'R11', fuelEighths: 7, gateInAt: null })),
    ]),
  );
  it('sorts unit numbers numerically (R9 before R10)', () => {
    expect(sortRows(rows, 'unit', 'asc', now).map((r) => r.trailer.unitNumber)).toEqual(['R9', 'R10', 'R11']);
    expect(sortRows(rows, 'unit', 'desc', now).map((r) => r.trailer.unitNumber)).toEqual([
      'R11',
      'R10',
      'R9',
    ]);
  });
  it('keeps unknown values last in both directions', () => {
    expect(sortRows(rows, 'fuel', 'asc', now).map((r) => r.trailer.id)).toEqual(['r10', 'r11', 'r9']);
    expect(sortRows(rows, 'fuel', 'desc', now).map((r) => r.trailer.id)).toEqual(['r11', 'r10', 'r9']);
    expect(sortRows(rows, 'dwell', 'desc', now).map((r) => r.trailer.id)).toEqual(['r10', 'r9', 'r11']);
  });
  it('does not change the input', () => {
    const before = rows.map((r) => r.trailer.id);
    sortRows(rows, 'unit', 'desc', now);
    expect(rows.map((r) => r.trailer.id)).toEqual(before);
  });
});

describe('table cells', () => {
  it('write reefer, fuel, holds and load in words', () => {
    const now = new Date('2026-03-09T18:00:00Z');
    const [row] = tableRows(
      board([
        spot(
          'A01',
          1,
          trailer({
            id: 'r1',
            unitNumber: 'R1',
            isLoaded: true,
            setpointTenthsF: -100,
            fuelEighths: 3,
            holds: [{ severity: 'restricted', reason: 'No perishable loads' }],
          }),
        ),
      ]),
    );
    expect(rowCells(row, CHICAGO, now)).toEqual([
      'R1',
      'A01',
      'Loaded',
      'On, -10.0 °F',
      '3/8',
      'Restricted: No perishable loads',
      '8 d 6 h',
      'Mar 1, 2026, 06:00 CST',
      'Mar 1, 2026, 07:00 CST',
    ]);
  });
});
