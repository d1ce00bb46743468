import { randomBytes } from 'node:crypto';
import Database from 'better-sqlite3';
import sharp from 'sharp';
import { UTApi } from 'uploadthing/server';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { signPayload } from '../../uploads-fake/signing';
import { LOCAL_UPLOADS_API_KEY } from '../../uploads-fake/token';
import { api, baseUrl, expectErrorShape, signInAs } from '../support/http';

// The app's UploadThing route (/api/uploadthing) spoken to as the SDK's browser client
// and the upload service speak to it: the upload action, the presigned PUT to the
// stand-in, and the signed callback that runs onUploadComplete.

type FileInfo = { name: string; size: number; type: string };

async function presign(slug: string, files: FileInfo[], opts: { cookie?: string | null; origin?: string | null } = {}) {
  const headers: Record<string, string> = { 'content-type': 'application/json', 'x-uploadthing-package': 'pourproof-tests' };
  if (opts.cookie) headers.cookie = opts.cookie;
  if (opts.origin !== null) headers.origin = opts.origin ?? baseUrl();
  const res = await fetch(`${baseUrl()}/api/uploadthing?actionType=upload&slug=${slug}`, {
    method: 'POST',
    headers,
    body: JSON.stringify({ files: files.map((f) => ({ ...f, lastModified: Date.now() })), input: null }),
  });
  return { status: res.status, body: (await res.json()) as any };
}

async function put(url: string, bytes: Buffer, file: FileInfo) {
  const form = new FormData();
  form.append('file', new Blob([new Uint8Array(bytes)], { type: file.type }), file.name);
  const res = await fetch(url, { method: 'PUT', body: form, headers: { range: 'bytes=0-' } });
  return { status: res.status, body: (await res.json()) as any };
}

describe('the UploadThing route', () => {
  let maker: string;
  let db: Database.Database;
  const utapi = new UTApi({ logLevel: 'Error' });
  // Other test files upload at the same time, so each test looks for its own tagged names.
  const rowsNamed = (tag: string) => (db.prepare('select count(*) as n from photos where file_name like ?').get(`%${tag}%`) as { n: number }).n;
  const filesNamed = async (tag: string) => (await utapi.listFiles({ limit: 5000 })).files.filter((f) => f.name.includes(tag)).length;
  const newTag = () => randomBytes(6).toString('hex');

  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.61.0.1');
    db = new Database(inject('dbFile'), { readonly: true, fileMustExist: true });
  });
  afterAll(() => db?.close());

  it("records a maker's upload once the service calls back, and serves the same bytes", async () => {
    const bytes = await sharp(randomBytes(30 * 20 * 3), { raw: { width: 30, height: 20, channels: 3 } }).webp({ lossless: true }).toBuffer();
    const tag = newTag();
    const file = { name: `belly-${tag}.webp`, size: bytes.length, type: 'image/webp' };
    const signed = await presign('batchPhoto', [file], { cookie: maker });
    expect(signed.status).toBe(200);
    const done = await put(signed.body[0].url, bytes, file);
    expect(done.status).toBe(200);
    expect(done.body.serverData).toMatchObject({ width: 30, height: 20, size: bytes.length });
    const id = done.body.serverData.photoId as string;
    expect(rowsNamed(tag)).toBe(1);
    expect((await api(`/api/photos/${id}`, { cookie: maker })).body).toMatchObject({ kind: 'batch', fileName: file.name });
    const image = await fetch(`${baseUrl()}/api/photos/${id}/image`, { headers: { cookie: maker } });
    expect(image.headers.get('content-type')).toBe('image/webp');
    expect(Buffer.from(await image.arrayBuffer()).equals(bytes)).toBe(true);
    // Stored private: the service's own URL does not serve it to a browser.
    expect((await fetch(done.body.ufsUrl)).status).toBe(403);
  });

  it('deletes a stored file whose bytes are not an image, records nothing, and says why', async () => {
    const bytes = Buffer.from('this is a text file with an image name\n'.repeat(20));
    const tag = newTag();
    const file = { name: `fake-${tag}.png`, size: bytes.length, type: 'image/png' };
    const signed = await presign('referencePhoto', [file], { cookie: maker });
    expect(signed.status).toBe(200);
    const done = await put(signed.body[0].url, bytes, file);
    expect(done.status).toBe(200);
    expect(done.body.serverData.refused.message).toMatch(/not a JPEG, PNG or WebP/);
    expect(rowsNamed(tag)).toBe(0);
    expect(await filesNamed(tag)).toBe(0);
    expect((await fetch(`${process.env.UPLOADTHING_INGEST_URL}/f/${signed.body[0].key}`)).status).toBe(404);
  });

  it('refuses uploads in the middleware: viewers, strangers, other sites, wrong types, too large', async () => {
    const viewer = await signInAs('viewer@demo.test', 'pourproof-demo', '10.61.0.2');
    const tag = newTag();
    const png = { name: `a-${tag}.png`, size: 1000, type: 'image/png' };
    const cases: { label: string; files: FileInfo[]; cookie: string | null; origin?: null; status: number; message: RegExp }[] = [
      { label: 'viewer', files: [png], cookie: viewer, status: 403, message: /maker role/ },
      { label: 'signed out', files: [png], cookie: null, status: 403, message: /Sign in/ },
      { label: 'no Origin', files: [png], cookie: maker, origin: null, status: 403, message: /Origin/ },
      { label: 'text file', files: [{ name: `notes-${tag}.txt`, size: 10, type: 'text/plain' }], cookie: maker, status: 400, message: /./ },
      { label: '26 MB', files: [{ ...png, size: 26 * 1024 * 1024 }], cookie: maker, status: 413, message: /25 MB/ },
      { label: 'empty', files: [{ ...png, size: 0 }], cookie: maker, status: 400, message: /empty/ },
      { label: 'two files', files: [png, { ...png, type: 'image/jpeg', name: `b-${tag}.jpg` }], cookie: maker, status: 400, message: /one photo/ },
    ];
    for (const c of cases) {
      const res = await presign('pourPhoto', c.files, { cookie: c.cookie, origin: c.origin });
      expect(res.status, c.label).toBe(c.status);
      expectErrorShape(res.body);
      expect(res.body.error.message, c.label).toMatch(c.message);
    }
    expect(rowsNamed(tag)).toBe(0);
    expect(await filesNamed(tag)).toBe(0);
  });

  it('refuses a callback whose signature does not match, before running anything', async () => {
    const me = (await api('/api/me', { cookie: maker })).body;
    const key = `Tampered${newTag()}0000000000000000`;
    const rowsWithKey = () => (db.prepare('select count(*) as n from photos where file_key = ?').get(key) as { n: number }).n;
    const payload = JSON.stringify({
      status: 'uploaded',
      file: { name: 'x.png', size: 70, type: 'image/png', customId: null, key, url: 'u', appUrl: 'a', ufsUrl: 'f', fileHash: 'h' },
      origin: process.env.UPLOADTHING_INGEST_URL,
      metadata: { teamId: me.team.id, userId: me.user.id, kind: 'reference' },
    });
    const send = (body: string, signature: string) =>
      fetch(`${baseUrl()}/api/uploadthing?slug=referencePhoto`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'uploadthing-hook': 'callback', 'x-uploadthing-signature': signature },
        body,
      });
    const attempts: [string, string][] = [
      ['wrong key', signPayload(payload, 'sk_local_someone_else')],
      ['tampered body', signPayload(payload.replace('"reference"', '"pour"'), LOCAL_UPLOADS_API_KEY)],
      ['garbage', 'hmac-sha256=00'],
      ['none', ''],
    ];
    for (const [label, signature] of attempts) {
      const res = await send(payload, signature);
      expect(res.status, label).toBe(400);
      const body = await res.json();
      expectErrorShape(body);
      expect(body.error.message, label).toBe('Invalid signature');
    }
    expect(rowsWithKey()).toBe(0);
    // Control: the same callback correctly signed is accepted by the SDK, and still records
    // nothing, because the app fetches the bytes back and this key is not on the service.
    expect((await send(payload, signPayload(payload, LOCAL_UPLOADS_API_KEY))).status).toBe(200);
    expect(rowsWithKey()).toBe(0);
    expect((await api('/api/health')).status).toBe(200);
  });
});
