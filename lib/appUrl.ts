import { env } from '@/lib/env';

// The app's public base URL for links in e-mail: APP_URL when set, else the
// request's own origin.
export function appUrl(req?: Request): string {
  const configured = env().APP_URL;
  if (configured) return configured.replace(/\/$/, '');
  if (req) {
    const host = req.headers.get('x-forwarded-host') ?? req.headers.get('host');
    const proto = req.headers.get('x-forwarded-proto') ?? 'http';
    if (host) return `${proto.split(',')[0]}://${host}`;
  }
  return `http://localhost:${process.env.PORT ?? 3000}`;
}
