import type { Lab } from './types';
import { cie94Distances } from './cie94Distances';

// Thresholds of the base-colour estimate (ours, tuned on synthetic photos; see measureRegion).
/** Keep-threshold = clamp(KEEP_FACTOR × median distance to the first estimate, KEEP_MIN, KEEP_MAX). */
export const KEEP_FACTOR = 3;
export const KEEP_MIN = 4;
export const KEEP_MAX = 12;
const MAX_ITERATIONS = 8;
const CONVERGED = 0.01; // ΔE*ab: far below anything visible or reported
const ITERATE_SAMPLE = 6_000;

/**
 * Step 3 of measureRegion: from a robust start (medianLab), the mean of the pixels within T of the
 * estimate until it settles; T = clamp(3 × median distance, 4, 12) in CIE94 (CIE 116-1995,
 * graphic-arts weights: CIEDE2000's chroma weighting at a few multiplications). `dist` (per pixel,
 * to the final estimate) is kept for the later steps. A region split between two colours with
 * nothing near the median keeps all but glare.
 */
export function keepNearBase(lab: Float32Array, glare: Uint8Array, start: Lab): { base: Lab; kept: Uint8Array; keptCount: number; dist: Float32Array; keepWithin: number } {
  const n = glare.length;
  const dist = new Float32Array(n);
  let base = start;
  cie94Distances(lab, base, dist);
  const keepWithin = Math.min(KEEP_MAX, Math.max(KEEP_MIN, KEEP_FACTOR * medianOf(dist, glare)));
  // The estimate settles on an even subset (ITERATE_SAMPLE pixels at most: the mean of thousands
  // moves by far less than CONVERGED); then one pass over every pixel.
  const every = Math.max(1, Math.floor(n / ITERATE_SAMPLE));
  for (let round = 0; round < MAX_ITERATIONS; round++) {
    let sl = 0, sa = 0, sb = 0, w = 0;
    for (let i = 0; i < n; i += every) {
      if (glare[i] || !(dist[i] <= keepWithin)) continue;
      const j = i * 3;
      w++;
      sl += lab[j]; sa += lab[j + 1]; sb += lab[j + 2];
    }
    if (w === 0) break;
    const next = { l: sl / w, a: sa / w, b: sb / w };
    const moved = Math.hypot(next.l - base.l, next.a - base.a, next.b - base.b);
    base = next;
    cie94Distances(lab, base, dist, every);
    if (moved < CONVERGED) break;
  }
  if (every > 1) cie94Distances(lab, base, dist);
  const kept = new Uint8Array(n);
  let keptCount = 0;
  for (let i = 0; i < n; i++) {
    kept[i] = !glare[i] && dist[i] <= keepWithin ? 1 : 0;
    keptCount += kept[i];
  }
  if (keptCount === 0) {
    for (let i = 0; i < n; i++) kept[i] = glare[i] ? 0 : 1;
    keptCount = kept.reduce((s, v) => s + v, 0);
  }
  return { base, kept, keptCount, dist, keepWithin };
}

// Median of v over the pixels not excluded, from a histogram of 0.01 bins (exact enough for a threshold).
function medianOf(v: Float32Array, exclude: Uint8Array): number {
  const bins = new Uint32Array(20001);
  let count = 0;
  for (let i = 0; i < v.length; i++) {
    if (exclude[i]) continue;
    bins[Math.min(20000, Math.floor(v[i] * 100))]++;
    count++;
  }
  for (let b = 0, acc = 0; b < bins.length; b++) if ((acc += bins[b]) * 2 >= count) return (b + 0.5) / 100;
  return 0;
}
