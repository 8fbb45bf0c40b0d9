// The signed link in a case e-mail: it opens the case's evidence summary and dispute form for the
// carrier named in it, without an account, until it expires. HMAC-SHA-256 over
// "caseId.carrierId.expiresAtSeconds"; the secret comes from the caller (CASE_LINK_SECRET, else
// RECEIPT_SECRET).
import { createHmac, timingSafeEqual } from 'node:crypto';

export type CaseLinkClaims = { caseId: string; carrierId: string; expiresAt: Date };
export type CaseLinkCheck =
  { ok: true; claims: CaseLinkClaims } | { ok: false; error: 'malformed' | 'bad_signature' | 'expired' };

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

function mac(payload: string, secret: string): string {
  return createHmac('sha256', secret).update(payload).digest('base64url');
}

export function signCaseLink(claims: CaseLinkClaims, secret: string): string {
  const payload = `${claims.caseId}.${claims.carrierId}.${Math.floor(claims.expiresAt.getTime() / 1000)}`;
  return `${Buffer.from(payload).toString('base64url')}.${mac(payload, secret)}`;
}

/** Never throws on a bad token. */
export function verifyCaseLink(token: string, secret: string, now: Date): CaseLinkCheck {
  const [body, signature, extra] = token.split('.');
  if (!body || !signature || extra !== undefined || token.length > 300)
    return { ok: false, error: 'malformed' };
  const payload = Buffer.from(body, 'base64url').toString('utf8');
  const [caseId, carrierId, exp] = payload.split('.');
  if (!UUID.test(caseId ?? '') || !UUID.test(carrierId ?? '') || !/^\d{1,12}$/.test(exp ?? ''))
    return { ok: false, error: 'malformed' };
  const expected = Buffer.from(mac(payload, secret));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given))
    return { ok: false, error: 'bad_signature' };
  const expiresAt = new Date(Number(exp) * 1000);
  if (now.getTime() > expiresAt.getTime()) return { ok: false, error: 'expired' };
  return { ok: true, claims: { caseId, carrierId, expiresAt } };
}
