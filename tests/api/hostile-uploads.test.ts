import { randomBytes } from 'node:crypto';
import zlib from 'node:zlib';
import Database from 'better-sqlite3';
import sharp from 'sharp';
import { UTApi } from 'uploadthing/server';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { baseUrl, expectErrorShape, signInAs } from '../support/http';
import { heicLike, hugeHeaderPng } from '../support/photos';

// A corpus of hostile and odd uploads to POST /api/photos, each with the
// policy's answer: only photos sharp can decode as JPEG, PNG or WebP are kept
// (judged by their bytes, never by name or declared type); everything else is
// refused with its status and a message, never a 500, and nothing is stored.

const noise = (w: number, h: number) => sharp(randomBytes(w * h * 3), { raw: { width: w, height: h, channels: 3 } });

// A PNG chunk (ISO/IEC 15948 §5.3): length, type, data, CRC-32 of type and data.
function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(zlib.crc32(body) >>> 0);
  return Buffer.concat([len, body, crc]);
}

// A small PNG with an iCCP chunk of `bytes` of compressed junk inserted after IHDR.
async function hugeIccPng(bytes: number): Promise<Buffer> {
  const png = await noise(16, 16).png().toBuffer();
  const ihdrEnd = 8 + 4 + 4 + 13 + 4;
  const profile = Buffer.concat([Buffer.from('junk\0\0', 'latin1'), zlib.deflateSync(randomBytes(bytes))]);
  return Buffer.concat([png.subarray(0, ihdrEnd), chunk('iCCP', profile), png.subarray(ihdrEnd)]);
}

async function animatedWebp(): Promise<Buffer> {
  const frames = Buffer.concat([randomBytes(32 * 32 * 3), randomBytes(32 * 32 * 3)]);
  return sharp(frames, { raw: { width: 32, height: 64, channels: 3, pageHeight: 32 } as never }).webp({ loop: 0 }).toBuffer();
}

type Case = { label: string; bytes: () => Promise<Buffer> | Buffer; name?: string; type?: string; status: number; message?: RegExp };

const CASES: Case[] = [
  { label: 'bomb by header (30000 × 30000 in 70 bytes)', bytes: hugeHeaderPng, status: 413, message: /megapixels/ },
  { label: 'bomb by content (8000 × 8000 flat PNG)', bytes: () => sharp({ create: { width: 8000, height: 8000, channels: 3, background: '#777' } }).png({ compressionLevel: 9 }).toBuffer(), status: 413, message: /megapixels/ },
  { label: 'truncated JPEG', bytes: async () => (await noise(64, 64).jpeg().toBuffer()).subarray(0, 600), name: 'cut.jpg', status: 415, message: /damaged|could not be read/ },
  { label: 'truncated PNG', bytes: async () => { const b = await noise(64, 64).png().toBuffer(); return b.subarray(0, b.length >> 1); }, status: 415, message: /damaged|could not be read/ },
  { label: 'JPEG + HTML polyglot', bytes: async () => Buffer.concat([await noise(32, 32).jpeg().toBuffer(), Buffer.from('<html><script>alert(1)</script></html>')]), name: 'poly.html', type: 'text/html', status: 201 },
  { label: 'GIF', bytes: () => noise(16, 16).gif().toBuffer(), name: 'a.gif', type: 'image/gif', status: 415, message: /not a JPEG, PNG or WebP/ },
  { label: 'SVG', bytes: () => Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'), name: 'a.svg', type: 'image/svg+xml', status: 415, message: /not a JPEG, PNG or WebP/ },
  { label: 'HTML named .jpg', bytes: () => Buffer.from('<!doctype html><h1>hi</h1>'), name: 'a.jpg', type: 'image/jpeg', status: 415, message: /not a JPEG, PNG or WebP/ },
  { label: 'TIFF', bytes: () => noise(16, 16).tiff().toBuffer(), name: 'a.tif', type: 'image/tiff', status: 415, message: /not a JPEG, PNG or WebP/ },
  { label: 'HEIC-like', bytes: heicLike, name: 'IMG_1.HEIC', type: 'image/heic', status: 415, message: /HEIC/ },
  { label: 'BMP', bytes: () => Buffer.concat([Buffer.from('BM'), randomBytes(200)]), name: 'a.bmp', status: 415, message: /not a JPEG, PNG or WebP/ },
  { label: 'PDF', bytes: () => Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF'), name: 'a.pdf', status: 415, message: /not a JPEG, PNG or WebP/ },
  { label: 'plain text', bytes: () => Buffer.from('3 drops per cup'), name: 'notes.png', status: 415, message: /not a JPEG, PNG or WebP/ },
  { label: 'CMYK JPEG', bytes: () => noise(32, 32).toColourspace('cmyk').jpeg().toBuffer(), name: 'cmyk.jpg', status: 201 },
  { label: '16-bit PNG', bytes: () => noise(32, 32).toColourspace('rgb16').png().toBuffer(), name: 'deep.png', status: 201 },
  { label: 'animated WebP', bytes: animatedWebp, name: 'anim.webp', status: 201 },
  { label: 'PNG with a 3 MB ICC chunk', bytes: () => hugeIccPng(3 * 1024 * 1024), name: 'icc.png', status: 201 },
  { label: 'JPEG with odd EXIF (orientation 8)', bytes: () => noise(40, 20).jpeg().withMetadata({ orientation: 8 }).toBuffer(), name: 'exif.jpg', status: 201 },
  { label: 'zero bytes', bytes: () => Buffer.alloc(0), status: 400, message: /empty/ },
  { label: '26 MB', bytes: () => Buffer.alloc(26 * 1024 * 1024, 7), status: 413, message: /25 MB/ },
  { label: 'path in the name', bytes: () => noise(16, 16).png().toBuffer(), name: '../../../etc/passwd.png', status: 201 },
  { label: 'control characters in the name', bytes: () => noise(16, 16).png().toBuffer(), name: 'a\u0000b\r\n\u202egnp.png', status: 201 },
  { label: 'PNG declared as GIF', bytes: () => noise(16, 16).png().toBuffer(), name: 'really.gif', type: 'image/gif', status: 201 },
];

describe('hostile uploads', () => {
  let maker: string;
  let db: Database.Database;
  const utapi = new UTApi({ logLevel: 'Error' });
  beforeAll(async () => {
    maker = await signInAs('maker@demo.test', 'pourproof-demo', '10.70.0.1');
    db = new Database(inject('dbFile'), { readonly: true, fileMustExist: true });
  });
  afterAll(() => db?.close());

  it(`answers each of ${CASES.length} kinds as the policy says, never 500, storing nothing on refusal`, async () => {
    expect(CASES.length).toBeGreaterThanOrEqual(20);
    const tag = randomBytes(6).toString('hex');
    const rows = () => (db.prepare('select file_name as n from photos where file_name like ?').all(`%${tag}%`) as { n: string }[]).map((r) => r.n);
    let accepted = 0;
    for (const c of CASES) {
      const form = new FormData();
      form.append('kind', 'pour');
      form.append('image', new Blob([new Uint8Array(await c.bytes())], { type: c.type ?? 'application/octet-stream' }), (c.name ?? 'photo.png').replace(/([^/\\]*)$/, `${tag}-$1`));
      const res = await fetch(`${baseUrl()}/api/photos`, { method: 'POST', body: form, headers: { cookie: maker, origin: baseUrl() } });
      const body = (await res.json()) as any;
      expect(res.status, c.label).toBe(c.status);
      if (c.status === 201) {
        accepted += 1;
        expect(rows().length, c.label).toBe(accepted);
        const image = await fetch(`${baseUrl()}/api/photos/${body.id}/image`, { headers: { cookie: maker } });
        expect(image.headers.get('content-type'), c.label).toMatch(/^image\/(jpeg|png|webp)$/);
        expect(image.headers.get('x-content-type-options'), c.label).toBe('nosniff');
      } else {
        expectErrorShape(body);
        expect(body.error.message, c.label).toMatch(c.message!);
        expect(rows().length, `${c.label}: nothing stored`).toBe(accepted);
      }
    }
    // Stored names keep no path, no control characters, and the real format's extension.
    for (const name of rows()) expect(name).toMatch(/^[^/\\\u0000-\u001f\u202e]+\.(jpg|png|webp)$/);
    expect((await utapi.listFiles({ limit: 5000 })).files.filter((f) => f.name.includes(tag)).length).toBe(accepted);
  });
});
