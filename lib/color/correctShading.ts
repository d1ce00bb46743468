import type { Lab } from './types';
import { fitShading } from './fitShading';
import { labInto } from './regionPixels';
import { D65 } from './whitePoints';

const EPSILON = 216 / 24389; // CIE 15:2004 §8.2.1 (see xyzToLab.ts)

/** A fitted fall-off smaller than this (L*) is noise: the region counts as evenly lit. */
export const SHADING_MIN = 1;

// The fall-off: fit L* on the pixels of about the base's hue (flake of another hue stays out),
// then scale each pixel's XYZ by Y(mean) / Y(fit) and recompute its Lab. Returns the L* range.
export function correctShading(lab: Float32Array, xyz: Float32Array, cx: Int32Array, cy: Int32Array, glare: Uint8Array, med: Lab, gridW: number, gridH: number): number {
  const n = glare.length;
  const L = new Float64Array(n);
  const include = new Uint8Array(n);
  const chromaGate = 6 + 0.25 * Math.hypot(med.a, med.b);
  const gate2 = chromaGate * chromaGate;
  for (let i = 0, j = 0; i < n; i++, j += 3) {
    L[i] = lab[j];
    const da = lab[j + 1] - med.a, db = lab[j + 2] - med.b;
    include[i] = !glare[i] && da * da + db * db <= gate2 ? 1 : 0;
  }
  const fit = fitShading(L, cx, cy, include, gridW, gridH);
  if (!fit) return 0;
  // The surface at each column and row (it is a quadratic in u and v), then per pixel.
  const [c0, c1, c2, c3, c4, c5] = fit.coef;
  const su = 2 / Math.max(1, gridW - 1), sv = 2 / Math.max(1, gridH - 1);
  const fitted = new Float64Array(n);
  const fitL = new Float64Array(n);
  let lo = Infinity, hi = -Infinity, ySum = 0, m = 0;
  for (let i = 0; i < n; i++) {
    const u = cx[i] * su - 1, v = cy[i] * sv - 1;
    const f = c0 + c1 * u + c2 * v + c3 * u * u + c4 * u * v + c5 * v * v;
    const t = (Math.max(0, f) + 16) / 116;
    fitL[i] = t;
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
  const cbrtMean = Math.cbrt(yMean);
  for (let i = 0, j = 0; i < n; i++, j += 3) {
    const k = yMean / fitted[i];
    const x = xyz[j] * k, y = xyz[j + 1] * k, z = xyz[j + 2] * k;
    xyz[j] = x; xyz[j + 1] = y; xyz[j + 2] = z;
    // Above CIE 15:2004's ε in all three (before and after), f = ∛(X/Xn) scales by ∛k exactly, so
    // L* + 16, a* and b* do: ∛k = ∛(Ȳ)/t with t the fit's ∛Y. Else the full conversion.
    const lowest = Math.min(x / D65[0], y, z / D65[2]);
    if (lowest > EPSILON && lowest / k > EPSILON) {
      const c = cbrtMean / fitL[i];
      lab[j] = c * (lab[j] + 16) - 16;
      lab[j + 1] *= c;
      lab[j + 2] *= c;
    } else labInto(x, y, z, lab, j);
  }
  return range;
}
