// When a photo was taken, from the camera's own metadata. EXIF 2.3 (CIPA DC-008-2012) §4.6.5:
// DateTimeOriginal (tag 0x9003) is "YYYY:MM:DD HH:MM:SS" in the camera's local time, without a
// zone; EXIF 2.31 added OffsetTimeOriginal (tag 0x9011), "+HH:MM" or "-HH:MM", the offset from
// UTC of that local time. The reading is a claim of the phone, never proof: the server only
// checks it is a date within sane bounds of the upload (isSaneCaptureTime) and stores it beside
// the upload time, which the server sets itself.

const DATE_TIME = /^(\d{4}):(\d{2}):(\d{2}) (\d{2}):(\d{2}):(\d{2})$/;
const OFFSET = /^([+-])(\d{2}):(\d{2})$/;

/**
 * The instant of an EXIF date-time. With OffsetTimeOriginal the instant is exact; without it the
 * local time is read with `fallbackOffsetMinutes` (east of UTC positive; the phone passes its own
 * zone's offset, as the camera that wrote the photo is most often the phone's own).
 * Returns null for a missing, blank ("    :  :     :  :  ", allowed by the standard) or impossible value.
 */
export function captureInstant(
  dateTime: unknown,
  offset: unknown,
  fallbackOffsetMinutes: number,
): Date | null {
  if (typeof dateTime !== 'string') return null;
  const m = DATE_TIME.exec(dateTime.trim());
  if (!m) return null;
  const [y, mo, d, h, mi, s] = m.slice(1).map(Number);
  if (mo < 1 || mo > 12 || d < 1 || d > 31 || h > 23 || mi > 59 || s > 59) return null;
  let offsetMinutes = fallbackOffsetMinutes;
  const o = typeof offset === 'string' ? OFFSET.exec(offset.trim()) : null;
  if (o) offsetMinutes = (o[1] === '-' ? -1 : 1) * (Number(o[2]) * 60 + Number(o[3]));
  const utc = Date.UTC(y, mo - 1, d, h, mi, s);
  // Date.UTC rolls 31 February over into March: such a value is refused, not shifted
  if (new Date(utc).getUTCDate() !== d) return null;
  return new Date(utc - offsetMinutes * 60_000);
}

/** Sane bounds: not before 2000, at most 30 days before the upload, at most 5 minutes after it. */
export const CAPTURE_MAX_AGE_MS = 30 * 24 * 60 * 60_000;
export const CAPTURE_MAX_AHEAD_MS = 5 * 60_000;

/** A claimed capture time the server will store: within sane bounds of the upload (common practice). */
export function isSaneCaptureTime(capturedAt: Date, uploadedAt: Date): boolean {
  const t = capturedAt.getTime();
  const u = uploadedAt.getTime();
  return (
    Number.isFinite(t) &&
    t >= Date.UTC(2000, 0, 1) &&
    t >= u - CAPTURE_MAX_AGE_MS &&
    t <= u + CAPTURE_MAX_AHEAD_MS
  );
}

/** Reads the capture time of an original photo (before compression strips its metadata). */
export async function readCaptureTime(
  image: ArrayBuffer | Uint8Array | Blob,
  fallbackOffsetMinutes: number,
): Promise<Date | null> {
  try {
    // loaded with the first photo, not with the page (the handoff form's first-load budget)
    const { default: exifr } = await import('exifr');
    const tags = (await exifr.parse(image, {
      pick: ['DateTimeOriginal', 'OffsetTimeOriginal'],
      reviveValues: false,
    })) as { DateTimeOriginal?: unknown; OffsetTimeOriginal?: unknown } | undefined;
    return tags
      ? captureInstant(tags.DateTimeOriginal, tags.OffsetTimeOriginal, fallbackOffsetMinutes)
      : null;
  } catch {
    return null; // no metadata, or metadata the reader cannot parse: no capture time
  }
}
