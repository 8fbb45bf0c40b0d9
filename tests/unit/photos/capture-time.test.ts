import { describe, expect, it } from 'vitest';
import { captureInstant, isSaneCaptureTime, readCaptureTime } from '@/lib/photos/capture-time';
import { jpegWithExif } from './exif-fixture';

// Values per EXIF 2.3 (CIPA DC-008-2012) §4.6.5 DateTimeOriginal "YYYY:MM:DD HH:MM:SS" and
// EXIF 2.31 OffsetTimeOriginal "±HH:MM"; the fixture is written byte by byte (exif-fixture.ts).
describe('capture time from a photo', () => {
  it('reads DateTimeOriginal with OffsetTimeOriginal from a JPEG as the exact instant', async () => {
    const jpeg = jpegWithExif('2026:03:09 14:02:31', '-05:00');
    // 14:02:31 at UTC−5 is 19:02:31 UTC; the phone's own offset does not matter here
    expect((await readCaptureTime(jpeg, 120))?.toISOString()).toBe('2026-03-09T19:02:31.000Z');
  });

  it("reads a DateTimeOriginal without offset in the phone's zone", async () => {
    const jpeg = jpegWithExif('2026:07:01 06:15:00');
    // the phone at UTC−6 (e.g. a summer evening in the central US): 06:15 local is 12:15 UTC
    expect((await readCaptureTime(jpeg, -360))?.toISOString()).toBe('2026-07-01T12:15:00.000Z');
  });

  it('answers null for a photo without metadata, or with a blank or impossible date', async () => {
    expect(await readCaptureTime(Uint8Array.from([0xff, 0xd8, 0xff, 0xd9]), 0)).toBeNull();
    // the standard lets a camera write spaces when it does not know the time
    expect(await readCaptureTime(jpegWithExif('    :  :     :  :  '), 0)).toBeNull();
    expect(captureInstant('2026:02:31 10:00:00', null, 0)).toBeNull();
    expect(captureInstant('2026:13:01 10:00:00', null, 0)).toBeNull();
    expect(captureInstant(20260301, null, 0)).toBeNull();
  });

  it('keeps a claimed time only within sane bounds of the upload (common practice)', () => {
    const uploaded = new Date('2026-03-09T19:09:00Z');
    expect(isSaneCaptureTime(new Date('2026-03-09T19:02:31Z'), uploaded)).toBe(true);
    expect(isSaneCaptureTime(new Date('2026-02-08T19:09:00Z'), uploaded)).toBe(true); // 29 days
    expect(isSaneCaptureTime(new Date('2026-02-06T19:09:00Z'), uploaded)).toBe(false); // 31 days
    expect(isSaneCaptureTime(new Date('2026-03-09T19:13:59Z'), uploaded)).toBe(true); // 4 min 59 s ahead
    expect(isSaneCaptureTime(new Date('2026-03-09T19:14:01Z'), uploaded)).toBe(false);
    expect(isSaneCaptureTime(new Date('1999-12-31T23:59:59Z'), new Date('2000-01-10T00:00:00Z'))).toBe(false);
    expect(isSaneCaptureTime(new Date(Number.NaN), uploaded)).toBe(false);
  });
});
