/**
 * Signed trailer label tokens, for the link in a label's QR code.
 * Token = base64url(version ‖ label id ‖ trailer id ‖ first 16 bytes of HMAC-SHA256).
 * Lower-case UUIDs are packed as 16 bytes, so two UUIDs make a 68-character token.
 * Revocation is by label id: re-issuing a label makes the old id no longer current.
 * This is the one engine module that imports node:crypto.
 */
import { createHmac, timingSafeEqual } from 'node:crypto';

const VERSION = 1;
const MAC_BYTES = 16;
const UUID_TAG = 0xff;
const MAX_ID_BYTES = 64;
const DOMAIN = Buffer.from('hitchmark-label\u0000', 'utf8');
const UUID_PATTERN = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;
const BASE64URL = /^[A-Za-z0-9_-]+$/;

export interface LabelClaims {
  labelId: string;
  trailerId: string;
}

export type LabelTokenError = 'malformed' | 'bad_signature' | 'revoked';
export type LabelTokenResult = ({ ok: true } & LabelClaims) | { ok: false; error: LabelTokenError };

export interface VerifyOptions {
  /** Return false when the label id has been revoked (re-issued); checked after the signature. */
  isLabelCurrent?: (labelId: string, trailerId: string) => boolean;
}

function secretBytes(secret: string | Uint8Array): Buffer {
  const b = typeof secret === 'string' ? Buffer.from(secret, 'utf8') : Buffer.from(secret);
  if (b.length < 32) throw new RangeError('label signing secret must be at least 32 bytes');
  return b;
}

function mac(secret: Buffer, payload: Buffer): Buffer {
  return createHmac('sha256', secret).update(DOMAIN).update(payload).digest().subarray(0, MAC_BYTES);
}

function encodeId(id: string): Buffer {
  if (UUID_PATTERN.test(id))
    return Buffer.concat([Buffer.from([UUID_TAG]), Buffer.from(id.replace(/-/g, ''), 'hex')]);
  const bytes = Buffer.from(id, 'utf8');
  if (bytes.length === 0 || bytes.length > MAX_ID_BYTES)
    throw new RangeError('label and trailer ids must be 1–64 bytes');
  return Buffer.concat([Buffer.from([bytes.length]), bytes]);
}

function decodeId(buf: Buffer, at: number): [id: string, next: number] | null {
  if (at >= buf.length) return null;
  const tag = buf[at];
  if (tag === UUID_TAG) {
    if (at + 17 > buf.length) return null;
    const h = buf.subarray(at + 1, at + 17).toString('hex');
    return [
      `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`,
      at + 17,
    ];
  }
  if (tag === 0 || tag > MAX_ID_BYTES || at + 1 + tag > buf.length) return null;
  return [buf.subarray(at + 1, at + 1 + tag).toString('utf8'), at + 1 + tag];
}

/** Signs a label token. Throws only on a short secret or an empty or over-long id. */
export function signLabelToken(claims: LabelClaims, secret: string | Uint8Array): string {
  const payload = Buffer.concat([
    Buffer.from([VERSION]),
    encodeId(claims.labelId),
    encodeId(claims.trailerId),
  ]);
  return Buffer.concat([payload, mac(secretBytes(secret), payload)]).toString('base64url');
}

/**
 * Verifies a token in constant time and returns its label and trailer ids. Tampered or
 * malformed tokens give `{ ok: false, error }`, never a throw; `revoked` when
 * `isLabelCurrent` says the label id is no longer current.
 */
export function verifyLabelToken(
  token: string,
  secret: string | Uint8Array,
  options: VerifyOptions = {},
): LabelTokenResult {
  const key = secretBytes(secret);
  if (typeof token !== 'string' || token.length > 400 || !BASE64URL.test(token))
    return { ok: false, error: 'malformed' };
  const buf = Buffer.from(token, 'base64url');
  if (buf.toString('base64url') !== token || buf.length < 1 + 2 + 2 + MAC_BYTES)
    return { ok: false, error: 'malformed' };
  const payload = buf.subarray(0, buf.length - MAC_BYTES);
  const given = buf.subarray(buf.length - MAC_BYTES);
  if (!timingSafeEqual(given, mac(key, payload))) return { ok: false, error: 'bad_signature' };
  if (payload[0] !== VERSION) return { ok: false, error: 'malformed' };
  const label = decodeId(payload, 1);
  const trailer = label && decodeId(payload, label[1]);
  if (!label || !trailer || trailer[1] !== payload.length) return { ok: false, error: 'malformed' };
  const claims = { labelId: label[0], trailerId: trailer[0] };
  if (options.isLabelCurrent && !options.isLabelCurrent(claims.labelId, claims.trailerId)) {
    return { ok: false, error: 'revoked' };
  }
  return { ok: true, ...claims };
}
