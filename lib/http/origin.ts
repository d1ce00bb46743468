import 'server-only';
import { env } from '@/lib/env';
import { ApiError } from './api';

// Mutating route handlers accept only requests whose Origin is this app
// (Next checks server actions itself, not route handlers). A missing Origin
// is refused too: outside callers send `Origin: <the app's URL>`.
export function assertSameOrigin(req: Request) {
  const origin = req.headers.get('origin');
  if (!origin) throw new ApiError(403, 'bad_origin', 'Missing Origin header; send Origin: <this app\'s URL>');
  const allowed = new Set<string>();
  const host = req.headers.get('x-forwarded-host') ?? req.headers.get('host');
  if (host) {
    allowed.add(`http://${host}`);
    allowed.add(`https://${host}`);
  }
  const configured = env().APP_URL;
  if (configured) allowed.add(new URL(configured).origin);
  if (!allowed.has(origin)) throw new ApiError(403, 'bad_origin', `Requests from ${origin.slice(0, 100)} are not accepted`);
}

// The client address for throttling: the first hop of X-Forwarded-For, which
// Next's server fills from the socket when no proxy set it.
export function clientIp(req: Request): string | null {
  const xff = req.headers.get('x-forwarded-for');
  if (xff) return xff.split(',')[0]!.trim().slice(0, 64) || null;
  return req.headers.get('x-real-ip');
}
