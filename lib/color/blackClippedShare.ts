import type { ColorSamples } from './types';

/**
 * Share of a region's sampled pixels with a channel at code 0: clipped to black. A light far from
 * daylight (or a strong cast the camera could not hold) can push a channel of a saturated colour
 * below what the sensor records; what was there is lost, and no correction brings it back.
 */
export function blackClippedShare(samples: ColorSamples): number {
  const { rgb, counts, size, total } = samples;
  let clipped = 0;
  for (let i = 0, j = 0; i < size; i++, j += 3) if (rgb[j] === 0 || rgb[j + 1] === 0 || rgb[j + 2] === 0) clipped += counts[i];
  return total ? clipped / total : 0;
}
