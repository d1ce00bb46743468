import type { Vec3 } from './types';
import { solveLinear } from './solveLinear';

/**
 * Linear spectral unmixing with non-negative abundances (the linear mixing model of remote
 * sensing: N. Keshava & J. F. Mustard, "Spectral unmixing", IEEE Signal Processing Magazine 19(1),
 * 2002): in linear light a pixel that is part flake and part base is base + Σ αk·(flakek − base).
 * Because the model is linear, the sum of every pixel's abundances equals the abundances of the
 * summed deviations, so `sum` (Σ over the pixels of pixel − base, linear XYZ) is unmixed once.
 * Non-negativity by trying every subset of endmembers (at most 3, so 7 subsets) and keeping the
 * feasible least-squares fit, growing the number of endmembers only while each halves the residual. Returns the pixel-area of each endmember.
 */
/** One more endmember must bring the squared residual below this share of the fit without it (ours). */
export const UNMIX_GAIN = 0.5;

export function unmixCoverage(sum: Vec3, base: Vec3, ends: Vec3[]): number[] {
  const dirs = ends.map((e) => [e[0] - base[0], e[1] - base[1], e[2] - base[2]]);
  const k = dirs.length;
  const total = sum[0] ** 2 + sum[1] ** 2 + sum[2] ** 2;
  // Best feasible fit for each number of endmembers.
  const bySize: { err: number; x: number[] }[] = [];
  for (let set = 1; set < 1 << k; set++) {
    const cols = [...Array(k).keys()].filter((j) => set & (1 << j));
    const A = cols.map((p) => cols.map((q) => dirs[p][0] * dirs[q][0] + dirs[p][1] * dirs[q][1] + dirs[p][2] * dirs[q][2]));
    const b = cols.map((p) => dirs[p][0] * sum[0] + dirs[p][1] * sum[1] + dirs[p][2] * sum[2]);
    const x = solveLinear(A, b);
    if (!x || x.some((v) => v < 0)) continue;
    const r = [0, 1, 2].map((c) => sum[c] - cols.reduce((s, p, j) => s + x[j] * dirs[p][c], 0));
    const err = r[0] ** 2 + r[1] ** 2 + r[2] ** 2;
    const size = cols.length;
    if (!bySize[size] || err < bySize[size].err) {
      const full = new Array(k).fill(0);
      cols.forEach((p, j) => (full[p] = x[j]));
      bySize[size] = { err, x: full };
    }
  }
  // Fewest endmembers first: one more is taken only when it at least halves the residual
  // (UNMIX_GAIN). Two colours pointing nearly opposite ways from the base (a flake and a JPEG's
  // chroma overshoot around it) otherwise cancel each other into a large, false area.
  let best: { err: number; x: number[] } = { err: total, x: new Array(k).fill(0) };
  for (const fit of bySize) {
    if (!fit || !(fit.err < UNMIX_GAIN * best.err)) continue;
    best = fit;
  }
  return best.x;
}
