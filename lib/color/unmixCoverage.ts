import type { Vec3 } from './types';
import { solveLinear } from './solveLinear';

/**
 * Linear spectral unmixing with non-negative abundances (the linear mixing model of remote
 * sensing: N. Keshava & J. F. Mustard, "Spectral unmixing", IEEE Signal Processing Magazine 19(1),
 * 2002): in linear light a pixel that is part flake and part base is base + Σ αk·(flakek − base).
 * Because the model is linear, the sum of every pixel's abundances equals the abundances of the
 * summed deviations, so `sum` (Σ over the pixels of pixel − base, linear XYZ) is unmixed once.
 * Non-negativity by trying every subset of endmembers (at most 3, so 7 subsets) and keeping the
 * feasible least-squares fit with the smallest residual. Returns the pixel-area of each endmember.
 */
export function unmixCoverage(sum: Vec3, base: Vec3, ends: Vec3[]): number[] {
  const dirs = ends.map((e) => [e[0] - base[0], e[1] - base[1], e[2] - base[2]]);
  const k = dirs.length;
  let best: number[] = new Array(k).fill(0);
  let bestErr = sum[0] ** 2 + sum[1] ** 2 + sum[2] ** 2;
  for (let set = 1; set < 1 << k; set++) {
    const cols = [...Array(k).keys()].filter((j) => set & (1 << j));
    const A = cols.map((p) => cols.map((q) => dirs[p][0] * dirs[q][0] + dirs[p][1] * dirs[q][1] + dirs[p][2] * dirs[q][2]));
    const b = cols.map((p) => dirs[p][0] * sum[0] + dirs[p][1] * sum[1] + dirs[p][2] * sum[2]);
    const x = solveLinear(A, b);
    if (!x || x.some((v) => v < 0)) continue;
    const r = [0, 1, 2].map((c) => sum[c] - cols.reduce((s, p, j) => s + x[j] * dirs[p][c], 0));
    const err = r[0] ** 2 + r[1] ** 2 + r[2] ** 2;
    if (err < bestErr - 1e-18) {
      bestErr = err;
      best = new Array(k).fill(0);
      cols.forEach((p, j) => (best[p] = x[j]));
    }
  }
  return best;
}
