import type { Vec3 } from './types';

// Coverage factor for about 95 % (JCGM 100:2008 §6.2–6.3), as regionUncertainty uses.
const K = 2;
/** Neighbouring pixels are not independent after demosaicing, blur and JPEG: count one in this
 * many (the same figure regionUncertainty uses for the base colour). */
const CORRELATED = 9;
/**
 * Relative standard uncertainty of the area per unit of coverage from the pure flake colour
 * (flakeEndmembers reads it from the specks' cores, which blur leaves a little impure) and, per
 * unit of JPEG quantisation scale (jpegQuantScale: ≈ 0.2 at q90, ≈ 0.5 at q75), from compression
 * smearing the specks' chroma into the base and rounding their edges. Ours: set on the synthetic
 * photos of tests/support/photoGen.ts (tests/color/coverageUncertainty.test.ts) so that the ± holds
 * the true coverage for at least 90 % of flake photos; revisit when bench photos with a counted
 * truth exist.
 */
export const U_COVERAGE_REL = 0.05;
export const U_COVERAGE_PER_COMPRESSION = 0.25;
/** Left-over floor (a fraction of the area): a few blended or glinting pixels read as flake where there is none (ours, as above). */
export const U_COVERAGE_FLOOR = 0.004;

export interface CoverageUncertaintyInputs {
  /** Linear XYZ of every sample (3 per sample). */
  xyz: Float32Array;
  /** The base colour in linear XYZ (trulyBase). */
  bx: Vec3;
  /** The samples the base was kept from (keepNearBase). */
  kept: Uint8Array;
  /** Samples taken as glare or the second colour: not counted in the area. */
  glare: Uint8Array;
  other: Uint8Array;
  /** Pure colour (linear XYZ) of each flake group and its share of the flake. */
  flake: { xyz: Vec3; share: number }[];
  /** The reported coverage (0..1). */
  coverage: number;
  /** Pixels between lattice samples (1 = every pixel). */
  step?: number;
  /** 0 lossless, else the JPEG quantisation scale (jpegQuantScale). */
  compression: number;
}

/**
 * Expanded uncertainty U = k·u_c (k = 2, about 95 %; JCGM 100:2008 §5.1.2 and §6) of a region's
 * flake coverage, as a fraction of its area. Components, combined as the root sum of squares:
 * - counting: the region's samples are a draw from the bait's surface; a share c counted on
 *   n_eff independent samples has the binomial standard error √(c(1 − c)/n_eff);
 * - unmixing: each pixel's part-flake t is its deviation from the base along the base→flake line
 *   over the line's length (linear mixing model, Keshava & Mustard, IEEE SPM 19(1), 2002); the
 *   noise of t, read from the base pixels' own scatter along that line, adds √(σ_t²/n_eff) over
 *   the counted pixels, and the base's own error (σ_t/√n_base) shifts every pixel's t at once;
 * - the pure flake colour and the compression, relative to the area (constants above).
 */
export function coverageUncertainty(x: CoverageUncertaintyInputs): number {
  const { xyz, bx, kept, glare, other, coverage } = x;
  const n = kept.length;
  const step = x.step ?? 1;
  const independent = Math.min(step * step, CORRELATED) / CORRELATED;
  let counted = 0, nBase = 0;
  for (let i = 0; i < n; i++) {
    if (glare[i] || other[i]) continue;
    counted++;
    if (kept[i]) nBase++;
  }
  if (counted === 0) return 0;
  const nEff = Math.max(1, counted * independent);
  const c = Math.min(1, Math.max(0, coverage));
  // At a coverage of 0 the binomial error is 0; a count is never surer than one counting unit.
  const counting = Math.sqrt(Math.max(c * (1 - c), 1 / nEff) / nEff);

  // σ_t² of the base pixels along each flake line, weighted by the groups' shares.
  let varT = 0, shares = 0;
  for (const f of x.flake) {
    const d = [f.xyz[0] - bx[0], f.xyz[1] - bx[1], f.xyz[2] - bx[2]];
    const norm = d[0] * d[0] + d[1] * d[1] + d[2] * d[2];
    if (!(norm > 0) || !(f.share > 0) || nBase < 2) continue;
    let s = 0, s2 = 0;
    for (let i = 0, j = 0; i < n; i++, j += 3) {
      if (!kept[i] || glare[i] || other[i]) continue;
      const t = ((xyz[j] - bx[0]) * d[0] + (xyz[j + 1] - bx[1]) * d[1] + (xyz[j + 2] - bx[2]) * d[2]) / norm;
      s += t;
      s2 += t * t;
    }
    varT += f.share * Math.max(0, (s2 - (s * s) / nBase) / (nBase - 1));
    shares += f.share;
  }
  if (shares > 0) varT /= shares;
  const unmixing = Math.sqrt(varT / nEff);
  const baseShift = (1 - c) * Math.sqrt(varT / Math.max(1, nBase * independent));
  const model = c * Math.hypot(U_COVERAGE_REL, U_COVERAGE_PER_COMPRESSION * x.compression);
  const parts = [counting, unmixing, baseShift, model, U_COVERAGE_FLOOR];
  return K * Math.sqrt(parts.reduce((sum, u) => sum + u * u, 0));
}
