import { type NextRequest, NextResponse } from 'next/server';
import { SESSION_COOKIE } from '@/lib/auth/sessionCookieName';

// Only redirects: a visitor without a session cookie goes to the sign-in page.
// Access itself is decided on the server by requireRole in every page,
// action and route handler.
export function proxy(req: NextRequest) {
  if (!req.cookies.get(SESSION_COOKIE)) {
    const url = req.nextUrl.clone();
    url.pathname = '/sign-in';
    url.search = '';
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = {
  matcher: ['/((?!api|_next|sign-in|sign-up|invite|dev|favicon.ico|.*\\.[a-z0-9]+$).*)'],
};
