import 'server-only';

/** The key for signed case links: CASE_LINK_SECRET when set, else RECEIPT_SECRET (scripts/env.sh sets it). */
export function caseLinkSecret(): string {
  const secret = process.env.CASE_LINK_SECRET ?? process.env.RECEIPT_SECRET;
  if (!secret || secret.length < 16)
    throw new Error('CASE_LINK_SECRET or RECEIPT_SECRET must be set (16+ characters)');
  return secret;
}

export function appUrl(): string {
  return process.env.APP_URL ?? 'http://localhost:3000';
}
