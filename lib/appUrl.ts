import 'server-only';
import { env } from '@/lib/env';

// The app's public base URL for links in e-mail: APP_URL when set, else the
// request's own origin.
export function appUrl(req?: Request): string {
  const configured = env().APP_URL;
  if (configured) return configured.replace(/\/$/, '');
  if (req) {
    // Forwarded headers only from a trusted proxy (TRUST_PROXY_HOPS); else a
    // client could point e-mailed links at a host of its choosing.
    const trusted = env().TRUST_PROXY_HOPS > 0;
    const host = (trusted ? req.headers.get('x-forwarded-host') : null) ?? req.headers.get('host');
    const proto = (trusted ? req.headers.get('x-forwarded-proto') : null) ?? 'http';
    if (host) return `${proto.split(',')[0]}://${host}`;
  }
  return `http://localhost:${process.env.PORT ?? 3000}`;
}
