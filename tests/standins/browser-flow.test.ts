import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import { genUploader } from 'uploadthing/client';
import type { photoRouter } from './helpers/photo-router';
import { startPhotoApp } from './helpers/photo-router';
import { md5, TINY_PNG } from './helpers/png';
import { startFakeForTest } from './helpers/uploads';
import { installXhrShim } from './helpers/xhr-shim';

type Router = ReturnType<typeof photoRouter>;

// The browser client that @uploadthing/react wraps (`genUploader` from
// uploadthing/client): asks the app's route handler for presigned URLs, HEADs
// and PUTs each file to the stand-in, and gets serverData back from the PUT.
// Both handler modes: isDev=false (the stand-in calls the app back over HTTP)
// and isDev=true (the app reads callbacks from the /route-metadata stream).
describe.each([
  { mode: 'production callbacks', isDev: false },
  { mode: 'dev-stream callbacks', isDev: true },
])('browser upload flow, $mode', ({ isDev }) => {
  let env: Awaited<ReturnType<typeof startFakeForTest>>;
  let photoApp: Awaited<ReturnType<typeof startPhotoApp>>;
  let restoreXhr: () => void;

  beforeAll(async () => {
    env = await startFakeForTest();
    photoApp = await startPhotoApp(env.fake.url, isDev);
    restoreXhr = installXhrShim();
  });
  afterEach(() => {
    photoApp.completed.length = 0;
  });
  afterAll(async () => {
    restoreXhr();
    await photoApp.app.close();
    await env.stop();
  });

  it('runs onUploadComplete with the stored file and returns its serverData to the browser', async () => {
    const { uploadFiles } = genUploader<Router>({ url: photoApp.endpoint, package: 'pourproof-tests', fetch });
    const file = new File([new Uint8Array(TINY_PNG)], 'swatch.png', { type: 'image/png' });

    const [uploaded] = await uploadFiles('photo', { files: [file] });

    expect(uploaded.serverData).toEqual({ photoId: 'photo-1', key: uploaded.key });
    expect(uploaded.ufsUrl).toBe(`${env.fake.url}/f/${uploaded.key}`);
    expect(uploaded.fileHash).toBe(md5(TINY_PNG));
    expect(photoApp.completed).toHaveLength(1);
    const done = photoApp.completed[0];
    expect(done.metadata).toEqual({ teamId: 'team-1' });
    expect(done.file).toMatchObject({ key: uploaded.key, name: 'swatch.png', size: TINY_PNG.length, ufsUrl: uploaded.ufsUrl });

    const served = await fetch(uploaded.ufsUrl);
    expect(Buffer.from(await served.arrayBuffer()).equals(TINY_PNG)).toBe(true);
  });

  it('lets the route refuse a file type before anything reaches the stand-in', async () => {
    const { uploadFiles } = genUploader<Router>({ url: photoApp.endpoint, package: 'pourproof-tests', fetch });
    const text = new File(['not an image'], 'notes.txt', { type: 'text/plain' });
    const storedBefore = await env.storedNames();
    const requestsBefore = env.log.length;
    await expect(uploadFiles('photo', { files: [text] })).rejects.toThrow();
    expect(await env.storedNames()).toEqual(storedBefore);
    expect(env.log.length).toBe(requestsBefore);
  });
});
