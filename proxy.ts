import { NextResponse, type NextRequest } from 'next/server';
import { SESSION_COOKIE } from '@/lib/auth/session-cookie';
import { securityHeaders } from '@/lib/security-headers';
import { env } from '@/lib/server/env';

// Cheap redirects only: no session cookie → sign-in page (pages) or 401 (API). The real checks
// sit next to the data (requireUser, route(), formAction()); this never opens the cookie or touches the db.
// Every answer gets the security headers, with a fresh script nonce the pages render with.
const WRITES = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);
const PUBLIC_PREFIXES = ['/login', '/verify', '/api/verify', '/api/health', '/case-link/'];

function uploadOrigin(): string | null {
  const { S3_PUBLIC_ENDPOINT, S3_ENDPOINT } = env();
  const endpoint = S3_PUBLIC_ENDPOINT ?? S3_ENDPOINT;
  return endpoint ? new URL(endpoint).origin : null;
}

/**
 * A form post to a page (no JavaScript, or a stranger) that the framework cannot read as a form.
 * The framework tries to read every multipart or form-encoded POST to a page as a server action and
 * answers a malformed body (e.g. a multipart boundary the body never uses) with a 500; it is the
 * sender's fault, so it gets a 400 here. A well-formed form passes on untouched (the framework
 * hands the proxy a copy of the body). Actions sent by the app's own script carry `Next-Action`.
 */
async function unreadableForm(request: NextRequest): Promise<boolean> {
  if (request.method !== 'POST' || request.headers.has('next-action')) return false;
  const type = request.headers.get('content-type') ?? '';
  if (!/^(multipart\/form-data|application\/x-www-form-urlencoded)\b/i.test(type)) return false;
  try {
    await request.clone().formData();
    return false;
  } catch {
    return true;
  }
}

export async function proxy(request: NextRequest) {
  const nonce = Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString('base64');
  const headers = securityHeaders({
    nonce,
    production: env().NODE_ENV === 'production',
    uploadOrigin: uploadOrigin(),
  });
  const withHeaders = (response: NextResponse) => {
    for (const [k, v] of Object.entries(headers)) response.headers.set(k, v);
    return response;
  };
  // The framework reads the policy from the request to put the nonce on its own script tags.
  const forwarded = new Headers(request.headers);
  forwarded.set('x-nonce', nonce);
  forwarded.set('content-security-policy', headers['content-security-policy']);
  const pass = () => withHeaders(NextResponse.next({ request: { headers: forwarded } }));

  const { pathname, search } = request.nextUrl;
  // The API takes JSON or no body (route() in lib/server/api.ts says the same). Refused here too, so
  // a form-encoded post to an address with no handler (e.g. `/api/x/%2e%2e/y`) never reaches the
  // framework's form parser, which answers a malformed one with a 500 (found by the fuzz suite).
  if (pathname.startsWith('/api/') && WRITES.has(request.method)) {
    const type = request.headers.get('content-type');
    if (type && !/^application\/json\b/i.test(type)) {
      return withHeaders(
        NextResponse.json({ code: 'unsupported_type', message: 'Send the body as JSON.' }, { status: 415 }),
      );
    }
  }
  if (!pathname.startsWith('/api/') && (await unreadableForm(request))) {
    return withHeaders(
      NextResponse.json(
        { code: 'invalid', message: 'The form could not be read. Send it again.' },
        { status: 400 },
      ),
    );
  }
  if (PUBLIC_PREFIXES.some((p) => pathname === p.replace(/\/$/, '') || pathname.startsWith(p))) return pass();
  if (request.cookies.has(SESSION_COOKIE)) return pass();
  if (pathname.startsWith('/api/')) {
    return withHeaders(
      NextResponse.json({ code: 'unauthenticated', message: 'Sign in first.' }, { status: 401 }),
    );
  }
  const url = request.nextUrl.clone();
  url.pathname = '/login';
  url.search = pathname === '/' ? '' : `?next=${encodeURIComponent(pathname + search)}`;
  return withHeaders(NextResponse.redirect(url));
}

export const config = {
  // the service worker scripts (public/sw.js, public/swe-worker-*.js) load before anyone signs in
  matcher: [
    '/((?!_next/static|_next/image|favicon.ico|fonts/|sw\\.js$|swe-worker-.*\\.js$|.*\\.(?:png|svg|jpg|ico|webmanifest)$).*)',
  ],
};
