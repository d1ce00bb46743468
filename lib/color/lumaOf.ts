import type { Vec3 } from './types';
import { encodeClipped } from './encodeClipped';

/** JFIF's luma Y' (JFIF 1.02 §7, ITU-R BT.601 weights) of a linear RGB colour, encoded and clipped as a camera does. */
export function lumaOf(rgb: Vec3): number {
  return 0.299 * encodeClipped(rgb[0]) + 0.587 * encodeClipped(rgb[1]) + 0.114 * encodeClipped(rgb[2]);
}
