import type { Lab, Vec3 } from './types';
import { boxMorphology } from './boxMorphology';
import { cie94Distances } from './cie94Distances';
import { kthSmallest } from './kthSmallest';
import type { RegionPixels } from './regionPixels';

const CONVERGED = 0.01; // ΔE*ab: far below anything visible or reported

/** Noise is estimated from pixels this many cells apart (JPEG shares chroma between neighbours). */
const NOISE_LAG = 2;
/** The mode is sought with a window of this many noise σ (and at least MODE_MIN, ΔE94). */
const MODE_SIGMAS = 2;
const MODE_MIN = 1;
/** Lower quartile of the χ distribution with 3 degrees of freedom (radius of a 3-D standard normal). */
const CHI3_Q25 = 1.1012;
const MODE_SAMPLE = 6_000;
/** On a lattice: a neighbour further than this many noise σ (of a difference) is something else. Ours. */
const ROUGH_SIGMAS = 2.5;
const ROUGH_MIN = 3;

// The base colour from the pixels that are truly base. Fine specks, blurred by the lens and
// smeared by JPEG's half-resolution chroma, tint many pixels a little: their colours skew the
// kept set toward the flake. So: (1) the noise σ from differences of kept pixels NOISE_LAG apart
// (lower quartile of their distance / (1.102·√2): the lower quartile of a 3-D normal's radius
// is 1.102 σ, the χ distribution with 3 degrees of freedom; the lower quartile, as pairs with a
// speck's rim in them sit in the upper part); (2) mean shift
// with a flat window of MODE_SIGMAS σ from the estimate to the mode of the kept colours
// (K. Fukunaga & L. Hostetler, IEEE Trans. Inf. Theory 21(1), 1975); (3) of the pixels inside
// that window, those with none outside it (glare aside) within `radius` cells, or 1 cell when
// too few are left; their mean in linear light is the base (all inside the window when even
// those are too few).
export interface TrulyBaseInput {
  lab: Float32Array;
  xyz: Float32Array;
  kept: Uint8Array;
  glare: Uint8Array;
  rp: RegionPixels;
  start: Lab;
  keepWithin: number;
  /** Pixels around a base pixel that must hold nothing else (1, or 2 when JPEG smears chroma). */
  radius: 1 | 2;
}

export function trulyBase({ lab, xyz, kept, glare, rp, start, keepWithin, radius }: TrulyBaseInput): { xyz: Vec3; count: number; mask: Uint8Array } {
  const { cell, gridW, gridH } = rp;
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
  const sigma = nd ? kthSmallest(diffs.subarray(0, nd), Math.floor(nd / 4)) / (CHI3_Q25 * Math.SQRT2) : keepWithin / MODE_SIGMAS;
  const window = Math.min(keepWithin, Math.max(MODE_MIN, MODE_SIGMAS * sigma));
  const dist = new Float32Array(n);
  let centre = start;
  // The mode settles on an even subset (MODE_SAMPLE pixels at most), then one pass over all.
  const every = Math.max(1, Math.floor(n / MODE_SAMPLE));
  for (let round = 0; round < 8; round++) {
    cie94Distances(lab, centre, dist, every);
    let sl = 0, sa = 0, sb = 0, w = 0;
    for (let i = 0; i < n; i += every) {
      if (glare[i] || !(dist[i] <= window)) continue;
      w++;
      sl += lab[i * 3]; sa += lab[i * 3 + 1]; sb += lab[i * 3 + 2];
    }
    if (w === 0) break;
    const next = { l: sl / w, a: sa / w, b: sb / w };
    const moved = Math.hypot(next.l - centre.l, next.a - centre.a, next.b - centre.b);
    centre = next;
    if (moved < CONVERGED) break;
  }
  cie94Distances(lab, centre, dist);
  const near = new Uint8Array(n);
  let anyNear = false;
  for (let i = 0; i < n; i++) {
    near[i] = !glare[i] && dist[i] <= window ? 1 : 0;
    if (near[i]) anyNear = true;
  }
  if (!anyNear) near.set(kept);
  // The widest clearance that still leaves enough pixels, `radius` down to 1: with dense flake few
  // pixels are 2 cells from every speck, and the nearest-but-one are still far less tinted than all.
  const enough = (pure: number, nearCount: number) => pure >= Math.max(30, 0.02 * nearCount);
  let close: Uint8Array = new Uint8Array(n);
  let usePure = false;
  for (let r = radius; r >= 1 && !usePure; r--) {
    close = rp.rough ? roughOnLattice(rp, near, rp.rough[r - 1]) : besideOther(near, glare, rp, r);
    let nearCount = 0, pure = 0;
    for (let i = 0; i < n; i++) {
      nearCount += near[i];
      if (near[i] && !close[i]) pure++;
    }
    usePure = enough(pure, nearCount);
  }
  const bx: Vec3 = [0, 0, 0];
  const mask = new Uint8Array(n);
  let count = 0;
  for (let i = 0; i < n; i++) {
    if (!near[i] || (usePure && close[i])) continue;
    count++;
    mask[i] = 1;
    bx[0] += xyz[i * 3]; bx[1] += xyz[i * 3 + 1]; bx[2] += xyz[i * 3 + 2];
  }
  return { xyz: [bx[0] / count, bx[1] / count, bx[2] / count], count, mask };
}

// Every pixel measured: a near pixel is close to something else when a pixel within `radius`
// cells is neither near nor glare (a dilation of those pixels, boxMorphology).
function besideOther(near: Uint8Array, glare: Uint8Array, rp: RegionPixels, radius: number): Uint8Array {
  const { cell, gridW, gridH } = rp;
  const outside = new Uint8Array(gridW * gridH);
  for (let i = 0; i < near.length; i++) if (!near[i] && !glare[i]) outside[cell[i]] = 1;
  const dilated = boxMorphology(outside, gridW, gridH, radius, 'dilate');
  const close = new Uint8Array(near.length);
  for (let i = 0; i < near.length; i++) close[i] = dilated[cell[i]];
  return close;
}

// On a lattice the neighbours that matter are not sampled: a sample is close to something else
// when a full-resolution neighbour differs from it by more than noise does (regionPixels' rough).
// The noise: the robust σ of code differences between near samples one lattice step apart
// (independent pixels): median |Δ| / (0.6745·√2) (normal MAD); the limit is ROUGH_SIGMAS of
// the difference of two pixels, never under ROUGH_MIN codes.
function roughOnLattice(rp: RegionPixels, near: Uint8Array, rough: Uint8Array): Uint8Array {
  const { cell, gridW, sample, samples } = rp;
  const rgb = samples.rgb;
  const n = near.length;
  const at = new Int32Array(rp.gridW * rp.gridH).fill(-1);
  for (let i = 0; i < n; i++) at[cell[i]] = i;
  const hist = new Uint32Array(256);
  let pairs = 0;
  for (let i = 0; i < n; i++) {
    if (!near[i] || cell[i] % gridW === gridW - 1) continue;
    const j = at[cell[i] + 1];
    if (j < 0 || !near[j]) continue;
    const a = sample[i] * 3, b = sample[j] * 3;
    for (let c = 0; c < 3; c++) hist[Math.abs(rgb[a + c] - rgb[b + c])]++;
    pairs += 3;
  }
  let median = 0;
  for (let acc = 0; median < 255 && (acc += hist[median]) * 2 < pairs; median++);
  const sigma = median / (0.6745 * Math.SQRT2);
  const limit = Math.max(ROUGH_MIN, ROUGH_SIGMAS * sigma * Math.SQRT2);
  const close = new Uint8Array(n);
  for (let i = 0; i < n; i++) close[i] = rough[i] > limit ? 1 : 0;
  return close;
}
