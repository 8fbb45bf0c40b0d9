import { NextResponse, type NextRequest } from 'next/server';
import { SESSION_COOKIE } from '@/lib/auth/session-cookie';
import { securityHeaders } from '@/lib/security-headers';
import { env } from '@/lib/server/env';

// Cheap redirects only: no session cookie → sign-in page (pages) or 401 (API). The real checks
// sit next to the data (requireUser, route(), formAction()); this never opens the cookie or touches the db.
// Every answer gets the security headers, with a fresh script nonce the pages render with.
const PUBLIC_PREFIXES = ['/login', '/verify', '/api/verify', '/api/health', '/case-link/'];

function uploadOrigin(): string | null {
  const { S3_PUBLIC_ENDPOINT, S3_ENDPOINT } = env();
  const endpoint = S3_PUBLIC_ENDPOINT ?? S3_ENDPOINT;
  return endpoint ? new URL(endpoint).origin : null;
}

export function proxy(request: NextRequest) {
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
  matcher: ['/((?!_next/static|_next/image|favicon.ico|fonts/|.*\\.(?:png|svg|jpg|ico|webmanifest)$).*)'],
};
