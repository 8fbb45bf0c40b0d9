import { describe, expect, it } from 'vitest';
import { DEFAULT_PHOTO_POLICY } from '@/lib/photos/policy';
import { terminalPolicyOf } from '@/lib/terminal/policy';
import { uploadCompleteSchema } from '@/lib/validation/handoffs';

describe("the terminal's photo policy", () => {
  it('defaults to 1600 px and quality 0.8 (common practice) and takes a terminal figure within bounds', () => {
    expect(terminalPolicyOf(null).photo).toEqual({ longestSidePx: 1600, quality: 0.8 });
    expect(DEFAULT_PHOTO_POLICY).toEqual({ longestSidePx: 1600, quality: 0.8 });
    expect(terminalPolicyOf({ photoLongestSidePx: 2048, photoQuality: 0.7 }).photo).toEqual({
      longestSidePx: 2048,
      quality: 0.7,
    });
  });

  it('falls back per figure when a value would hide damage or is not a number', () => {
    expect(terminalPolicyOf({ photoLongestSidePx: 320, photoQuality: 0.75 }).photo).toEqual({
      longestSidePx: 1600,
      quality: 0.75,
    });
    expect(terminalPolicyOf({ photoLongestSidePx: 1200, photoQuality: 'high' }).photo).toEqual({
      longestSidePx: 1200,
      quality: 0.8,
    });
    expect(terminalPolicyOf({ photoLongestSidePx: 1600.5, photoQuality: 1.2 }).photo).toEqual({
      longestSidePx: 1600,
      quality: 0.8,
    });
  });
});

describe('the completion body', () => {
  it('takes an ISO 8601 date-time with its offset (RFC 3339 §5.6), or nothing', () => {
    expect(uploadCompleteSchema.parse({ capturedAt: '2026-03-09T14:02:31-05:00' })).toEqual({
      capturedAt: '2026-03-09T14:02:31-05:00',
    });
    expect(uploadCompleteSchema.parse({})).toEqual({});
    expect(uploadCompleteSchema.parse({ capturedAt: null })).toEqual({ capturedAt: null });
    for (const bad of ['2026:03:09 14:02:31', 'yesterday', 1741528951000]) {
      const r = uploadCompleteSchema.safeParse({ capturedAt: bad });
      expect(r.success).toBe(false);
      expect(r.error?.issues[0].path).toEqual(['capturedAt']);
    }
  });
});
