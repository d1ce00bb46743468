import type { ColorSamples } from './types';
import { weightedMedian } from './weightedMedian';

// Glare thresholds. Ours, set on synthetic and bench photos; no standard defines glare.
/** All three 8-bit channels at or above this: blown out to white by the camera. */
export const GLARE_CLIP = 250;
/** Specular: at least this much lighter (ΔL*) than the region's median L*… */
export const GLARE_DL = 15;
/** …and no more chroma than this fraction of the region's median C*ab plus GLARE_C_OFFSET. */
export const GLARE_C_RATIO = 0.5;
export const GLARE_C_OFFSET = 5;
/** If more than this fraction of the region would be glare, it is the colour, not glare. */
export const GLARE_MAX_SHARE = 0.5;

/**
 * Flags (1 = glare) the samples that are specular glare rather than the plastic's colour:
 * clipped to white (min(R, G, B) ≥ GLARE_CLIP), or bright and washed out relative to the region
 * (L* ≥ median L* + GLARE_DL and C*ab ≤ GLARE_C_RATIO · median C*ab + GLARE_C_OFFSET), since a
 * highlight adds the light's own near-white colour to the surface colour. When that would cover
 * more than GLARE_MAX_SHARE of the pixels (a white or pale bait, a blown-out photo) nothing is
 * called glare: the majority is the colour to measure.
 */
export function findGlare(samples: ColorSamples): Uint8Array {
  const { rgb, lab, counts, size, total } = samples;
  const chroma = new Float64Array(size);
  for (let i = 0, j = 0; i < size; i++, j += 3) chroma[i] = Math.sqrt(lab[j + 1] * lab[j + 1] + lab[j + 2] * lab[j + 2]);
  const lMed = weightedMedian(lab, counts, 0, 110, 0.05, undefined, 3, 0);
  const cMed = weightedMedian(chroma, counts, 0, 200, 0.05);
  const lMin = lMed + GLARE_DL;
  const cMax = GLARE_C_RATIO * cMed + GLARE_C_OFFSET;

  const glare = new Uint8Array(size);
  let weight = 0;
  for (let i = 0, j = 0; i < size; i++, j += 3) {
    const clipped = rgb[j] >= GLARE_CLIP && rgb[j + 1] >= GLARE_CLIP && rgb[j + 2] >= GLARE_CLIP;
    if (clipped || (lab[j] >= lMin && chroma[i] <= cMax)) {
      glare[i] = 1;
      weight += counts[i];
    }
  }
  if (weight > GLARE_MAX_SHARE * total) glare.fill(0);
  return glare;
}
