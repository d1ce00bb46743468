import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signPayload } from '../../uploads-fake/signing';
import { LOCAL_UPLOADS_API_KEY } from '../../uploads-fake/token';
import { startPhotoApp } from './helpers/photo-router';
import { TINY_PNG } from './helpers/png';
import { startFakeForTest } from './helpers/uploads';

type Presigned = { url: string; key: string };

// The browser's requests, made by hand so they can be altered: the upload
// action on the app's route handler (as uploadthing/client's ut-reporter sends
// it), then the HEAD and PUT on the presigned URL the SDK signed.
describe('signed URLs and signed callbacks', () => {
  let env: Awaited<ReturnType<typeof startFakeForTest>>;
  let photoApp: Awaited<ReturnType<typeof startPhotoApp>>;

  beforeAll(async () => {
    env = await startFakeForTest();
    photoApp = await startPhotoApp(env.fake.url, false);
  });
  afterAll(async () => {
    await photoApp.app.close();
    await env.stop();
  });

  async function presign(slug: string): Promise<Presigned> {
    const res = await fetch(`${photoApp.endpoint}?actionType=upload&slug=${slug}`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-uploadthing-package': 'pourproof-tests' },
      body: JSON.stringify({
        files: [{ name: 'swatch.png', size: TINY_PNG.length, type: 'image/png', lastModified: Date.now() }],
        input: null,
      }),
    });
    expect(res.status).toBe(200);
    const [presigned] = (await res.json()) as Presigned[];
    return presigned;
  }

  function put(url: string, bytes: Buffer = TINY_PNG, range = 'bytes=0-') {
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(bytes)], { type: 'image/png' }), 'swatch.png');
    return fetch(url, { method: 'PUT', body: form, headers: { range } });
  }

  it('refuses altered URLs with 403, stores nothing, then accepts the genuine one', async () => {
    const { url, key } = await presign('photo');
    const badSignature = url.slice(0, -1) + (url.endsWith('0') ? '1' : '0');
    const biggerSize = url.replace(`x-ut-file-size=${TINY_PNG.length}`, 'x-ut-file-size=999999');
    const otherKey = url.replace(`/${key}?`, `/${key.slice(0, -1)}${key.endsWith('A') ? 'B' : 'A'}?`);
    expect(biggerSize).not.toBe(url);

    for (const altered of [badSignature, biggerSize, otherKey]) {
      expect((await put(altered)).status).toBe(403);
      expect((await fetch(altered, { method: 'HEAD' })).status).toBe(403);
    }
    expect((await put(url.split('&signature=')[0])).status).toBe(403);
    expect(await env.storedNames()).toEqual([]);
    expect((await fetch(`${env.fake.url}/f/${key}`)).status).toBe(404);

    const head = await fetch(url, { method: 'HEAD' });
    expect(head.status).toBe(200);
    expect(head.headers.get('x-ut-range-start')).toBe('0');
    expect((await put(url, TINY_PNG, 'bytes=10-')).status).toBe(416);
    expect((await put(url, Buffer.concat([TINY_PNG, TINY_PNG]))).status).toBe(400);
    expect(await env.storedNames()).toEqual([]);
    expect(photoApp.completed).toEqual([]);

    const ok = await put(url);
    expect(ok.status).toBe(200);
    expect(((await ok.json()) as { serverData: unknown }).serverData).toEqual({ photoId: 'photo-1', key });
    expect((await put(url)).status).toBe(409);
  });

  it('refuses an expired URL with 403 and stores nothing', async () => {
    // The `quick` route signs its URLs for one second (presignedURLTTL: 1).
    const { url, key } = await presign('quick');
    await new Promise((r) => setTimeout(r, 1_200));
    const res = await put(url);
    expect(res.status).toBe(403);
    expect(await res.json()).toEqual({ error: 'Presigned URL refused: expired' });
    expect(await env.storedNames()).not.toContain(`${key}.bin`);
  });

  // The SDK's route handler verifies `x-uploadthing-signature` itself
  // (handleCallbackRequest → verifySignature); the stand-in's signer must agree.
  it("is the SDK's callback signature scheme: the handler accepts ours and refuses tampering", async () => {
    const before = photoApp.completed.length;
    const file = {
      name: 'swatch.png', size: 70, type: 'image/png', customId: null, key: 'cP4dlbNCfXuJTestKey0000000000000001',
      url: 'u', appUrl: 'a', ufsUrl: 'f', fileHash: 'h',
    };
    const body = JSON.stringify({ status: 'uploaded', file, origin: env.fake.url, metadata: { teamId: 'team-9' } });
    const send = (payload: string, signature: string) =>
      fetch(`${photoApp.endpoint}?slug=photo`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'uploadthing-hook': 'callback', 'x-uploadthing-signature': signature },
        body: payload,
      });

    const tampered = body.replace('team-9', 'team-1');
    expect((await send(tampered, signPayload(body, LOCAL_UPLOADS_API_KEY))).status).toBe(400);
    expect((await send(body, signPayload(body, 'sk_local_someone_else'))).status).toBe(400);
    expect((await send(body, 'hmac-sha256=00')).status).toBe(400);
    expect(photoApp.completed.length).toBe(before);

    expect((await send(body, signPayload(body, LOCAL_UPLOADS_API_KEY))).status).toBe(200);
    expect(photoApp.completed.length).toBe(before + 1);
    expect(photoApp.completed.at(-1)?.metadata).toEqual({ teamId: 'team-9' });
  });
});
