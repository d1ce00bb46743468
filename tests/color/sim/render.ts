// Photos of the simulated pours: two flat patches (back above, belly below) on a surround, with
// seeded Gaussian noise per 8-bit channel, compressed as JPEG by sharp — what a phone photo of a
// test pour looks like to the measuring pipeline, without the light.
import sharp from 'sharp';
import type { Lab } from '@/lib/color';
import { labToRgb8 } from '../../support/photos';
import { clamp8, gauss, rng } from '../synth';

export async function renderPour(back: Lab, belly: Lab, seed: number, noise = 2.5, quality = 90): Promise<Buffer> {
  const w = 200;
  const h = 120;
  const normal = gauss(rng(seed));
  const top = labToRgb8(back);
  const bottom = labToRgb8(belly);
  const px = Buffer.alloc(w * h * 3);
  for (let y = 0; y < h; y++) {
    const c = y < h / 2 ? top : bottom;
    for (let x = 0; x < w; x++) for (let k = 0; k < 3; k++) px[(y * w + x) * 3 + k] = clamp8(c[k]! + noise * normal());
  }
  return sharp(px, { raw: { width: w, height: h, channels: 3 } }).jpeg({ quality }).toBuffer();
}
