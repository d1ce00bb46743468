import type { IncomingMessage, ServerResponse } from 'node:http';
import { type FakeContext, fileUrls, requireApiKey } from './context';
import { HttpError, readJson, sendJson } from './http';
import { sanitiseName } from './store';

function stringArray(value: unknown): string[] | undefined {
  return Array.isArray(value) && value.every((v) => typeof v === 'string') ? (value as string[]) : undefined;
}

function selection(body: Record<string, unknown>) {
  const fileKeys = stringArray(body.fileKeys);
  const customIds = stringArray(body.customIds);
  if (!fileKeys && !customIds) throw new HttpError(400, 'Give fileKeys or customIds');
  return fileKeys ? { fileKeys } : { customIds };
}

type Endpoint = (ctx: FakeContext, body: Record<string, unknown>) => Promise<unknown>;

// The UTApi calls that Pourproof may use, answered in the shapes UTApi decodes
// (uploadthing 7.7.4, server/index.js: the S.Class response schemas per method).
const endpoints: Record<string, Endpoint> = {
  '/v6/deleteFiles': async (ctx, body) => {
    const keys = await ctx.store.keysFor(selection(body));
    let deletedCount = 0;
    for (const key of keys) if (await ctx.store.remove(key)) deletedCount += 1;
    return { success: true, deletedCount };
  },
  '/v6/getFileUrl': async (ctx, body) => {
    const keys = await ctx.store.keysFor(selection(body));
    const data = [];
    for (const key of keys) if (await ctx.store.meta(key)) data.push({ key, url: fileUrls(ctx, key).ufsUrl });
    return { data };
  },
  '/v6/listFiles': async (ctx, body) => {
    const limit = typeof body.limit === 'number' && body.limit > 0 ? Math.floor(body.limit) : 500;
    const offset = typeof body.offset === 'number' && body.offset > 0 ? Math.floor(body.offset) : 0;
    const all = await ctx.store.list();
    const page = all.slice(offset, offset + limit).map((f) => ({
      id: f.key,
      customId: f.customId,
      key: f.key,
      name: f.name,
      size: f.size,
      status: 'Uploaded' as const,
      uploadedAt: f.uploadedAt,
    }));
    return { hasMore: offset + limit < all.length, files: page };
  },
  '/v6/renameFiles': async (ctx, body) => {
    const updates = Array.isArray(body.updates) ? (body.updates as Record<string, unknown>[]) : [];
    for (const u of updates) {
      if (typeof u?.newName !== 'string') throw new HttpError(400, 'Each update needs newName');
      const ids = typeof u.fileKey === 'string' ? { fileKeys: [u.fileKey] } : { customIds: [String(u.customId)] };
      for (const key of await ctx.store.keysFor(ids)) await ctx.store.update(key, { name: sanitiseName(u.newName) });
    }
    return { success: true };
  },
  '/v6/getUsageInfo': async (ctx) => {
    const files = await ctx.store.list();
    const totalBytes = files.reduce((sum, f) => sum + f.size, 0);
    return { totalBytes, appTotalBytes: totalBytes, filesUploaded: files.length, limitBytes: 2 * 1024 ** 3 };
  },
};

export function isApiPath(pathname: string): boolean {
  return pathname.startsWith('/v6/') || pathname.startsWith('/v7/');
}

export async function handleApi(ctx: FakeContext, req: IncomingMessage, res: ServerResponse, pathname: string) {
  requireApiKey(ctx, req);
  const endpoint = endpoints[pathname];
  if (!endpoint || req.method !== 'POST') {
    throw new HttpError(501, `${req.method} ${pathname} is not implemented by the local stand-in`);
  }
  sendJson(res, 200, await endpoint(ctx, await readJson(req)));
}
