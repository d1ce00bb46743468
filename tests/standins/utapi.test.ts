import { readdir } from 'node:fs/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UTApi, UTFile } from 'uploadthing/server';
import { buildUploadsToken, LOCAL_UPLOADS_TOKEN } from '../../uploads-fake/token';
import { md5, TINY_PNG } from './helpers/png';
import { startFakeForTest } from './helpers/uploads';

// The real server SDK (uploadthing 7.7.4 UTApi), pointed at the stand-in through
// its documented options `token`, `ingestUrl`, `apiUrl`.
describe('UTApi against the uploads stand-in', () => {
  let env: Awaited<ReturnType<typeof startFakeForTest>>;
  let utapi: UTApi;

  beforeAll(async () => {
    env = await startFakeForTest();
    utapi = new UTApi({ token: LOCAL_UPLOADS_TOKEN, ingestUrl: env.fake.url, apiUrl: env.fake.url, logLevel: 'Error' });
  });
  afterAll(() => env.stop());

  it('uploads a PNG whose bytes come back from the file URL, lists it, then deletes it', async () => {
    const result = await utapi.uploadFiles(new UTFile([new Uint8Array(TINY_PNG)], 'swatch.png'));
    expect(result.error).toBeNull();
    const file = result.data!;
    expect(file.ufsUrl).toBe(`${env.fake.url}/f/${file.key}`);
    expect(file.fileHash).toBe(md5(TINY_PNG));
    expect(file.size).toBe(TINY_PNG.length);

    const served = await fetch(file.ufsUrl);
    expect(served.status).toBe(200);
    expect(served.headers.get('content-type')).toBe('image/png');
    expect(served.headers.get('access-control-allow-origin')).toBe('*');
    expect(Buffer.from(await served.arrayBuffer()).equals(TINY_PNG)).toBe(true);

    const listed = await utapi.listFiles();
    expect(listed.files.map((f) => f.key)).toContain(file.key);
    const urls = await utapi.getFileUrls(file.key);
    expect(urls.data).toEqual([{ key: file.key, url: file.ufsUrl }]);

    const deleted = await utapi.deleteFiles(file.key);
    expect(deleted).toMatchObject({ success: true, deletedCount: 1 });
    expect((await fetch(file.ufsUrl)).status).toBe(404);
    expect(await readdir(env.dataDir)).toEqual([]);
  });

  it('stores under the generated key, never a client-supplied path', async () => {
    const result = await utapi.uploadFiles(new UTFile([new Uint8Array(TINY_PNG)], '../../escape\n".png'));
    const file = result.data!;
    expect((await env.storedNames()).sort()).toEqual([`${file.key}.bin`, `${file.key}.json`]);
    const served = await fetch(file.ufsUrl);
    expect(served.headers.get('content-disposition')).toContain('filename=".._.._escape__.png"');
    await utapi.deleteFiles(file.key);
  });

  it('deletes by custom id', async () => {
    const result = await utapi.uploadFiles(new UTFile([new Uint8Array(TINY_PNG)], 'a.png', { customId: 'swatch-7' }));
    expect(result.data!.customId).toBe('swatch-7');
    const deleted = await utapi.deleteFiles('swatch-7', { keyType: 'customId' });
    expect(deleted.deletedCount).toBe(1);
  });

  it('serves a private file only through a URL signed by UTApi.generateSignedURL', async () => {
    const port = new URL(env.fake.url).port;
    // The SDK builds http:// only when the host contains "local" (generateSignedURL).
    const signer = new UTApi({
      token: LOCAL_UPLOADS_TOKEN,
      ingestUrl: env.fake.url,
      apiUrl: env.fake.url,
      ufsHost: `localhost:${port}`,
      ufsAppIdLocation: 'path',
      logLevel: 'Error',
    });
    const result = await signer.uploadFiles(new UTFile([new Uint8Array(TINY_PNG)], 'p.png'), { acl: 'private' });
    const key = result.data!.key;
    expect((await fetch(result.data!.ufsUrl)).status).toBe(403);
    const { ufsUrl } = await signer.generateSignedURL(key, { expiresIn: 60 });
    expect(ufsUrl.startsWith(`http://localhost:${port}/a/pourproof-local/${key}?`)).toBe(true);
    const served = await fetch(ufsUrl);
    expect(served.status).toBe(200);
    expect(Buffer.from(await served.arrayBuffer()).equals(TINY_PNG)).toBe(true);
    await signer.deleteFiles(key);
  });

  it('refuses API calls made with another API key', async () => {
    const stranger = new UTApi({
      token: buildUploadsToken({ apiKey: 'sk_local_someone_else' }),
      apiUrl: env.fake.url,
      logLevel: 'None',
    });
    await expect(stranger.listFiles()).rejects.toThrow();
    const raw = await fetch(`${env.fake.url}/v6/deleteFiles`, { method: 'POST', body: '{"fileKeys":[]}' });
    expect(raw.status).toBe(401);
  });

  it('logs each request on one line without its query string', () => {
    expect(env.log.some((l) => /^\[uploads-fake\] PUT \/[A-Za-z0-9]+ 200 \d+ms$/.test(l))).toBe(true);
    expect(env.log.every((l) => !l.includes('signature'))).toBe(true);
  });
});
