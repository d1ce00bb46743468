import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { inspectPhoto } from './inspectPhoto';

const solid = (w: number, h: number) => sharp({ create: { width: w, height: h, channels: 3, background: '#6b8f4e' } });

async function refusal(buf: Buffer) {
  try {
    await inspectPhoto(buf);
  } catch (err) {
    const e = err as { status: number; code: string; message: string };
    return { status: e.status, code: e.code, message: e.message };
  }
  throw new Error('expected a refusal');
}

describe('inspectPhoto', () => {
  it('reads format, mime and size of JPEG, PNG and WebP from the bytes', async () => {
    expect(await inspectPhoto(await solid(30, 20).jpeg().toBuffer())).toEqual({ format: 'jpeg', mime: 'image/jpeg', width: 30, height: 20 });
    expect(await inspectPhoto(await solid(30, 20).png().toBuffer())).toEqual({ format: 'png', mime: 'image/png', width: 30, height: 20 });
    expect(await inspectPhoto(await solid(30, 20).webp().toBuffer())).toEqual({ format: 'webp', mime: 'image/webp', width: 30, height: 20 });
  });

  // EXIF 2.32 Orientation: 1–4 keep the stored axes, 5–8 transpose them.
  it.each([1, 2, 3, 4, 5, 6, 7, 8])('gives the displayed size for EXIF orientation %i', async (orientation) => {
    const jpeg = await solid(30, 20).jpeg().withMetadata({ orientation }).toBuffer();
    const { width, height } = await inspectPhoto(jpeg);
    expect([width, height]).toEqual(orientation >= 5 ? [20, 30] : [30, 20]);
  });

  it('refuses other formats by their bytes, whatever they are called', async () => {
    expect(await refusal(await solid(8, 8).gif().toBuffer())).toMatchObject({ status: 415, code: 'unsupported_type' });
    expect(await refusal(await solid(8, 8).tiff().toBuffer())).toMatchObject({ status: 415 });
    expect(await refusal(Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>'))).toMatchObject({ status: 415 });
    expect(await refusal(Buffer.from('%PDF-1.7\n'))).toMatchObject({ status: 415 });
    const heic = Buffer.concat([Buffer.from('00000018667479706865696300000000686569636d696631', 'hex'), Buffer.alloc(100)]);
    expect(await refusal(heic)).toMatchObject({ status: 415, code: 'heic_unsupported', message: expect.stringMatching(/HEIC.*JPEG/) });
    expect(await refusal(Buffer.alloc(0))).toMatchObject({ status: 400, code: 'empty_file' });
  });

  it('refuses a damaged file and a header over 40 megapixels', async () => {
    const jpeg = await solid(64, 64).jpeg().toBuffer();
    expect(await refusal(jpeg.subarray(0, 200))).toMatchObject({ status: 415, code: 'undecodable' });
    // 6400 × 6400 = 40.96 MP: just over the limit, refused from the header.
    const big = await sharp({ create: { width: 6400, height: 6400, channels: 3, background: '#777777' } }).png({ compressionLevel: 9 }).toBuffer();
    expect(await refusal(big)).toMatchObject({ status: 413, code: 'too_many_pixels' });
    const ok = await sharp({ create: { width: 6000, height: 6000, channels: 3, background: '#777777' } }).png({ compressionLevel: 9 }).toBuffer();
    expect(await inspectPhoto(ok)).toMatchObject({ width: 6000, height: 6000 });
  });
});
