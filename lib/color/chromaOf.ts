import type { Vec3 } from './types';
import { encodeClipped } from './encodeClipped';

/** JFIF's chroma Cb, Cr (JFIF 1.02 §7; 0..1 scale, centred on 0) of a linear RGB colour, encoded and clipped as a camera does. */
export function chromaOf(rgb: Vec3): [number, number] {
  const r = encodeClipped(rgb[0]), g = encodeClipped(rgb[1]), b = encodeClipped(rgb[2]);
  return [-0.168736 * r - 0.331264 * g + 0.5 * b, 0.5 * r - 0.418688 * g - 0.081312 * b];
}
