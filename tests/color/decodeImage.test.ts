import { converter } from 'culori';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { deltaE2000, srgbToLab } from '@/lib/color';
import { decodeImage, ImageError, type ImageErrorKind, inspectImage, measurePhoto, MAX_IMAGE_BYTES } from '@/lib/image';
import { attachIcc, encode, pngHeaderOnly, rawImage, type Rgb } from './synth';

async function kindOf(p: Promise<unknown>): Promise<ImageErrorKind | 'no error' | string> {
  try {
    await p;
    return 'no error';
  } catch (err) {
    return err instanceof ImageError ? err.kind : `other: ${String(err)}`;
  }
}
const flat = (w: number, h: number, c: Rgb) => rawImage(w, h, () => c);

describe('decodeImage: bad input', () => {
  it('zero bytes → unsupported_type', async () => {
    expect(await kindOf(decodeImage(Buffer.alloc(0)))).toBe('unsupported_type');
  });

  it('text → unsupported_type', async () => {
    expect(await kindOf(decodeImage(Buffer.from('back: watermelon, belly: pearl\n'.repeat(20))))).toBe('unsupported_type');
  });

  it('SVG → unsupported_type (sharp can read it, but it is not a photo)', async () => {
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="40" height="40"><rect width="40" height="40" fill="#3a7"/></svg>');
    expect((await sharp(svg).metadata()).format).toBe('svg');
    expect(await kindOf(decodeImage(svg))).toBe('unsupported_type');
  });

  it('GIF and TIFF → unsupported_type naming the format', async () => {
    const img = () => sharp(flat(8, 8, [90, 140, 80]), { raw: { width: 8, height: 8, channels: 3 } });
    for (const file of [await img().gif().toBuffer(), await img().tiff().toBuffer()]) {
      const err = await decodeImage(file).catch((e: unknown) => e);
      expect((err as ImageError).kind).toBe('unsupported_type');
      expect((err as ImageError).message).toMatch(/GIF|TIFF/);
    }
  });

  it('truncated JPEG → unsupported_type', async () => {
    const jpg = await encode(flat(400, 300, [90, 140, 80]), 400, 300, 'jpeg');
    expect(await kindOf(decodeImage(jpg.subarray(0, Math.floor(jpg.length / 2))))).toBe('unsupported_type');
  });

  it('HEIC (ISO/IEC 23008-12 ftyp brand "heic") → unsupported_type, telling how to get a JPEG', async () => {
    const ftyp = Buffer.alloc(32);
    ftyp.writeUInt32BE(24, 0);
    ftyp.write('ftypheic', 4, 'latin1');
    ftyp.write('mif1heic', 16, 'latin1');
    const err = await decodeImage(ftyp).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ImageError);
    expect((err as ImageError).kind).toBe('unsupported_type');
    expect((err as ImageError).message).toMatch(/HEIC/);
    expect((err as ImageError).message).toMatch(/JPEG/);
  });

  it('a 30000 × 30000 PNG header → too_many_pixels, read from the header alone', async () => {
    const bomb = pngHeaderOnly(30000, 30000);
    expect(bomb.length).toBeLessThan(2000);
    expect(await kindOf(decodeImage(bomb))).toBe('too_many_pixels');
  });

  it('over 25 MB → too_large', async () => {
    const big = Buffer.alloc(MAX_IMAGE_BYTES + 1);
    expect(await kindOf(decodeImage(big))).toBe('too_large');
  });

  it('maps kinds to the HTTP statuses of API.md', () => {
    expect(new ImageError('too_large', '').status).toBe(413);
    expect(new ImageError('unsupported_type', '').status).toBe(415);
    expect(new ImageError('empty_region', '').status).toBe(422);
  });
});

describe('decodeImage: orientation, colour management, formats', () => {
  // Stored 40 × 20: top-left red, top-right green, bottom-left blue, bottom-right yellow.
  const quad = rawImage(40, 20, (x, y) => {
    if (y < 10) return x < 20 ? [220, 30, 30] : [30, 200, 30];
    return x < 20 ? [30, 30, 220] : [230, 220, 30];
  });
  // EXIF 2.32 (CIPA DC-008-2019) Orientation 6: the 0th row is the visual right-hand side and the
  // 0th column the visual top, i.e. display = stored turned 90° clockwise, so displayed
  // top-left = stored bottom-left (blue), top-right = stored top-left (red),
  // bottom-left = stored bottom-right (yellow), bottom-right = stored top-right (green).
  const expected: [string, Rgb, number, number][] = [
    ['top-left', [30, 30, 220], 0, 0],
    ['top-right', [220, 30, 30], 0.5, 0],
    ['bottom-left', [230, 220, 30], 0, 0.5],
    ['bottom-right', [30, 200, 30], 0.5, 0.5],
  ];

  it.each(['png', 'jpeg'] as const)('measures an EXIF-6 %s in displayed coordinates', async (format) => {
    const img = sharp(quad, { raw: { width: 40, height: 20, channels: 3 } }).withMetadata({ orientation: 6 });
    const file = await (format === 'png' ? img.png() : img.jpeg({ quality: 95 })).toBuffer();
    expect((await sharp(file).metadata()).orientation).toBe(6);
    const regions = expected.map(([name, , x, y]) => ({ name, shape: { type: 'rect' as const, x: x + 0.1, y: y + 0.1, w: 0.3, h: 0.3 } }));
    const out = await measurePhoto(file, regions);
    expect([out.width, out.height]).toEqual([20, 40]);
    for (const [name, rgb] of expected) {
      const region = out.regions.find((r) => r.name === name)!;
      expect(deltaE2000(region.lab, srgbToLab(...rgb))).toBeLessThan(format === 'png' ? 0.5 : 2.0);
    }
  });

  it('converts an embedded Display P3 profile to sRGB (pixels written by culori, profile attached as is)', async () => {
    const srgb: Rgb = [200, 70, 50];
    const toP3 = converter('p3');
    const p3 = toP3({ mode: 'rgb', r: srgb[0] / 255, g: srgb[1] / 255, b: srgb[2] / 255 });
    const p3Bytes: Rgb = [p3.r * 255, p3.g * 255, p3.b * 255];
    // The P3 profile sharp ships (withIccProfile('p3')), lifted from a tiny image.
    const icc = (await sharp({ create: { width: 1, height: 1, channels: 3, background: '#808080' } }).withIccProfile('p3').png().toBuffer().then((b) => sharp(b).metadata())).icc!;
    const png = attachIcc(await encode(flat(64, 48, p3Bytes), 64, 48, 'png'), icc, 'Display P3');
    const meta = await sharp(png).metadata();
    expect(meta.hasProfile).toBe(true);

    const truth = srgbToLab(...srgb);
    const asIs = srgbToLab(...(p3Bytes.map(Math.round) as Rgb));
    expect(deltaE2000(asIs, truth)).toBeGreaterThan(3); // the profile matters for this colour
    const out = await measurePhoto(png, [{ name: 'patch', shape: { type: 'rect', x: 0.1, y: 0.1, w: 0.8, h: 0.8 } }]);
    expect(deltaE2000(out.regions[0].lab, truth)).toBeLessThanOrEqual(1.0);
  });

  it('the same colour written by sharp with withIccProfile("p3") measures as the sRGB original', async () => {
    const srgb: Rgb = [60, 150, 90];
    const png = await sharp(flat(32, 32, srgb), { raw: { width: 32, height: 32, channels: 3 } }).withIccProfile('p3').png().toBuffer();
    const out = await measurePhoto(png, [{ name: 'patch', shape: { type: 'rect', x: 0, y: 0, w: 1, h: 1 } }]);
    expect(deltaE2000(out.regions[0].lab, srgbToLab(...srgb))).toBeLessThanOrEqual(1.0);
  });

  it('16-bit PNG, greyscale, alpha and WebP decode to 8-bit RGB', async () => {
    const raw = flat(8, 6, [120, 60, 200]);
    const png16 = await sharp(raw, { raw: { width: 8, height: 6, channels: 3 } }).toColourspace('rgb16').png().toBuffer();
    const webp = await sharp(raw, { raw: { width: 8, height: 6, channels: 3 } }).webp({ lossless: true }).toBuffer();
    const grey = await sharp(raw, { raw: { width: 8, height: 6, channels: 3 } }).greyscale().png().toBuffer();
    const alpha = await sharp(raw, { raw: { width: 8, height: 6, channels: 3 } }).ensureAlpha(0.5).png().toBuffer();
    for (const file of [png16, webp, grey, alpha]) {
      const d = await decodeImage(file);
      expect([d.width, d.height, d.window.data.length]).toEqual([8, 6, 8 * 6 * 3]);
    }
    expect(Array.from((await decodeImage(webp)).window.data.subarray(0, 3))).toEqual([120, 60, 200]);
    expect((await inspectImage(webp)).format).toBe('webp');
  });

  it('decodes only the crop box when asked', async () => {
    const png = await encode(quad, 40, 20, 'png');
    const d = await decodeImage(png, { crop: { left: 20, top: 10, width: 20, height: 10 } });
    expect([d.width, d.height, d.window.width, d.window.height]).toEqual([40, 20, 20, 10]);
    expect(Array.from(d.window.data.subarray(0, 3))).toEqual([230, 220, 30]);
  });
});
