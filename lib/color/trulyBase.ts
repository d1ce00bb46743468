import type { Lab, Vec3 } from './types';
import { boxMorphology } from './boxMorphology';
import { cie94Distances } from './cie94Distances';

const CONVERGED = 0.01; // ΔE*ab: far below anything visible or reported

/** Noise is estimated from pixels this many cells apart (JPEG shares chroma between neighbours). */
const NOISE_LAG = 2;
/** The mode is sought with a window of this many noise σ (and at least MODE_MIN, ΔE94). */
const MODE_SIGMAS = 2;
const MODE_MIN = 1;
/** Lower quartile of the χ distribution with 3 degrees of freedom (radius of a 3-D standard normal). */
const CHI3_Q25 = 1.1012;

// The base colour from the pixels that are truly base. Fine specks, blurred by the lens and
// smeared by JPEG's half-resolution chroma, tint many pixels a little: their colours skew the
// kept set toward the flake. So: (1) the noise σ from differences of kept pixels NOISE_LAG apart
// (lower quartile of their distance / (1.102·√2): the lower quartile of a 3-D normal's radius
// is 1.102 σ, the χ distribution with 3 degrees of freedom; the lower quartile, as pairs with a
// speck's rim in them sit in the upper part); (2) mean shift
// with a flat window of MODE_SIGMAS σ from the estimate to the mode of the kept colours
// (K. Fukunaga & L. Hostetler, IEEE Trans. Inf. Theory 21(1), 1975); (3) of the pixels inside
// that window, those with none outside it (glare aside) within `radius` cells; their mean in
// linear light is the base (all inside the window when too few are left).
export function trulyBase(lab: Float32Array, xyz: Float32Array, kept: Uint8Array, glare: Uint8Array, cell: Int32Array, gridW: number, gridH: number, start: Lab, keepWithin: number, radius: number): { xyz: Vec3; count: number } {
  const n = kept.length;
  const at = new Int32Array(gridW * gridH).fill(-1);
  for (let i = 0; i < n; i++) at[cell[i]] = i;
  const diffs = new Float64Array(n);
  let nd = 0;
  // An even subset of pairs is plenty for a quartile.
  for (let i = 0, by = Math.max(1, Math.floor(n / 8000)); i < n; i += by) {
    if (!kept[i] || cell[i] % gridW >= gridW - NOISE_LAG) continue;
    const j = at[cell[i] + NOISE_LAG];
    if (j < 0 || !kept[j]) continue;
    const dl = lab[i * 3] - lab[j * 3], da = lab[i * 3 + 1] - lab[j * 3 + 1], db = lab[i * 3 + 2] - lab[j * 3 + 2];
    diffs[nd++] = Math.sqrt(dl * dl + da * da + db * db);
  }
  const sorted = diffs.subarray(0, nd).sort();
  const sigma = nd ? sorted[Math.floor(nd / 4)] / (CHI3_Q25 * Math.SQRT2) : keepWithin / MODE_SIGMAS;
  const window = Math.min(keepWithin, Math.max(MODE_MIN, MODE_SIGMAS * sigma));
  const dist = new Float32Array(n);
  let centre = start;
  const near = new Uint8Array(n);
  for (let round = 0; round < 8; round++) {
    cie94Distances(lab, centre, dist);
    let sl = 0, sa = 0, sb = 0, w = 0;
    for (let i = 0; i < n; i++) {
      near[i] = !glare[i] && dist[i] <= window ? 1 : 0;
      if (!near[i]) continue;
      w++;
      sl += lab[i * 3]; sa += lab[i * 3 + 1]; sb += lab[i * 3 + 2];
    }
    if (w === 0) {
      near.set(kept);
      break;
    }
    const next = { l: sl / w, a: sa / w, b: sb / w };
    const moved = Math.hypot(next.l - centre.l, next.a - centre.a, next.b - centre.b);
    centre = next;
    if (moved < CONVERGED) break;
  }
  const outside = new Uint8Array(gridW * gridH);
  for (let i = 0; i < n; i++) if (!near[i] && !glare[i]) outside[cell[i]] = 1;
  const close = boxMorphology(outside, gridW, gridH, radius, 'dilate');
  let nearCount = 0, pure = 0;
  for (let i = 0; i < n; i++) {
    nearCount += near[i];
    if (near[i] && !close[cell[i]]) pure++;
  }
  const usePure = pure >= Math.max(30, 0.02 * nearCount);
  const bx: Vec3 = [0, 0, 0];
  let count = 0;
  for (let i = 0; i < n; i++) {
    if (!near[i] || (usePure && close[cell[i]])) continue;
    count++;
    bx[0] += xyz[i * 3]; bx[1] += xyz[i * 3 + 1]; bx[2] += xyz[i * 3 + 2];
  }
  return { xyz: [bx[0] / count, bx[1] / count, bx[2] / count], count };
}
