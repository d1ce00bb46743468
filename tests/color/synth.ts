// Synthetic photos for the colour tests: seeded noise, raw RGB buffers, and hand-built PNG
// chunks (PNG: ISO/IEC 15948:2004 — chunk layout §5.3, IHDR §11.2.2, iCCP §11.3.3.3, CRC Annex D).
import { deflateSync } from 'node:zlib';
import sharp from 'sharp';

export type Rgb = [number, number, number];

/** Mulberry32: a small seeded PRNG, so every synthetic photo is the same on every run. */
export function rng(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Normal deviates by the Box–Muller transform. */
export function gauss(rand: () => number) {
  return () => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
}

export const clamp8 = (v: number) => Math.max(0, Math.min(255, Math.round(v)));

/** A width × height 8-bit RGB buffer filled by `at(x, y)`. */
export function rawImage(width: number, height: number, at: (x: number, y: number) => Rgb): Buffer {
  const buf = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++)
    for (let x = 0; x < width; x++) {
      const [r, g, b] = at(x, y);
      const i = (y * width + x) * 3;
      buf[i] = clamp8(r);
      buf[i + 1] = clamp8(g);
      buf[i + 2] = clamp8(b);
    }
  return buf;
}

export function encode(raw: Buffer, width: number, height: number, format: 'png' | 'jpeg', quality = 90) {
  const img = sharp(raw, { raw: { width, height, channels: 3 } });
  return (format === 'png' ? img.png() : img.jpeg({ quality })).toBuffer();
}

const CRC_TABLE = (() => {
  const t = new Uint32Array(256);
  for (let n = 0; n < 256; n++) {
    let c = n;
    for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    t[n] = c >>> 0;
  }
  return t;
})();

function crc32(buf: Buffer) {
  let c = 0xffffffff;
  for (const byte of buf) c = CRC_TABLE[(c ^ byte) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

export function pngChunk(type: string, data: Buffer) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

const PNG_SIGNATURE = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

/** Attaches an ICC profile to a PNG (iCCP chunk after IHDR) without touching its pixels. */
export function attachIcc(png: Buffer, icc: Buffer, name = 'ICC profile') {
  const ihdrEnd = 8 + 8 + 13 + 4;
  const data = Buffer.concat([Buffer.from(name + '\0', 'latin1'), Buffer.from([0]), deflateSync(icc)]);
  return Buffer.concat([png.subarray(0, ihdrEnd), pngChunk('iCCP', data), png.subarray(ihdrEnd)]);
}

/** A tiny PNG whose IHDR declares width × height 8-bit RGB: a decompression-bomb header. */
export function pngHeaderOnly(width: number, height: number) {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 2; // colour type: truecolour
  return Buffer.concat([
    PNG_SIGNATURE,
    pngChunk('IHDR', ihdr),
    pngChunk('IDAT', deflateSync(Buffer.alloc(1 + width * 3))),
    pngChunk('IEND', Buffer.alloc(0)),
  ]);
}
