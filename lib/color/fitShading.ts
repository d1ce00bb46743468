import { solveLinear } from './solveLinear';

/** Rounds of refitting on the pixels the last fit explains. */
const ROUNDS = 4;
/** Residual cut: this many robust standard deviations (1.4826 × MAD), and never under MIN_CUT L*. */
const CUT_SIGMAS = 3;
const MIN_CUT = 2;
/** At most this many pixels enter the fit (an even stride over the rest). */
const FIT_SAMPLE = 20_000;

/**
 * A smooth light fall-off across a region: L* = c0 + c1·u + c2·v + c3·u² + c4·u·v + c5·v² (u, v
 * the grid position scaled to −1..1), fitted by least squares (normal equations) to the pixels
 * with `include` set, then refitted ROUNDS times on those within CUT_SIGMAS robust standard
 * deviations of the fit — iteratively trimmed least squares, so flake and other outliers do not
 * pull the surface (P. J. Rousseeuw & A. M. Leroy, Robust Regression and Outlier Detection, 1987,
 * ch. 1). A quadratic is the lowest order that follows a round body lit from one side.
 * Returns the coefficients and the scaling of u, v; null when too few pixels.
 */
export function fitShading(
  L: Float64Array,
  cellX: Int32Array,
  cellY: Int32Array,
  include: Uint8Array,
  gridW: number,
  gridH: number,
): { coef: number[]; at: (gx: number, gy: number) => number } | null {
  const idx: number[] = [];
  let count = 0;
  for (let i = 0; i < include.length; i++) count += include[i];
  if (count < 30) return null;
  const every = Math.max(1, Math.floor(count / FIT_SAMPLE));
  for (let i = 0, k = 0; i < include.length; i++) if (include[i] && k++ % every === 0) idx.push(i);
  const su = 2 / Math.max(1, gridW - 1), sv = 2 / Math.max(1, gridH - 1);
  const basis = (i: number, out: number[]) => {
    const u = cellX[i] * su - 1, v = cellY[i] * sv - 1;
    out[0] = 1; out[1] = u; out[2] = v; out[3] = u * u; out[4] = u * v; out[5] = v * v;
  };
  const f = [0, 0, 0, 0, 0, 0];
  let coef: number[] | null = null;
  let use = idx;
  for (let round = 0; round <= ROUNDS; round++) {
    const A = Array.from({ length: 6 }, () => [0, 0, 0, 0, 0, 0]);
    const b = [0, 0, 0, 0, 0, 0];
    for (const i of use) {
      basis(i, f);
      for (let p = 0; p < 6; p++) {
        b[p] += f[p] * L[i];
        for (let q = p; q < 6; q++) A[p][q] += f[p] * f[q];
      }
    }
    for (let p = 0; p < 6; p++) for (let q = 0; q < p; q++) A[p][q] = A[q][p];
    const next = solveLinear(A, b);
    if (!next) break;
    coef = next;
    if (round === ROUNDS) break;
    const res = idx.map((i) => {
      basis(i, f);
      return L[i] - f.reduce((s, v, p) => s + v * coef![p], 0);
    });
    const abs = res.map(Math.abs).sort((x, y) => x - y);
    const cut = Math.max(MIN_CUT, CUT_SIGMAS * 1.4826 * abs[Math.floor(abs.length / 2)]);
    use = idx.filter((_, k) => Math.abs(res[k]) <= cut);
    if (use.length < 30) break;
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
