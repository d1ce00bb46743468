// Local stand-in for the hosted upload service, speaking the protocol of the
// installed `uploadthing` 7.7.4 SDK. Runnable: `npx tsx uploads-fake/server.ts`.
// Point the SDK at it with the variables from `uploadsFakeEnv()` in ./token.ts.
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { handleApi, isApiPath } from './api';
import { CallbackHub } from './callbacks';
import type { FakeContext } from './context';
import { fileKeyFromPath, serveFile } from './files';
import { applyCors, HttpError, logRequests, sendError } from './http';
import { handleCallbackResult, handlePresigned, handleRouteMetadata } from './ingest';
import { FileStore, isSafeKey } from './store';
import { LOCAL_UPLOADS_TOKEN, parseUploadsToken } from './token';

export type UploadsFakeOptions = {
  port?: number;
  host?: string;
  dataDir?: string;
  // Base64 token, as in UPLOADTHING_TOKEN; defaults to the local-only token.
  token?: string;
  // Origin the app and browser use to reach this server; defaults to http://<host>:<port>.
  publicUrl?: string;
  maxBytes?: number;
  metadataWaitMs?: number;
  callbackTimeoutMs?: number;
  devStreamTimeoutMs?: number;
  log?: (line: string) => void;
};

export type UploadsFake = { url: string; dataDir: string; close(): Promise<void> };

async function route(ctx: FakeContext, req: IncomingMessage, res: ServerResponse): Promise<void> {
  const { pathname } = new URL(req.url ?? '/', 'http://fake.invalid');
  const method = req.method ?? 'GET';
  if (method === 'OPTIONS') {
    res.writeHead(204);
    return void res.end();
  }
  if (method === 'POST' && pathname === '/route-metadata') return handleRouteMetadata(ctx, req, res);
  if (method === 'POST' && pathname === '/callback-result') return handleCallbackResult(ctx, req, res);
  if (isApiPath(pathname)) return handleApi(ctx, req, res, pathname);
  const fileKey = fileKeyFromPath(ctx, pathname);
  if (fileKey && (method === 'GET' || method === 'HEAD')) return serveFile(ctx, req, res, fileKey);
  const uploadKey = pathname.slice(1);
  if (isSafeKey(uploadKey) && (method === 'PUT' || method === 'HEAD')) return handlePresigned(ctx, req, res, uploadKey);
  sendError(res, 404, `Nothing at ${method} ${pathname}`);
}

export async function startUploadsFake(options: UploadsFakeOptions = {}): Promise<UploadsFake> {
  const host = options.host ?? '127.0.0.1';
  const dataDir = path.resolve(options.dataDir ?? './data/uploads');
  const token = parseUploadsToken(options.token ?? LOCAL_UPLOADS_TOKEN);
  const store = new FileStore(dataDir);
  await store.init();
  const log = options.log ?? ((line: string) => console.log(line));

  const ctx: FakeContext = {
    token,
    store,
    hub: new CallbackHub(token.apiKey),
    publicUrl: '',
    maxBytes: options.maxBytes ?? 64 * 1024 * 1024,
    metadataWaitMs: options.metadataWaitMs ?? 5_000,
    callbackTimeoutMs: options.callbackTimeoutMs ?? 30_000,
    devStreamTimeoutMs: options.devStreamTimeoutMs ?? 10 * 60_000,
  };

  const server = createServer((req, res) => {
    logRequests(req, res, log);
    applyCors(req, res);
    route(ctx, req, res).catch((err: unknown) => {
      if (err instanceof HttpError) return sendError(res, err.status, err.message);
      log(`[uploads-fake] error: ${(err as Error).stack ?? String(err)}`);
      sendError(res, 500, 'The uploads stand-in failed; see its log');
    });
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 3101, host, () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  ctx.publicUrl = (options.publicUrl ?? `http://${host}:${port}`).replace(/\/$/, '');

  return {
    url: ctx.publicUrl,
    dataDir,
    close: () =>
      new Promise<void>((resolve, reject) => {
        ctx.hub.closeAll();
        server.close((err) => (err ? reject(err) : resolve()));
        server.closeAllConnections();
      }),
  };
}

const isMain = process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href;

if (isMain) {
  startUploadsFake({
    port: Number(process.env.UPLOADS_FAKE_PORT ?? process.env.PORT ?? 3101),
    dataDir: process.env.UPLOADS_FAKE_DATA_DIR,
    token: process.env.UPLOADTHING_TOKEN,
    publicUrl: process.env.UPLOADS_FAKE_PUBLIC_URL,
  })
    .then((fake) => {
      console.log(`[uploads-fake] listening on ${fake.url}, files in ${fake.dataDir}`);
      const stop = () => void fake.close().then(() => process.exit(0));
      process.on('SIGINT', stop);
      process.on('SIGTERM', stop);
    })
    .catch((err: unknown) => {
      console.error('[uploads-fake] could not start:', err);
      process.exit(1);
    });
}
