import { randomBytes } from 'node:crypto';

// Crockford base32: no I, L, O or U, so a code read aloud or typed from paper is not misread.
export const CROCKFORD = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';

/** 8 random Crockford base32 characters (40 bits) from the OS random source. */
export function newVerificationCode(): string {
  const bytes = randomBytes(8);
  let out = '';
  for (const b of bytes) out += CROCKFORD[b & 31];
  return out;
}

/** "7KQ2M9XD" → "7KQ2-M9XD" for reading. */
export function formatVerificationCode(code: string): string {
  return `${code.slice(0, 4)}-${code.slice(4)}`;
}
