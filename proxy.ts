import { type NextRequest, NextResponse } from 'next/server';
import { SESSION_COOKIE } from '@/lib/auth/sessionCookieName';
import { originRefusal } from '@/lib/http/sameOrigin';

const PUBLIC = /^\/(sign-in|sign-up|invite)(\/|$)/;

// Two things only, before any page or action runs:
// - a POST to a page (a server action) from a missing or foreign Origin is
//   refused with 403 in the API's error shape (Next's own check answers a
//   foreign one with 500 and lets a missing one through); route handlers under
//   /api check the Origin themselves;
// - a visitor without a session cookie goes to the sign-in page.
// Access itself is decided on the server by requireRole in every page, action
// and route handler.
export function proxy(req: NextRequest) {
  const { pathname } = req.nextUrl;
  if (req.method !== 'GET' && req.method !== 'HEAD') {
    const refusal = originRefusal(req.headers);
    if (refusal) return NextResponse.json({ error: { code: 'bad_origin', message: refusal } }, { status: 403 });
  }
  if (!PUBLIC.test(pathname) && !pathname.startsWith('/dev/') && !req.cookies.get(SESSION_COOKIE)) {
    const url = req.nextUrl.clone();
    url.pathname = '/sign-in';
    url.search = '';
    return NextResponse.redirect(url);
  }
  return NextResponse.next();
}

export const config = {
  matcher: ['/((?!api/|_next/|favicon.ico|.*\\.[a-z0-9]+$).*)'],
};
