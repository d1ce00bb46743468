import { env } from '@/lib/env';

// The Origin rule of every mutating request, free of Next's server-only
// modules so proxy.ts can use it too. X-Forwarded-Host is believed only
// behind a trusted proxy (TRUST_PROXY_HOPS > 0); the configured APP_URL always
// counts as our own origin.

/** Why a request's Origin is refused, or null when it is this app's. */
export function originRefusal(headers: Headers): string | null {
  const origin = headers.get('origin');
  if (!origin) return "Missing Origin header; send Origin: <this app's URL>";
  const allowed = new Set<string>();
  const host = (env().TRUST_PROXY_HOPS > 0 ? headers.get('x-forwarded-host')?.split(',')[0]?.trim() : null) || headers.get('host');
  if (host) {
    allowed.add(`http://${host}`);
    allowed.add(`https://${host}`);
  }
  const configured = env().APP_URL;
  if (configured) allowed.add(new URL(configured).origin);
  return allowed.has(origin) ? null : `Requests from ${origin.slice(0, 100)} are not accepted`;
}
