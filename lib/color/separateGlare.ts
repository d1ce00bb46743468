import type { RegionPixels } from './regionPixels';
import { findGlareByShape } from './findGlareByShape';

/**
 * Step 1 of measureRegion: the glare (findGlareByShape), one flag per sampled pixel, and how many
 * pixels of each distinct colour are left (`live`). A region that is all glare keeps every pixel:
 * there is nothing else to measure.
 */
export function separateGlare(rp: RegionPixels): { glare: Uint8Array; glareCount: number; live: Uint32Array } {
  const { samples, sample } = rp;
  const n = samples.total;
  const glare = findGlareByShape(rp);
  let glareCount = 0;
  const live = new Uint32Array(samples.size);
  for (let i = 0; i < n; i++) {
    if (glare[i]) glareCount++;
    else live[sample[i]]++;
  }
  if (glareCount === n) {
    glare.fill(0);
    return { glare, glareCount: 0, live: samples.counts.slice() };
  }
  return { glare, glareCount, live };
}
