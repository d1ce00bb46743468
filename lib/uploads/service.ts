import 'server-only';
import { UTApi, UTFile } from 'uploadthing/server';
import type { UploadFileResult } from 'uploadthing/types';
import { env } from '@/lib/env';
import { ApiError } from '@/lib/http/api';
import { MAX_PHOTO_BYTES } from './limits';

// The upload service through the UploadThing SDK's UTApi. It reads its settings
// (UPLOADTHING_TOKEN, _API_URL, _INGEST_URL, _UFS_HOST, _UFS_APP_ID_LOCATION)
// itself; locally they point at uploads-fake/.

/**
 * Photos are stored private: the service serves them only on a URL signed by
 * UTApi, and the app fetches them server-side for members of the photo's team
 * (GET /api/photos/:id/image). No service URL is ever handed to a browser to load.
 */
export const PHOTO_ACL = 'private' as const;

const g = globalThis as unknown as { pourproofUtapi?: UTApi };

export function uploadsConfigured(): boolean {
  return Boolean(env().UPLOADTHING_TOKEN);
}

export function assertUploadsConfigured(): void {
  if (!uploadsConfigured()) throw new ApiError(503, 'uploads_unconfigured', 'Photo storage is not set up on this server (UPLOADTHING_TOKEN is missing)');
}

export function utapi(): UTApi {
  assertUploadsConfigured();
  g.pourproofUtapi ??= new UTApi({ logLevel: 'Error' });
  return g.pourproofUtapi;
}

const serviceDown = (what: string) => new ApiError(502, 'upload_service', `The photo storage service ${what}; nothing was saved. Try again in a minute.`);

export async function storeBytes(bytes: Buffer, fileName: string, mime: string): Promise<{ key: string; size: number }> {
  const file = new UTFile([new Uint8Array(bytes)], fileName, { type: mime });
  let result: UploadFileResult;
  try {
    result = await utapi().uploadFiles(file, { acl: PHOTO_ACL });
  } catch (err) {
    if (err instanceof ApiError) throw err;
    console.error('[uploads] uploadFiles threw', err);
    throw serviceDown('could not be reached');
  }
  if (result.error || !result.data) {
    console.error('[uploads] uploadFiles failed', result.error);
    throw serviceDown('refused the file');
  }
  return { key: result.data.key, size: result.data.size };
}

/** Fetches a stored photo through a short-lived signed URL, server-side. */
export async function fetchStored(key: string): Promise<Response> {
  let res: Response;
  try {
    const { ufsUrl } = await utapi().generateSignedURL(key, { expiresIn: 60 });
    res = await fetch(ufsUrl, { cache: 'no-store' });
  } catch (err) {
    if (err instanceof ApiError) throw err;
    console.error('[uploads] fetching a stored photo failed', err);
    throw serviceDown('could not be reached');
  }
  if (res.status === 404) throw new ApiError(404, 'not_found', 'This photo is no longer in storage');
  if (!res.ok) throw serviceDown(`answered ${res.status}`);
  return res;
}

/** The stored bytes, refusing anything over the photo limit while reading. */
export async function fetchStoredBytes(key: string): Promise<Buffer> {
  const res = await fetchStored(key);
  const declared = Number(res.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > MAX_PHOTO_BYTES) {
    await res.body?.cancel();
    throw new ApiError(413, 'too_large', 'The stored file is over the photo size limit');
  }
  const bytes = Buffer.from(await res.arrayBuffer());
  if (bytes.length > MAX_PHOTO_BYTES) throw new ApiError(413, 'too_large', 'The stored file is over the photo size limit');
  return bytes;
}

/** Best effort: a file the app refused or could not record is removed from the service. */
export async function deleteStored(key: string): Promise<void> {
  try {
    await utapi().deleteFiles(key);
  } catch (err) {
    console.error(`[uploads] could not delete ${key} from the service`, err);
  }
}
