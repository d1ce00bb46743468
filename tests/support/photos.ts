import sharp from 'sharp';
import { converter } from 'culori';
import { api, baseUrl } from './http';

const toRgb = converter('rgb');

// An sRGB 8-bit triple for a D65 Lab colour (culori 'lab65' → 'rgb'), clamped.
export function labToRgb8(lab: { l: number; a: number; b: number }): [number, number, number] {
  const c = toRgb({ mode: 'lab65', l: lab.l, a: lab.a, b: lab.b });
  const ch = (v: number) => Math.max(0, Math.min(255, Math.round(v * 255)));
  return [ch(c.r), ch(c.g), ch(c.b)];
}

// A photo of a two-tone bait: top half one colour ("back"), bottom half the
// other ("belly"), on a flat surround.
export async function twoTonePng(back: [number, number, number], belly: [number, number, number], w = 200, h = 120): Promise<Buffer> {
  const half = Math.floor(h / 2);
  const px = Buffer.alloc(w * h * 3);
  for (let y = 0; y < h; y++) {
    const c = y < half ? back : belly;
    for (let x = 0; x < w; x++) px.set(c, (y * w + x) * 3);
  }
  return sharp(px, { raw: { width: w, height: h, channels: 3 } }).png().toBuffer();
}

export const BACK_SHAPE = { type: 'rect', x: 0.1, y: 0.1, w: 0.8, h: 0.3 } as const;
export const BELLY_SHAPE = { type: 'rect', x: 0.1, y: 0.6, w: 0.8, h: 0.3 } as const;

export async function uploadPhoto(cookie: string, bytes: Buffer, kind: 'reference' | 'pour' | 'batch' | 'swatch', name = 'photo.png') {
  const form = new FormData();
  form.set('kind', kind);
  form.set('image', new Blob([new Uint8Array(bytes)], { type: 'image/png' }), name);
  const res = await fetch(`${baseUrl()}/api/photos`, { method: 'POST', body: form, headers: { origin: baseUrl(), cookie } });
  const body = await res.json();
  if (res.status !== 201) throw new Error(`upload failed: ${res.status} ${JSON.stringify(body)}`);
  return body as { id: string; width: number; height: number };
}

export { api };

export { hugeHeaderPng } from '../../bench/fixtures';

// An ISO BMFF 'ftyp' box with the HEIC brand, then filler: how a phone's HEIC photo starts.
export const heicLike = () => Buffer.concat([Buffer.from('00000018667479706865696300000000686569636d696631', 'hex'), Buffer.alloc(2000, 7)]);
