import type { NextRequest } from 'next/server';
import { createRouteHandler } from 'uploadthing/next';
import { env } from '@/lib/env';
import { withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { photoRouter } from '@/lib/uploads/router';
import { assertUploadsConfigured } from '@/lib/uploads/service';

export const dynamic = 'force-dynamic';

let handler: ReturnType<typeof createRouteHandler> | undefined;

// Built on first use, so it sees the running server's settings rather than the build's.
function sdk() {
  if (!handler) {
    const appUrl = env().APP_URL?.replace(/\/$/, '');
    handler = createRouteHandler({
      router: photoRouter,
      config: { logLevel: 'Warning', ...(appUrl ? { callbackUrl: `${appUrl}/api/uploadthing` } : {}) },
    });
  }
  return handler;
}

// GET: the routes' accepted types and sizes, read by the dropzone.
export const GET = withApi(async (req) => {
  assertUploadsConfigured();
  return sdk().GET(req as NextRequest);
});

// POST: the browser's upload requests (same-origin only), and the service's
// callbacks, which carry `uploadthing-hook` and are checked by the SDK against
// the HMAC in `x-uploadthing-signature` before anything runs.
export const POST = withApi(async (req) => {
  if (!req.headers.get('uploadthing-hook')) assertSameOrigin(req);
  assertUploadsConfigured();
  return sdk().POST(req as NextRequest);
});
