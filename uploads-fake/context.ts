import type { IncomingMessage } from 'node:http';
import type { CallbackHub } from './callbacks';
import { HttpError } from './http';
import { safeEqual } from './signing';
import type { FileStore, StoredFile } from './store';
import type { UploadsToken } from './token';

export type FakeContext = {
  token: UploadsToken;
  store: FileStore;
  hub: CallbackHub;
  // Origin the app and browser reach this server at: the ingest URL, the API URL,
  // the `origin` the app posts callback results to, and the base of file URLs.
  publicUrl: string;
  maxBytes: number;
  metadataWaitMs: number;
  callbackTimeoutMs: number;
  devStreamTimeoutMs: number;
};

// The hosted service hands out `https://<appId>.ufs.sh/f/<key>` (ufsUrl) and the
// older `https://utfs.io/f/<key>` / `/a/<appId>/<key>` forms; here all point home.
export function fileUrls(ctx: FakeContext, key: string) {
  return {
    url: `${ctx.publicUrl}/f/${key}`,
    appUrl: `${ctx.publicUrl}/a/${ctx.token.appId}/${key}`,
    ufsUrl: `${ctx.publicUrl}/f/${key}`,
  };
}

// `UploadedFileData` as the SDK's route handler decodes it in the callback.
export function uploadedFileData(ctx: FakeContext, file: StoredFile) {
  return {
    name: file.name,
    size: file.size,
    type: file.type,
    customId: file.customId,
    key: file.key,
    ...fileUrls(ctx, file.key),
    fileHash: file.fileHash,
  };
}

// Server-to-server calls carry the raw API key in `x-uploadthing-api-key`
// (UTApi `requestUploadThing`, route handler `/route-metadata`, `/callback-result`).
export function requireApiKey(ctx: FakeContext, req: IncomingMessage): void {
  const given = req.headers['x-uploadthing-api-key'];
  if (typeof given !== 'string' || !safeEqual(given, ctx.token.apiKey)) {
    throw new HttpError(401, 'Missing or wrong x-uploadthing-api-key');
  }
}
