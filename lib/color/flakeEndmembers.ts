import type { Lab, Vec3 } from './types';
import { labInto } from './regionPixels';

/** The pure colour of a flake group: the mean of its pixels beyond this quantile along the base→flake line. */
export const ENDMEMBER_QUANTILE = 0.95;

/**
 * The pure colour (endmember) of each flake group, for unmixing. A group's mean is pulled toward
 * the base by the blended rims of its specks, so each flake pixel (Lab `fl`, linear XYZ at
 * `xyz[3·idx]`) joins its nearest group (ΔE*ab), is projected in linear light onto the line from
 * the base `bx` through the group's mean, and the endmember is the mean of the pixels beyond the
 * ENDMEMBER_QUANTILE point along it: the cores of the specks, where a pixel is all flake (ours; a pixel-purity choice in the
 * spirit of the pixel purity index, J. W. Boardman et al., JPL Pub. 95-1, 1995).
 */
export function flakeEndmembers(groups: Lab[], fl: Float64Array, idx: Int32Array, xyz: Float32Array, bx: Vec3): { lab: Lab; xyz: Vec3 }[] {
  const k = groups.length;
  if (k === 0) return [];
  const n = idx.length;
  const assign = new Int32Array(n);
  const mean = groups.map(() => [0, 0, 0, 0]);
  for (let p = 0; p < n; p++) {
    let best = 0, bestD = Infinity;
    for (let g = 0; g < k; g++) {
      const d = (fl[p * 3] - groups[g].l) ** 2 + (fl[p * 3 + 1] - groups[g].a) ** 2 + (fl[p * 3 + 2] - groups[g].b) ** 2;
      if (d < bestD) {
        bestD = d;
        best = g;
      }
    }
    assign[p] = best;
    const j = idx[p] * 3;
    mean[best][0] += xyz[j]; mean[best][1] += xyz[j + 1]; mean[best][2] += xyz[j + 2]; mean[best][3]++;
  }
  const dirs = mean.map((m) => (m[3] ? [m[0] / m[3] - bx[0], m[1] / m[3] - bx[1], m[2] / m[3] - bx[2]] : [0, 0, 0]));
  // Per group: (t, pixel) pairs, t the position along the base→mean line.
  const ts: [number, number][][] = groups.map(() => []);
  for (let p = 0; p < n; p++) {
    const d = dirs[assign[p]];
    const norm = d[0] * d[0] + d[1] * d[1] + d[2] * d[2];
    if (!(norm > 0)) continue;
    const j = idx[p] * 3;
    ts[assign[p]].push([((xyz[j] - bx[0]) * d[0] + (xyz[j + 1] - bx[1]) * d[1] + (xyz[j + 2] - bx[2]) * d[2]) / norm, j]);
  }
  const out = new Float64Array(3);
  return groups.map((g, q) => {
    const t = ts[q].sort((a, b) => a[0] - b[0]);
    // The mean colour of the pixels beyond the quantile: observed colours, not an extrapolation.
    const from = Math.min(t.length - 1, Math.floor(ENDMEMBER_QUANTILE * t.length));
    const e: Vec3 = [0, 0, 0];
    const to = t.length;
    for (let k = from; k < to; k++) {
      const j = t[k][1];
      e[0] += xyz[j]; e[1] += xyz[j + 1]; e[2] += xyz[j + 2];
    }
    const m = to - from;
    if (m > 0 && t[from][0] >= 1) for (let c = 0; c < 3; c++) e[c] = Math.max(0, e[c] / m);
    else e.splice(0, 3, ...dirs[q].map((v, c) => bx[c] + v)); // the group mean when its core is no purer
    labInto(e[0], e[1], e[2], out, 0);
    return { lab: { l: out[0], a: out[1], b: out[2] }, xyz: e };
  });
}
