import type { Mat3 } from './types';
import { applyMat3 } from './applyMat3';
import { encodeClipped } from './encodeClipped';
import { invertMat3 } from './invertMat3';

/** Per pixel, JFIF's luma Y' and chroma Cb, Cr (0..1 scale, chroma centred on 0); NaN where not usable. */
export interface LumaChroma {
  y: Float64Array;
  cb: Float64Array;
  cr: Float64Array;
}

/**
 * Every usable pixel's colour as JPEG stores it: the photo's own R'G'B' (linear RGB from XYZ by
 * the inverse of `toXyz`, then encoded) turned into Y'CbCr by JFIF 1.02 §7 (ITU-R BT.601 weights).
 * JPEG 4:2:0 keeps Y' at full resolution and Cb, Cr at half (ITU-T T.81).
 */
export function lumaChroma(xyz: Float32Array, usable: Uint8Array, toXyz: Mat3): LumaChroma {
  const n = usable.length;
  const toRgb = invertMat3(toXyz);
  const y = new Float64Array(n).fill(NaN), cb = new Float64Array(n).fill(NaN), cr = new Float64Array(n).fill(NaN);
  for (let i = 0; i < n; i++) {
    if (!usable[i]) continue;
    const rgb = applyMat3(toRgb, [xyz[i * 3], xyz[i * 3 + 1], xyz[i * 3 + 2]]);
    const r = encodeClipped(rgb[0]), g = encodeClipped(rgb[1]), b = encodeClipped(rgb[2]);
    y[i] = 0.299 * r + 0.587 * g + 0.114 * b;
    cb[i] = -0.168736 * r - 0.331264 * g + 0.5 * b;
    cr[i] = 0.5 * r - 0.418688 * g - 0.081312 * b;
  }
  return { y, cb, cr };
}
