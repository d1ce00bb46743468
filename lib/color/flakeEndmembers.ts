import type { Lab, Vec3 } from './types';
import { labInto } from './regionPixels';

/** The pure colour of a flake group: the mean of its pixels beyond this quantile along the base→flake line. */
export const ENDMEMBER_QUANTILE = 0.95;
/** Sparkle is looked for only in flake at least this bright (Y, white = 1) and at least this far
 * in direction from the base (sin² of the angle between them in XYZ). Ours. */
export const SPARKLE_MIN_Y = 0.1;
export const SPARKLE_MIN_SIN2 = 0.01;

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
  // Per group: t, the position along the base→mean line, and where the pixel's XYZ is.
  const size = new Int32Array(k);
  for (let p = 0; p < n; p++) size[assign[p]]++;
  const tv = groups.map((_, q) => new Float64Array(size[q]));
  const at = groups.map((_, q) => new Int32Array(size[q]));
  const fill = new Int32Array(k);
  for (let p = 0; p < n; p++) {
    const q = assign[p];
    const d = dirs[q];
    const norm = d[0] * d[0] + d[1] * d[1] + d[2] * d[2];
    if (!(norm > 0)) continue;
    const j = idx[p] * 3;
    tv[q][fill[q]] = ((xyz[j] - bx[0]) * d[0] + (xyz[j + 1] - bx[1]) * d[1] + (xyz[j + 2] - bx[2]) * d[2]) / norm;
    at[q][fill[q]++] = j;
  }
  const out = new Float64Array(3);
  return groups.map((_, q) => {
    const t = tv[q].subarray(0, fill[q]);
    const js = at[q].subarray(0, fill[q]);
    // The mean colour of the pixels beyond the quantile: observed colours, not an extrapolation.
    const m = t.length - Math.min(t.length - 1, Math.floor(ENDMEMBER_QUANTILE * t.length));
    const top = t.length ? extremeMean(t, js, xyz, m, 'high') : null;
    const e: Vec3 = top && top.edge >= 1 ? (top.mean.map((v) => Math.max(0, v)) as Vec3) : (dirs[q].map((v, c) => bx[c] + v) as Vec3); // the group mean when its core is no purer
    const pure = top && top.edge >= 1 ? purestByBase(js, xyz, e, bx) : null;
    if (pure) e.splice(0, 3, ...pure);
    labInto(e[0], e[1], e[2], out, 0);
    return { lab: { l: out[0], a: out[1], b: out[2] }, xyz: e };
  });
}

/**
 * Mean XYZ of the `m` pixels with the highest (or lowest) key, and the key where that set begins
 * (ties at the edge taken in order). A sorted copy of the keys finds the edge.
 */
function extremeMean(key: Float64Array, js: Int32Array, xyz: Float32Array, m: number, side: 'high' | 'low'): { mean: Vec3; edge: number } {
  const sorted = key.slice().sort();
  const edge = side === 'high' ? sorted[key.length - m] : sorted[m - 1];
  const sum: Vec3 = [0, 0, 0];
  let taken = 0;
  // Strictly beyond the edge first, then pixels at the edge until m are taken.
  for (const strict of [true, false])
    for (let p = 0; p < key.length && taken < m; p++) {
      const v = key[p];
      const beyond = side === 'high' ? v > edge : v < edge;
      if (strict ? !beyond : v !== edge) continue;
      const j = js[p];
      sum[0] += xyz[j]; sum[1] += xyz[j + 1]; sum[2] += xyz[j + 2];
      taken++;
    }
  return { mean: [sum[0] / taken, sum[1] / taken, sum[2] / taken], edge };
}

/**
 * Sparkle: specks of one flake catch the light differently, so its pure pixels are the flake's
 * colour at different brightness, and the farthest along the base→flake line are only the
 * brightest of them. Each pixel is written instead as a·flake + b·base (least squares in linear
 * light, flake = the first estimate `e`): a speck brighter or dimmer changes a, not b, so the
 * pixels with the least base in them (lowest b, the same ENDMEMBER_QUANTILE) are the pure ones at
 * every brightness, and their mean is the flake's mean colour. Not used when flake and base have
 * about the same chromaticity (the two columns nearly parallel: brightness and purity cannot be
 * told apart) or the flake is dark (it has no brightness to vary).
 */
function purestByBase(js: Int32Array, xyz: Float32Array, e: Vec3, bx: Vec3): Vec3 | null {
  const ee = e[0] * e[0] + e[1] * e[1] + e[2] * e[2];
  const bb = bx[0] * bx[0] + bx[1] * bx[1] + bx[2] * bx[2];
  const eb = e[0] * bx[0] + e[1] * bx[1] + e[2] * bx[2];
  const det = ee * bb - eb * eb;
  if (e[1] < SPARKLE_MIN_Y || !(det > SPARKLE_MIN_SIN2 * ee * bb)) return null;
  const share = new Float64Array(js.length);
  for (let p = 0; p < js.length; p++) {
    const j = js[p];
    const pe = xyz[j] * e[0] + xyz[j + 1] * e[1] + xyz[j + 2] * e[2];
    const pb = xyz[j] * bx[0] + xyz[j + 1] * bx[1] + xyz[j + 2] * bx[2];
    share[p] = (ee * pb - eb * pe) / det;
  }
  return extremeMean(share, js, xyz, Math.max(1, Math.ceil((1 - ENDMEMBER_QUANTILE) * js.length)), 'low').mean;
}
