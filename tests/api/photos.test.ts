import { randomBytes } from 'node:crypto';
import Database from 'better-sqlite3';
import sharp from 'sharp';
import { UTApi } from 'uploadthing/server';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { api, baseUrl, expectErrorShape, signInAs, signUpShop } from '../support/http';
import { heicLike, hugeHeaderPng } from '../support/photos';

// POST /api/photos (multipart) and GET /api/photos/:id[/image] against the running app
// and the uploads stand-in it stores through.

async function postPhoto(cookie: string | null, parts: { bytes?: Buffer; name?: string; type?: string; kind?: string }, origin: string | null = baseUrl()) {
  const form = new FormData();
  if (parts.kind !== undefined) form.append('kind', parts.kind);
  if (parts.bytes) form.append('image', new Blob([new Uint8Array(parts.bytes)], { type: parts.type ?? 'application/octet-stream' }), parts.name ?? 'photo.png');
  const headers: Record<string, string> = {};
  if (cookie) headers.cookie = cookie;
  if (origin) headers.origin = origin;
  const res = await fetch(`${baseUrl()}/api/photos`, { method: 'POST', body: form, headers });
  const text = await res.text();
  let body: any = text;
  try {
    body = JSON.parse(text);
  } catch {
    /* not JSON */
  }
  return { status: res.status, body };
}

// A PNG with noise, so every upload has distinct bytes.
const noisyPng = (w: number, h: number) =>
  sharp(randomBytes(w * h * 3), { raw: { width: w, height: h, channels: 3 } }).png().toBuffer();

// A 1×1 PNG whose IHDR is patched to 30000×30000, CRC fixed (ISO/IEC 15948 §11.2.2): a
// 900-megapixel header in a 70-byte file.
describe('photos API', () => {
  let maker: string;
  let db: Database.Database;
  const utapi = new UTApi({ logLevel: 'Error' });
  // Other test files upload at the same time, so each test looks for its own tagged names.
  const rowsNamed = (tag: string) => (db.prepare('select count(*) as n from photos where file_name like ?').get(`%${tag}%`) as { n: number }).n;
  const filesNamed = async (tag: string) => (await utapi.listFiles({ limit: 5000 })).files.filter((f) => f.name.includes(tag)).length;

  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.60.0.1');
    db = new Database(inject('dbFile'), { readonly: true, fileMustExist: true });
  });
  afterAll(() => db?.close());

  it('stores a PNG through the upload service and gives the same bytes back, to the team only', async () => {
    const bytes = await noisyPng(64, 48);
    const tag = randomBytes(6).toString('hex');
    const res = await postPhoto(maker, { bytes, name: `dusk-back-${tag}.png`, type: 'image/png', kind: 'reference' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'reference', width: 64, height: 48 });
    expect(rowsNamed(tag)).toBe(1);
    expect(await filesNamed(tag)).toBe(1);
    const id = res.body.id as string;

    const image = await fetch(`${baseUrl()}/api/photos/${id}/image`, { headers: { cookie: maker } });
    expect(image.status).toBe(200);
    expect(image.headers.get('content-type')).toBe('image/png');
    expect(image.headers.get('cache-control')).toMatch(/^private/);
    expect(Buffer.from(await image.arrayBuffer()).equals(bytes)).toBe(true);

    const meta = await api(`/api/photos/${id}`, { cookie: maker });
    expect(meta.status).toBe(200);
    expect(meta.body).toMatchObject({ id, kind: 'reference', width: 64, height: 48, size: bytes.length, fileName: `dusk-back-${tag}.png` });
    expect(meta.body.fileKey).toBeUndefined();

    const viewer = await signInAs('viewer@demo.test', 'pourproof-demo', '10.60.0.1');
    expect((await fetch(`${baseUrl()}/api/photos/${id}/image`, { headers: { cookie: viewer } })).status).toBe(200);

    const stranger = await signUpShop('Photo stranger shop');
    for (const path of [`/api/photos/${id}/image`, `/api/photos/${id}`]) {
      const theirs = await api(path, { cookie: stranger.cookie });
      const missing = await api(path.replace(id, 'no-such-photo'), { cookie: stranger.cookie });
      expect(theirs.status, path).toBe(404);
      expect(theirs.body).toEqual(missing.body);
      expectErrorShape(theirs.body);
      const anon = await api(path);
      expect(anon.status, path).toBe(401);
      expectErrorShape(anon.body);
    }
    expect((await api('/api/photos', { cookie: stranger.cookie })).body).toEqual([]);
    expect((await api('/api/photos', { cookie: maker })).body.map((p: { id: string }) => p.id)).toContain(id);
  });

  it('reports the size of the image as displayed (EXIF orientation 6 swaps width and height)', async () => {
    const bytes = await sharp({ create: { width: 40, height: 20, channels: 3, background: '#8a6f4d' } }).jpeg().withMetadata({ orientation: 6 }).toBuffer();
    const res = await postPhoto(maker, { bytes, name: 'turned.jpg', type: 'image/jpeg', kind: 'pour' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'pour', width: 20, height: 40 });
  });

  it('keeps only the last part of a client file name, with the extension of the real format', async () => {
    const cases: [string, string][] = [['../../etc/passwd.png', 'passwd.png'], ['C:\\shop\\..\\belly.jpg', 'belly.png']];
    for (const [given, stored] of cases) {
      const res = await postPhoto(maker, { bytes: await noisyPng(8, 8), name: given, type: 'image/png', kind: 'swatch' });
      expect(res.status, given).toBe(201);
      expect((await api(`/api/photos/${res.body.id}`, { cookie: maker })).body.fileName, given).toBe(stored);
    }
  });

  it('refuses bad input with a clear message in the error shape, storing nothing', async () => {
    const png = await noisyPng(16, 16);
    const tag = randomBytes(6).toString('hex');
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10" fill="#777"/></svg>');
    const cases: { label: string; parts: Parameters<typeof postPhoto>[1]; status: number; message: RegExp; cookie?: string | null; origin?: string | null }[] = [
      { label: 'SVG', parts: { bytes: svg, name: 'logo.svg', type: 'image/svg+xml', kind: 'reference' }, status: 415, message: /not a JPEG, PNG or WebP/ },
      { label: 'text named .jpg', parts: { bytes: Buffer.from('recipe: 3 drops per cup\n'), name: 'bait.jpg', type: 'image/jpeg', kind: 'reference' }, status: 415, message: /not a JPEG, PNG or WebP/ },
      { label: 'HEIC', parts: { bytes: heicLike(), name: 'IMG_0001.HEIC', type: 'image/heic', kind: 'reference' }, status: 415, message: /HEIC.*export.*JPEG/i },
      { label: 'truncated PNG', parts: { bytes: png.subarray(0, Math.floor(png.length / 2)), name: 'cut.png', type: 'image/png', kind: 'pour' }, status: 415, message: /damaged/ },
      { label: 'zero bytes', parts: { bytes: Buffer.alloc(0), name: 'empty.png', type: 'image/png', kind: 'pour' }, status: 400, message: /empty/ },
      { label: '26 MB', parts: { bytes: Buffer.alloc(26 * 1024 * 1024, 7), name: 'big.png', type: 'image/png', kind: 'pour' }, status: 413, message: /25 MB/ },
      { label: '30000×30000 header', parts: { bytes: await hugeHeaderPng(), name: 'bomb.png', type: 'image/png', kind: 'pour' }, status: 413, message: /megapixels/ },
      { label: 'missing kind', parts: { bytes: png, name: 'a.png', type: 'image/png' }, status: 400, message: /kind must be one of reference, pour, batch, swatch/ },
      { label: 'bad kind', parts: { bytes: png, name: 'a.png', type: 'image/png', kind: 'selfie' }, status: 400, message: /kind must be one of/ },
      { label: 'missing image', parts: { kind: 'pour' }, status: 400, message: /image/ },
      { label: 'viewer', parts: { bytes: png, name: 'a.png', type: 'image/png', kind: 'pour' }, status: 403, message: /maker role/, cookie: 'viewer' },
      { label: 'signed out', parts: { bytes: png, name: 'a.png', type: 'image/png', kind: 'pour' }, status: 401, message: /Sign in/, cookie: null },
      { label: 'no Origin', parts: { bytes: png, name: 'a.png', type: 'image/png', kind: 'pour' }, status: 403, message: /Origin/, origin: null },
    ];
    const viewer = await signInAs('viewer@demo.test', 'pourproof-demo', '10.60.0.2');
    for (const c of cases) {
      const cookie = c.cookie === 'viewer' ? viewer : c.cookie === null ? null : maker;
      const parts = { ...c.parts, name: `${tag}-${c.parts.name ?? 'photo.png'}` };
      const res = await postPhoto(cookie, parts, c.origin === null ? null : baseUrl());
      expect(res.status, c.label).toBe(c.status);
      expectErrorShape(res.body);
      expect(res.body.error.message, c.label).toMatch(c.message);
    }
    const notMultipart = await api('/api/photos', { cookie: maker, body: { kind: 'pour', image: 'data:image/png;base64,AAAA' } });
    expect(notMultipart.status).toBe(400);
    expect(notMultipart.body.error.message).toMatch(/multipart/);

    expect(rowsNamed(tag)).toBe(0);
    expect(await filesNamed(tag)).toBe(0);
    expect((await api('/api/health')).body).toEqual({ ok: true });
  });
});
