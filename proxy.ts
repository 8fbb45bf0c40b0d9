import { NextResponse, type NextRequest } from 'next/server';
import { SESSION_COOKIE } from '@/lib/auth/session-cookie';

// Cheap redirects only: no session cookie → sign-in page (pages) or 401 (API). The real checks
// sit next to the data (requireUser, route(), formAction()); this never opens the cookie or touches the db.
const PUBLIC_PREFIXES = ['/login', '/verify', '/api/verify', '/api/health', '/case-link/'];

export function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  if (PUBLIC_PREFIXES.some((p) => pathname === p.replace(/\/$/, '') || pathname.startsWith(p)))
    return NextResponse.next();
  if (request.cookies.has(SESSION_COOKIE)) return NextResponse.next();
  if (pathname.startsWith('/api/')) {
    return NextResponse.json({ code: 'unauthenticated', message: 'Sign in first.' }, { status: 401 });
  }
  const url = request.nextUrl.clone();
  url.pathname = '/login';
  url.search = pathname === '/' ? '' : `?next=${encodeURIComponent(pathname + search)}`;
  return NextResponse.redirect(url);
}

export const config = {
  // the service worker scripts (public/sw.js, public/swe-worker-*.js) load before anyone signs in
  matcher: [
    '/((?!_next/static|_next/image|favicon.ico|fonts/|sw\\.js$|swe-worker-.*\\.js$|.*\\.(?:png|svg|jpg|ico|webmanifest)$).*)',
  ],
};
