import 'server-only';

/**
 * The address a request came from, as the nearest proxy saw it: the last X-Forwarded-For entry
 * (`next start` adds the socket's address when no proxy did). Deploy behind a proxy that sets it.
 */
export function clientAddress(h: Headers): string {
  const hops = (h.get('x-forwarded-for') ?? '')
    .split(',')
    .map((s) => s.trim())
    .filter(Boolean);
  return hops.at(-1)?.slice(0, 64) ?? 'unknown';
}
