import type { Vec3 } from './types';
import { srgbToLinear } from './srgbToLinear';

const decode = (e: number) => srgbToLinear(Math.min(1, Math.max(0, e)));

/** JFIF Y'CbCr (JFIF 1.02 §7; 0..1 scale, chroma centred on 0, as lumaChroma gives it) back to linear RGB of the photo's own primaries. */
export function yccToLinear(y: number, cb: number, cr: number): Vec3 {
  return [decode(y + 1.402 * cr), decode(y - 0.344136 * cb - 0.714136 * cr), decode(y + 1.772 * cb)];
}
