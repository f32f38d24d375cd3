/**
 * Runs before every request (but static files):
 * - refuses a state-changing request whose Origin is not the app's with 403 (lib/same-origin.ts),
 *   before a server action or route sees it — unless it is an API request carrying an API key,
 *   which a browser never adds by itself (lib/api.ts authenticates it by the key alone);
 * - gives every page a fresh CSP nonce (lib/security-headers.ts), and every API answer
 *   `Cache-Control: no-store` (case data must not sit in shared or browser caches);
 * - redirects to sign-in when an app page is opened without a session cookie — a convenience
 *   only: every page, action and route checks the session and role on the server (lib/dal.ts).
 */
import { getSessionCookie } from 'better-auth/cookies';
import { NextResponse, type NextRequest } from 'next/server';
import { hasBearer } from '@/lib/api-keys/bearer';
import { isSameOrigin, SAFE_METHODS } from '@/lib/same-origin';
import { commonSecurityHeaders, contentSecurityPolicy } from '@/lib/security-headers';

const APP_PAGES = ['/portfolio', '/projects', '/review', '/settings', '/welcome', '/api-reference'];

function withCommonHeaders(response: NextResponse): NextResponse {
  for (const [name, value] of Object.entries(commonSecurityHeaders(process.env.APP_URL ?? ''))) response.headers.set(name, value);
  return response;
}

export function proxy(request: NextRequest) {
  const { pathname } = request.nextUrl;
  const isApi = pathname.startsWith('/api/');

  const keyed = pathname.startsWith('/api/v1/') && hasBearer(request.headers);
  if (!SAFE_METHODS.has(request.method) && !keyed && !isSameOrigin(request.headers)) {
    const message = 'This request did not come from a Leeway page (its Origin is missing or foreign).';
    return withCommonHeaders(
      isApi ? NextResponse.json({ error: { code: 'forbidden', message } }, { status: 403 }) : new NextResponse(message, { status: 403 }),
    );
  }

  if (isApi) {
    const response = NextResponse.next();
    response.headers.set('Cache-Control', 'no-store');
    return withCommonHeaders(response);
  }

  if (APP_PAGES.some((p) => pathname === p || pathname.startsWith(`${p}/`)) && !getSessionCookie(request)) {
    const url = new URL('/sign-in', request.url);
    url.searchParams.set('next', pathname);
    return withCommonHeaders(NextResponse.redirect(url));
  }

  const nonce = Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString('base64');
  const csp = contentSecurityPolicy(nonce, { development: process.env.NODE_ENV === 'development' });
  // Next.js reads the nonce from the request's CSP header and puts it on the scripts it writes.
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set('x-nonce', nonce);
  requestHeaders.set('Content-Security-Policy', csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set('Content-Security-Policy', csp);
  return withCommonHeaders(response);
}

export const config = {
  matcher: [
    // Everything but the build's static files and the icon; prefetches get a nonce like any page.
    '/((?!_next/static|_next/image|icon.svg|favicon.ico).*)',
  ],
};
