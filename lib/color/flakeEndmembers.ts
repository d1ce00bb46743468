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
    const pure = m > 0 && t[from][0] >= 1 ? purestByBase(t, xyz, e, bx) : null;
    if (pure) e.splice(0, 3, ...pure);
    labInto(e[0], e[1], e[2], out, 0);
    return { lab: { l: out[0], a: out[1], b: out[2] }, xyz: e };
  });
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
function purestByBase(t: [number, number][], xyz: Float32Array, e: Vec3, bx: Vec3): Vec3 | null {
  const ee = e[0] * e[0] + e[1] * e[1] + e[2] * e[2];
  const bb = bx[0] * bx[0] + bx[1] * bx[1] + bx[2] * bx[2];
  const eb = e[0] * bx[0] + e[1] * bx[1] + e[2] * bx[2];
  const det = ee * bb - eb * eb;
  if (e[1] < SPARKLE_MIN_Y || !(det > SPARKLE_MIN_SIN2 * ee * bb)) return null;
  const scored: [number, number][] = t.map(([, j]) => {
    const pe = xyz[j] * e[0] + xyz[j + 1] * e[1] + xyz[j + 2] * e[2];
    const pb = xyz[j] * bx[0] + xyz[j + 1] * bx[1] + xyz[j + 2] * bx[2];
    return [(ee * pb - eb * pe) / det, j];
  });
  scored.sort((a, b) => a[0] - b[0]);
  const to = Math.max(1, Math.ceil((1 - ENDMEMBER_QUANTILE) * scored.length));
  const out: Vec3 = [0, 0, 0];
  for (let k = 0; k < to; k++) {
    const j = scored[k][1];
    out[0] += xyz[j]; out[1] += xyz[j + 1]; out[2] += xyz[j + 2];
  }
  return [out[0] / to, out[1] / to, out[2] / to];
}
