// LOCAL-ONLY credentials for the uploads stand-in. This key is public on purpose:
// it signs URLs for a server on this machine and is worthless anywhere else.
// Never put a hosted-service token here, and never use this one against the hosted service.

export const LOCAL_UPLOADS_API_KEY = 'sk_local_pourproof_not_a_secret';
export const LOCAL_UPLOADS_APP_ID = 'pourproof-local';
export const LOCAL_UPLOADS_REGION = 'local';
export const DEFAULT_UPLOADS_FAKE_URL = 'http://127.0.0.1:3101';

export type UploadsToken = { apiKey: string; appId: string; regions: string[] };

// The SDK reads UPLOADTHING_TOKEN as base64 of this JSON (uploadthing 7.7.4,
// dist/shared-schemas: `UploadThingToken`, apiKey must start with "sk_").
export function buildUploadsToken(fields: Partial<UploadsToken> = {}): string {
  const token: UploadsToken = {
    apiKey: fields.apiKey ?? LOCAL_UPLOADS_API_KEY,
    appId: fields.appId ?? LOCAL_UPLOADS_APP_ID,
    regions: fields.regions ?? [LOCAL_UPLOADS_REGION],
  };
  return Buffer.from(JSON.stringify(token), 'utf8').toString('base64');
}

export const LOCAL_UPLOADS_TOKEN = buildUploadsToken();

export function parseUploadsToken(token: string): UploadsToken {
  let data: unknown;
  try {
    data = JSON.parse(Buffer.from(token, 'base64').toString('utf8'));
  } catch {
    throw new Error('Uploads token is not base64-encoded JSON');
  }
  const t = data as Partial<UploadsToken> | null;
  if (
    !t ||
    typeof t.apiKey !== 'string' ||
    !t.apiKey.startsWith('sk_') ||
    typeof t.appId !== 'string' ||
    !Array.isArray(t.regions) ||
    t.regions.length === 0
  ) {
    throw new Error('Uploads token must be { apiKey: "sk_...", appId, regions: [..] }');
  }
  return { apiKey: t.apiKey, appId: t.appId, regions: t.regions.map(String) };
}

// Environment the app (and any process using the real SDK) needs to talk to the
// stand-in at `baseUrl`. Names are the SDK's config keys, constant-cased under the
// UPLOADTHING_ prefix (uploadthing 7.7.4, dist/upload-builder: `envProvider`).
export function uploadsFakeEnv(baseUrl: string = DEFAULT_UPLOADS_FAKE_URL): Record<string, string> {
  const url = new URL(baseUrl);
  return {
    UPLOADTHING_TOKEN: LOCAL_UPLOADS_TOKEN,
    UPLOADTHING_INGEST_URL: url.origin,
    UPLOADTHING_API_URL: url.origin,
    // Only used by UTApi.generateSignedURL: the SDK picks http when the host contains
    // "local", and "path" puts the app id in the path instead of a subdomain.
    UPLOADTHING_UFS_HOST: `localhost:${url.port || '80'}`,
    UPLOADTHING_UFS_APP_ID_LOCATION: 'path',
  };
}
