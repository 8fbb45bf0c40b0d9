import { createHmac } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { signCaseLink, verifyCaseLink } from '@/lib/desk/case-link';

const claims = {
  caseId: '3f0c8a62-1b9e-4c55-9a57-0d2a5f1b7e10',
  carrierId: '9a1d7c44-5e2b-4f60-8b13-6c0e2d9f4a21',
  expiresAt: new Date('2026-12-01T00:00:00Z'),
};
const secret = 'test-secret-for-hitchmark-case-links';

describe('signed case link', () => {
  it('round-trips and matches an independent HMAC-SHA-256 (RFC 2104 / FIPS 198-1, computed with node:crypto)', () => {
    const token = signCaseLink(claims, secret);
    const payload = `${claims.caseId}.${claims.carrierId}.${claims.expiresAt.getTime() / 1000}`;
    expect(token.split('.')[1]).toBe(createHmac('sha256', secret).update(payload).digest('base64url'));
    expect(verifyCaseLink(token, secret, new Date('2026-11-20T00:00:00Z'))).toMatchObject({
      ok: true,
      claims: { caseId: claims.caseId, carrierId: claims.carrierId },
    });
  });

  it('refuses a changed carrier, a wrong secret, an expired link and garbage', () => {
    const token = signCaseLink(claims, secret);
    const [body, sig] = token.split('.');
    const forged = Buffer.from(
      Buffer.from(body, 'base64url').toString().replace(claims.carrierId, claims.caseId),
    ).toString('base64url');
    const before = new Date('2026-11-20T00:00:00Z');
    expect(verifyCaseLink(`${forged}.${sig}`, secret, before)).toEqual({ ok: false, error: 'bad_signature' });
    expect(verifyCaseLink(token, 'another-secret', before)).toEqual({ ok: false, error: 'bad_signature' });
    expect(verifyCaseLink(token, secret, new Date('2026-12-01T00:00:01Z'))).toEqual({
      ok: false,
      error: 'expired',
    });
    expect(verifyCaseLink('not-a-token', secret, before)).toEqual({ ok: false, error: 'malformed' });
    expect(verifyCaseLink('a.b.c', secret, before)).toEqual({ ok: false, error: 'malformed' });
  });
});
