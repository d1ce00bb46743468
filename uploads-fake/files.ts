import type { IncomingMessage, ServerResponse } from 'node:http';
import type { FakeContext } from './context';
import { requestOrigin, sendError } from './http';
import { checkSignedUrl } from './signing';

// `/f/<key>` (ufsUrl, url) and `/a/<appId>/<key>` (appUrl, and UTApi
// `generateSignedURL` with UPLOADTHING_UFS_APP_ID_LOCATION=path).
export function fileKeyFromPath(ctx: FakeContext, pathname: string): string | null {
  const f = /^\/f\/([^/]+)$/.exec(pathname);
  if (f) return f[1];
  const a = /^\/a\/([^/]+)\/([^/]+)$/.exec(pathname);
  if (a && a[1] === ctx.token.appId) return a[2];
  return null;
}

function contentDisposition(kind: 'inline' | 'attachment', name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]/g, '_');
  return `${kind}; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(name)}`;
}

export async function serveFile(ctx: FakeContext, req: IncomingMessage, res: ServerResponse, key: string) {
  const meta = await ctx.store.meta(key);
  const bytes = meta ? await ctx.store.bytes(key) : null;
  if (!meta || !bytes) return sendError(res, 404, 'No such file');
  if (meta.acl === 'private') {
    const check = checkSignedUrl(requestOrigin(req), req.url ?? '', ctx.token.apiKey);
    if (!check.ok) return sendError(res, 403, `This file is private: ${check.reason}`);
  }
  res.writeHead(200, {
    'content-type': meta.type,
    'content-length': bytes.length,
    'content-disposition': contentDisposition(meta.contentDisposition, meta.name),
    // Uploaded bytes are someone's file, not a page: never sniff, never run scripts.
    'x-content-type-options': 'nosniff',
    'content-security-policy': "default-src 'none'; sandbox",
    'cache-control': meta.acl === 'private' ? 'private, no-store' : 'public, max-age=31536000, immutable',
    etag: `"${meta.fileHash}"`,
  });
  res.end(req.method === 'HEAD' ? undefined : bytes);
}
