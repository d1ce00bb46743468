import type { Lab } from './types';
import { fitShading } from './fitShading';
import { labInto } from './regionPixels';

/** A fitted fall-off smaller than this (L*) is noise: the region counts as evenly lit. */
export const SHADING_MIN = 1;

// The fall-off: fit L* on the pixels of about the base's hue (flake of another hue stays out),
// then scale each pixel's XYZ by Y(mean) / Y(fit) and recompute its Lab. Returns the L* range.
export function correctShading(lab: Float32Array, xyz: Float32Array, cx: Int32Array, cy: Int32Array, glare: Uint8Array, med: Lab, gridW: number, gridH: number): number {
  const n = glare.length;
  const L = new Float64Array(n);
  const include = new Uint8Array(n);
  const chromaGate = 6 + 0.25 * Math.hypot(med.a, med.b);
  for (let i = 0; i < n; i++) {
    L[i] = lab[i * 3];
    include[i] = !glare[i] && Math.hypot(lab[i * 3 + 1] - med.a, lab[i * 3 + 2] - med.b) <= chromaGate ? 1 : 0;
  }
  const fit = fitShading(L, cx, cy, include, gridW, gridH);
  if (!fit) return 0;
  const fitted = new Float64Array(n);
  let lo = Infinity, hi = -Infinity, ySum = 0, m = 0;
  for (let i = 0; i < n; i++) {
    const f = fit.at(cx[i], cy[i]);
    const t = (Math.max(0, f) + 16) / 116;
    fitted[i] = t * t * t;
    if (glare[i]) continue;
    if (f < lo) lo = f;
    if (f > hi) hi = f;
    ySum += fitted[i];
    m++;
  }
  const range = hi - lo;
  if (!(range >= SHADING_MIN) || m === 0) return 0;
  const yMean = ySum / m;
  for (let i = 0, j = 0; i < n; i++, j += 3) {
    const k = yMean / fitted[i];
    xyz[j] *= k; xyz[j + 1] *= k; xyz[j + 2] *= k;
    labInto(xyz[j], xyz[j + 1], xyz[j + 2], lab, j);
  }
  return range;
}
