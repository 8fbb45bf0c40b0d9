import { createHmac } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { signLabelToken, verifyLabelToken } from '@/lib/engine/identity/label-token';

const SECRET = 'test-only-secret-0123456789abcdef-0123';
const claims = {
  labelId: '0b7e7c52-4d1e-4a57-9a55-3f1c2a9d8e01',
  trailerId: '6f0c2d11-88aa-4b4f-b0de-7d2e9a3c5b44',
};

function flipChar(token: string, i: number): string {
  const c = token[i] === 'A' ? 'B' : 'A';
  return token.slice(0, i) + c + token.slice(i + 1);
}

describe('label tokens', () => {
  it('round-trips label and trailer ids', () => {
    const t = signLabelToken(claims, SECRET);
    expect(verifyLabelToken(t, SECRET)).toEqual({ ok: true, ...claims });
    expect(
      verifyLabelToken(signLabelToken({ labelId: 'L-17', trailerId: 'HM 1042' }, SECRET), SECRET),
    ).toEqual({ ok: true, labelId: 'L-17', trailerId: 'HM 1042' });
  });

  it('is base64url and short enough for a small QR code', () => {
    const t = signLabelToken(claims, SECRET);
    expect(t).toMatch(/^[A-Za-z0-9_-]+$/);
    // 1 + 17 + 17 + 16 bytes = 51 → 68 characters. A link of ~100 bytes fits QR version 6 at
    // level M (ISO/IEC 18004, byte mode capacity 106).
    expect(t).toHaveLength(68);
  });

  it('carries a real HMAC-SHA256 over the payload (checked independently)', () => {
    const raw = Buffer.from(signLabelToken(claims, SECRET), 'base64url');
    const payload = raw.subarray(0, raw.length - 16);
    const expected = createHmac('sha256', SECRET)
      .update('hitchmark-label\u0000')
      .update(payload)
      .digest()
      .subarray(0, 16);
    expect(raw.subarray(raw.length - 16).equals(expected)).toBe(true);
  });

  it('rejects a tampered token at every position without throwing', () => {
    const t = signLabelToken(claims, SECRET);
    for (let i = 0; i < t.length; i++) {
      const r = verifyLabelToken(flipChar(t, i), SECRET);
      expect(r.ok).toBe(false);
      if (!r.ok) expect(['bad_signature', 'malformed']).toContain(r.error);
    }
  });

  it('rejects a token signed with another secret', () => {
    const t = signLabelToken(claims, 'another-secret-of-at-least-32-bytes!!');
    expect(verifyLabelToken(t, SECRET)).toEqual({ ok: false, error: 'bad_signature' });
  });

  it('treats malformed input as a typed error, never a throw', () => {
    for (const bad of [
      '',
      'abc',
      'not a token!',
      'A'.repeat(500),
      '====',
      signLabelToken(claims, SECRET).slice(0, 40),
    ]) {
      const r = verifyLabelToken(bad, SECRET);
      expect(r.ok).toBe(false);
    }
    expect(verifyLabelToken(undefined as unknown as string, SECRET)).toEqual({
      ok: false,
      error: 'malformed',
    });
  });

  it('reports a revoked label (re-issued) once the signature checks out', () => {
    const old = signLabelToken(claims, SECRET);
    const current = new Set(['1d2c3b4a-0000-4000-8000-000000000001']);
    const r = verifyLabelToken(old, SECRET, { isLabelCurrent: (id) => current.has(id) });
    expect(r).toEqual({ ok: false, error: 'revoked' });
    current.add(claims.labelId);
    expect(verifyLabelToken(old, SECRET, { isLabelCurrent: (id) => current.has(id) }).ok).toBe(true);
  });

  it('refuses a short secret and empty ids when signing', () => {
    expect(() => signLabelToken(claims, 'short')).toThrow(RangeError);
    expect(() => signLabelToken({ labelId: '', trailerId: 'x' }, SECRET)).toThrow(RangeError);
  });
});
