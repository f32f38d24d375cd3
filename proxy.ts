/**
 * Redirects to sign-in when the session cookie is missing — a convenience only. It is not the
 * guard: every page, action and route checks the session and role on the server (lib/dal.ts).
 */
import { getSessionCookie } from 'better-auth/cookies';
import { NextResponse, type NextRequest } from 'next/server';

export function proxy(request: NextRequest) {
  if (getSessionCookie(request)) return NextResponse.next();
  const url = new URL('/sign-in', request.url);
  url.searchParams.set('next', request.nextUrl.pathname);
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ['/portfolio/:path*', '/projects/:path*', '/review/:path*', '/settings/:path*', '/welcome'],
};
