import type { ColorSamples, Vec3 } from './types';
import { SRGB8_TO_LINEAR } from './srgbToLinear';

/** Pixels with any 8-bit channel at or above this are clipped and say nothing about the light. */
export const NEUTRAL_CLIP = 250;

/**
 * Count-weighted mean linear-light RGB (IEC 61966-2-1 decoding, or the photo's own curves) of a region, leaving out clipped
 * pixels: the light reflected by a neutral card. `used` is how many pixels went into it.
 */
export function meanLinearRgb(
  samples: ColorSamples,
  linear: [Float64Array, Float64Array, Float64Array] = [SRGB8_TO_LINEAR, SRGB8_TO_LINEAR, SRGB8_TO_LINEAR],
): { rgb: Vec3; used: number } {
  const { rgb, counts, size } = samples;
  let r = 0, g = 0, b = 0, used = 0;
  for (let i = 0, j = 0; i < size; i++, j += 3) {
    if (rgb[j] >= NEUTRAL_CLIP || rgb[j + 1] >= NEUTRAL_CLIP || rgb[j + 2] >= NEUTRAL_CLIP) continue;
    const w = counts[i];
    used += w;
    r += w * linear[0][rgb[j]];
    g += w * linear[1][rgb[j + 1]];
    b += w * linear[2][rgb[j + 2]];
  }
  return used === 0 ? { rgb: [0, 0, 0], used } : { rgb: [r / used, g / used, b / used], used };
}
