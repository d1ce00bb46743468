import { kthSmallest } from './kthSmallest';
import { solveLinear } from './solveLinear';

/** Rounds of refitting on the pixels the last fit explains. */
const ROUNDS = 2;
/** Residual cut: this many robust standard deviations (1.4826 × MAD), and never under MIN_CUT L*. */
const CUT_SIGMAS = 3;
const MIN_CUT = 2;
/** At most about this many pixels enter the fit (an even stride over the rest). */
const FIT_SAMPLE = 4_000;

/**
 * A smooth light fall-off across a region: L* = c0 + c1·u + c2·v + c3·u² + c4·u·v + c5·v² (u, v
 * the grid position scaled to −1..1), fitted by least squares (normal equations) to the pixels
 * with `include` set, then refitted ROUNDS times on those within CUT_SIGMAS robust standard
 * deviations of the fit — iteratively trimmed least squares, so flake and other outliers do not
 * pull the surface (P. J. Rousseeuw & A. M. Leroy, Robust Regression and Outlier Detection, 1987,
 * ch. 1). A quadratic is the lowest order that follows a round body lit from one side.
 * Returns the surface as a function of the grid cell; null when too few pixels.
 */
export function fitShading(
  L: Float64Array,
  cellX: Int32Array,
  cellY: Int32Array,
  include: Uint8Array,
  gridW: number,
  gridH: number,
): { coef: number[]; at: (gx: number, gy: number) => number } | null {
  let count = 0;
  for (let i = 0; i < include.length; i++) count += include[i];
  if (count < 30) return null;
  const every = Math.max(1, Math.floor(count / FIT_SAMPLE));
  const m = Math.ceil(count / every);
  const su = 2 / Math.max(1, gridW - 1), sv = 2 / Math.max(1, gridH - 1);
  const U = new Float64Array(m), V = new Float64Array(m), Y = new Float64Array(m);
  let k = 0;
  for (let i = 0, seen = 0; i < include.length && k < m; i++) {
    if (!include[i] || seen++ % every !== 0) continue;
    U[k] = cellX[i] * su - 1;
    V[k] = cellY[i] * sv - 1;
    Y[k++] = L[i];
  }
  const use = new Uint8Array(k).fill(1);
  const res = new Float64Array(k);
  const scratch = new Float64Array(k);
  let coef: number[] | null = null;
  for (let round = 0; round <= ROUNDS; round++) {
    // Normal equations of the six terms 1, u, v, u², uv, v² (the upper triangle, summed as scalars).
    let s1 = 0, su1 = 0, sv1 = 0, suu = 0, suv = 0, svv = 0, suuu = 0, suuv = 0, suvv = 0, svvv = 0;
    let suuuu = 0, suuuv = 0, suuvv = 0, suvvv = 0, svvvv = 0;
    let sy = 0, suy = 0, svy = 0, suuy = 0, suvy = 0, svvy = 0;
    let used = 0;
    for (let j = 0; j < k; j++) {
      if (!use[j]) continue;
      used++;
      const u = U[j], v = V[j], y = Y[j];
      const uu = u * u, uv = u * v, vv = v * v;
      s1++; su1 += u; sv1 += v; suu += uu; suv += uv; svv += vv;
      suuu += uu * u; suuv += uu * v; suvv += u * vv; svvv += vv * v;
      suuuu += uu * uu; suuuv += uu * uv; suuvv += uu * vv; suvvv += uv * vv; svvvv += vv * vv;
      sy += y; suy += u * y; svy += v * y; suuy += uu * y; suvy += uv * y; svvy += vv * y;
    }
    if (used < 30) break;
    const rows = [
      [s1, su1, sv1, suu, suv, svv],
      [su1, suu, suv, suuu, suuv, suvv],
      [sv1, suv, svv, suuv, suvv, svvv],
      [suu, suuu, suuv, suuuu, suuuv, suuvv],
      [suv, suuv, suvv, suuuv, suuvv, suvvv],
      [svv, suvv, svvv, suuvv, suvvv, svvvv],
    ];
    const next = solveLinear(rows, [sy, suy, svy, suuy, suvy, svvy]);
    if (!next) break;
    coef = next;
    if (round === ROUNDS) break;
    const [c0, c1, c2, c3, c4, c5] = coef;
    for (let j = 0; j < k; j++) {
      const u = U[j], v = V[j];
      res[j] = Math.abs(Y[j] - (c0 + c1 * u + c2 * v + c3 * u * u + c4 * u * v + c5 * v * v));
    }
    const cut = Math.max(MIN_CUT, CUT_SIGMAS * 1.4826 * kthSmallest(res, k >> 1, scratch));
    for (let j = 0; j < k; j++) use[j] = res[j] <= cut ? 1 : 0;
  }
  if (!coef) return null;
  const c = coef;
  return {
    coef: c,
    at: (gx, gy) => {
      const u = gx * su - 1, v = gy * sv - 1;
      return c[0] + c[1] * u + c[2] * v + c[3] * u * u + c[4] * u * v + c[5] * v * v;
    },
  };
}
