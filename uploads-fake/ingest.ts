import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RouteRegistration } from './callbacks';
import { type FakeContext, fileUrls, requireApiKey, uploadedFileData } from './context';
import { HttpError, readBody, readJson, requestOrigin, sendError, sendJson } from './http';
import { checkSignedUrl, readDataParam } from './signing';
import { isSafeKey, sanitiseName } from './store';

// Room for the multipart boundary and part headers around the file bytes.
const MULTIPART_SLACK = 64 * 1024;

async function readFilePart(req: IncomingMessage, limit: number): Promise<Buffer> {
  const contentType = req.headers['content-type'] ?? '';
  if (!contentType.startsWith('multipart/form-data')) {
    throw new HttpError(400, 'Expected multipart/form-data with a "file" part');
  }
  const body = await readBody(req, limit);
  const form = await new Response(new Uint8Array(body), { headers: { 'content-type': contentType } }).formData().catch(() => {
    throw new HttpError(400, 'Malformed multipart body');
  });
  const part = form.get('file');
  if (!part || typeof part === 'string') throw new HttpError(400, 'Missing "file" part');
  return Buffer.from(await part.arrayBuffer());
}

// HEAD and PUT on the presigned URL `${ingestUrl}/${key}?expires&x-ut-…&signature`
// that the SDK signs itself (route handler `handleUploadAction`, UTApi
// `generatePresignedUrl`). The browser client HEADs first and resumes from
// `x-ut-range-start` (uploadthing/client `uploadFile`), then PUTs FormData.
export async function handlePresigned(ctx: FakeContext, req: IncomingMessage, res: ServerResponse, key: string) {
  const check = checkSignedUrl(requestOrigin(req), req.url ?? '', ctx.token.apiKey);
  if (!check.ok) return sendError(res, 403, `Presigned URL refused: ${check.reason}`);
  const params = check.params;
  if (readDataParam(params, 'x-ut-identifier') !== ctx.token.appId) return sendError(res, 403, 'Wrong app');

  // Partial uploads are not kept, so every upload (re)starts at byte 0.
  if (req.method === 'HEAD') {
    res.writeHead(200, { 'x-ut-range-start': '0' });
    return void res.end();
  }
  if (await ctx.store.meta(key)) return sendError(res, 409, 'This key has already been uploaded');
  const range = req.headers.range;
  if (range && !/^bytes=0-$/.test(range)) return sendError(res, 416, 'Only uploads from byte 0 are accepted');

  const declaredSize = Number(readDataParam(params, 'x-ut-file-size'));
  if (!Number.isInteger(declaredSize) || declaredSize < 0) return sendError(res, 400, 'Missing file size');
  if (declaredSize > ctx.maxBytes) return sendError(res, 413, `Files over ${ctx.maxBytes} bytes are refused`);

  const slug = readDataParam(params, 'x-ut-slug');
  const reg = slug ? await ctx.hub.waitForRoute(key, ctx.metadataWaitMs) : null;
  if (slug && !reg) return sendError(res, 409, 'The app registered no upload for this key');

  const bytes = await readFilePart(req, declaredSize + MULTIPART_SLACK);
  if (bytes.length !== declaredSize) return sendError(res, 400, 'File size differs from the signed size');

  const acl = readDataParam(params, 'x-ut-acl') === 'private' ? 'private' : 'public-read';
  const disposition = readDataParam(params, 'x-ut-content-disposition') === 'attachment' ? 'attachment' : 'inline';
  const stored = await ctx.store.save(
    {
      key,
      name: sanitiseName(readDataParam(params, 'x-ut-file-name')),
      type: readDataParam(params, 'x-ut-file-type') || 'application/octet-stream',
      customId: readDataParam(params, 'x-ut-custom-id') ?? null,
      acl,
      contentDisposition: disposition,
    },
    bytes,
  );
  const answer = { ...fileUrls(ctx, key), fileHash: stored.fileHash };
  if (!reg) return sendJson(res, 200, answer);
  return finishRouteUpload(ctx, res, key, reg, { answer, file: uploadedFileData(ctx, stored) });
}

// A route upload tells the app (callback hook), then — unless the route set
// `awaitServerData: false` — waits for `onUploadComplete`'s return value to come
// back via `/callback-result` and hands it to the browser as `serverData`.
async function finishRouteUpload(
  ctx: FakeContext,
  res: ServerResponse,
  key: string,
  reg: RouteRegistration,
  done: { answer: Record<string, unknown>; file: Record<string, unknown> },
) {
  const result = ctx.hub.awaitResult(key, ctx.callbackTimeoutMs);
  try {
    await ctx.hub.deliver(key, reg, done.file, ctx.publicUrl);
  } catch (err) {
    ctx.hub.forget(key);
    await ctx.store.remove(key);
    return sendError(res, 502, `Could not reach the app's upload callback: ${(err as Error).message}`);
  }
  if (!reg.awaitServerData) return sendJson(res, 200, { ...done.answer, serverData: null });
  const outcome = await result;
  if ('error' in outcome) {
    await ctx.store.remove(key);
    return sendError(res, 502, outcome.error);
  }
  return sendJson(res, 200, { ...done.answer, serverData: outcome.callbackData });
}

export async function handleRouteMetadata(ctx: FakeContext, req: IncomingMessage, res: ServerResponse) {
  requireApiKey(ctx, req);
  const body = await readJson(req);
  const { fileKeys, callbackUrl, callbackSlug } = body;
  if (!Array.isArray(fileKeys) || fileKeys.length === 0 || !fileKeys.every((k) => typeof k === 'string' && isSafeKey(k))) {
    throw new HttpError(400, 'fileKeys must be a non-empty array of file keys');
  }
  if (typeof callbackUrl !== 'string' || !/^https?:\/\//.test(callbackUrl) || typeof callbackSlug !== 'string') {
    throw new HttpError(400, 'callbackUrl (http or https) and callbackSlug are required');
  }
  const reg: RouteRegistration = {
    metadata: body.metadata ?? {},
    isDev: body.isDev === true,
    callbackUrl,
    callbackSlug,
    awaitServerData: body.awaitServerData !== false,
  };
  if (reg.isDev) {
    reg.devStream = ctx.hub.openDevStream(res, fileKeys as string[], ctx.devStreamTimeoutMs);
    return ctx.hub.register(fileKeys as string[], reg);
  }
  ctx.hub.register(fileKeys as string[], reg);
  sendJson(res, 200, { ok: true });
}

export async function handleCallbackResult(ctx: FakeContext, req: IncomingMessage, res: ServerResponse) {
  requireApiKey(ctx, req);
  const body = await readJson(req, 1024 * 1024);
  if (typeof body.fileKey !== 'string') throw new HttpError(400, 'fileKey is required');
  // The dev-stream path reports a failed forward as `{ fileKey, error }`.
  if (typeof body.error === 'string') ctx.hub.settle(body.fileKey, { error: body.error });
  else ctx.hub.settle(body.fileKey, { callbackData: body.callbackData ?? null });
  sendJson(res, 200, { ok: true });
}
