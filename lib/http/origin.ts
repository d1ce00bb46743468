import 'server-only';
import { env } from '@/lib/env';
import { ApiError } from './api';
import { PEER_HEADER } from './peerHeader';
import { originRefusal } from './sameOrigin';

// Forwarded headers are believed only when TRUST_PROXY_HOPS says the app sits
// behind that many proxies (lib/env.ts); otherwise a client could write any
// address or host there.

/**
 * Refuses (403) a request whose Origin is missing or not this app's. Mutating
 * route handlers and server actions call it first (Next checks a server
 * action's Origin only when the browser sends one). Outside callers send
 * `Origin: <the app's URL>`.
 */
export function assertSameOriginHeaders(headers: Headers) {
  const refusal = originRefusal(headers);
  if (refusal) throw new ApiError(403, 'bad_origin', refusal);
}

export function assertSameOrigin(req: Request) {
  assertSameOriginHeaders(req.headers);
}

/**
 * The client's address for throttling: the socket's peer (set by the server,
 * never by the client: lib/http/peerHeader.ts), or with TRUST_PROXY_HOPS = n the
 * n-th entry from the right of X-Forwarded-For, which the outermost trusted
 * proxy wrote.
 */
export function clientIpFrom(headers: Headers): string | null {
  const hops = env().TRUST_PROXY_HOPS;
  if (hops > 0) {
    const chain = (headers.get('x-forwarded-for') ?? '')
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean);
    const ip = chain[Math.max(0, chain.length - hops)];
    if (ip) return ip.slice(0, 64);
  }
  return headers.get(PEER_HEADER)?.slice(0, 64) || null;
}

export function clientIp(req: Request): string | null {
  return clientIpFrom(req.headers);
}
