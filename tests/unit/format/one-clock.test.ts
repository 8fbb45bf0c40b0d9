// One clock: every time a person reads is the terminal's, through lib/format/time.ts, and the lint
// rule keeps other ways of writing a date out of app/, lib/ and db/.
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';
import { formatStamp, formatTime, fromLocalInput, toLocalInput } from '@/lib/format/time';

// IANA tz database (zone America/Chicago, rule US): in 2026 daylight time starts on the second
// Sunday of March, 8 Mar, at 02:00 local standard time (08:00 UTC), and ends on the first Sunday of
// November, 1 Nov, at 02:00 local daylight time (07:00 UTC). CST is UTC−6, CDT UTC−5.
const ZONE = 'America/Chicago';

describe('one clock: the terminal’s zone across a daylight-saving change', () => {
  it('the minute before and the minute of the spring change', () => {
    expect(formatTime('2026-03-08T07:59:00Z', ZONE)).toBe('Mar 8, 2026, 01:59 CST');
    expect(formatTime('2026-03-08T08:00:00Z', ZONE)).toBe('Mar 8, 2026, 03:00 CDT');
    expect(formatStamp('2026-03-08T08:00:00Z', ZONE, 'es')).toBe('8 mar 2026 03:00');
  });

  it('the repeated hour in autumn reads twice, told apart by the zone name', () => {
    expect(formatTime('2026-11-01T06:30:00Z', ZONE)).toBe('Nov 1, 2026, 01:30 CDT');
    expect(formatTime('2026-11-01T07:30:00Z', ZONE)).toBe('Nov 1, 2026, 01:30 CST');
    // the stamp has no zone name: the same words for both instants
    expect(formatStamp('2026-11-01T06:30:00Z', ZONE)).toBe(formatStamp('2026-11-01T07:30:00Z', ZONE));
  });

  it('a wall time typed at the terminal comes back as the same wall time', () => {
    const at = fromLocalInput('2026-03-08T03:30', ZONE);
    expect(at?.toISOString()).toBe('2026-03-08T08:30:00.000Z');
    expect(toLocalInput(at!, ZONE)).toBe('2026-03-08T03:30');
    // the same instant in another terminal's zone (America/New_York is UTC−4 by then)
    expect(formatTime(at!, 'America/New_York', 'time')).toBe('04:30 EDT');
  });

  it('the date in Spanish still follows the terminal, not the machine', () => {
    expect(formatTime('2026-11-01T04:30:00Z', ZONE, 'date', 'es')).toBe('31 oct 2026');
    expect(formatTime('2026-11-01T04:30:00Z', 'UTC', 'date', 'es')).toBe('1 nov 2026');
  });
});

describe('one clock: the lint rule', () => {
  const lint = async (code: string, filePath: string) => {
    const [result] = await new ESLint().lintText(code, { filePath });
    return result.messages.filter((m) => m.ruleId === 'no-restricted-syntax').map((m) => m.message);
  };

  it('refuses a date written past the formatter in app/, and allows it in lib/format/time.ts', async () => {
    const bypass = [
      "import { format } from 'date-fns';",
      'export const a = (d: Date) => format(d, "HH:mm");',
      "export const b = (d: Date) => d.toLocaleDateString('en-US');",
      "export const c = new Intl.DateTimeFormat('en-US', { hour: '2-digit' });",
      'export const e = (d: Date) => d.toLocaleTimeString();',
    ].join('\n');
    const found = await lint(bypass, 'app/(app)/desk/_components/clock-probe.tsx');
    expect(found).toHaveLength(4);
    expect(found.every((m) => m.includes('lib/format/time.ts'))).toBe(true);
    expect(await lint(bypass, 'lib/format/time.ts')).toEqual([]);
  }, 60_000);
});
