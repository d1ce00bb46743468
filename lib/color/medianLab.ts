import type { Lab } from './types';
import { weightedMedian } from './weightedMedian';

/**
 * Per-channel count-weighted median of distinct colours (interleaved l, a, b): the robust start of
 * the base colour, which flake and glare cannot pull while they are under half the pixels.
 */
export function medianLab(lab: Float64Array, counts: Uint32Array): Lab {
  const at = (offset: number, range: [number, number]) => weightedMedian(lab, counts, { range, step: 0.05, stride: 3, offset });
  return { l: at(0, [-1, 110]), a: at(1, [-200, 200]), b: at(2, [-200, 200]) };
}
