import type { Lab } from './types';
import { deltaE2000 } from './deltaE2000';

// Standard uncertainties (ΔE00, one standard deviation) of the parts that do not come from the
// photo's own scatter. Ours: set on the synthetic photos of tests/support/photoGen.ts so that the
// expanded uncertainty holds the true error for at least 90 % of regions
// (tests/color/uncertainty.test.ts); revisit them when real bench photos with a measured truth exist.
/** 8-bit quantisation and the file's encoding: lossless, and per unit of JPEG quantisation scale
 * (jpegQuantScale: ≈ 0.2 at q90, ≈ 0.5 at q75), for 4:2:0 chroma and quantisation. */
export const U_LOSSLESS = 0.08;
export const U_PER_COMPRESSION = 0.9;
/** Per L* of fitted fall-off: the quadratic never follows the light exactly. */
export const U_PER_SHADING = 0.03;
/** Per unit coverage × ΔE00 from base to flake: blended rims left in the base; grows with the
 * compression (JPEG smears the flake's chroma into the base). */
export const U_PER_FLAKE = 0.02;
export const U_PER_FLAKE_COMPRESSED = 0.12;
/** When a second colour was cut out of the region. */
export const U_OTHER = 0.2;
/** Neighbouring pixels are not independent after demosaicing, blur and JPEG: count one in this many. */
export const CORRELATED_PIXELS = 9;
/** Coverage factor for about 95 % (JCGM 100:2008 §6.2–6.3). */
export const K = 2;

export interface UncertaintyInputs {
  /** Median ΔE00 of the kept pixels to the base. */
  spread: number;
  /** Sampled pixels the base was averaged from. */
  basePixels: number;
  /** Pixels between lattice samples (1 = every pixel): samples this far apart are independent. */
  step?: number;
  /** 0 lossless, else the JPEG quantisation scale. */
  compression: number;
  shading: number;
  coverage: number;
  flake: Lab[];
  base: Lab;
  other: number;
  /** ΔE00 between the two corrections the grey card allows (castAmbiguity; 0 without a card). */
  lightModel: number;
}

/**
 * Expanded uncertainty U = k·u_c of a region's base colour, as a ΔE00 radius (JCGM 100:2008,
 * "GUM": combined standard uncertainty as the root sum of squares of uncorrelated components,
 * §5.1.2, expanded with k = 2, §6). Components: the scatter of the mean (the spread as a standard
 * deviation, 1.4826 × median for a normal distribution, over the square root of the effectively
 * independent pixels), the encoding, the fall-off model, left-over flake, a cut-out second colour
 * and the light correction.
 */
export function regionUncertainty(x: UncertaintyInputs): number {
  // Neighbours share their noise (one in CORRELATED_PIXELS counts); lattice samples 3 or more
  // pixels apart do not, so each counts once.
  const step = x.step ?? 1;
  const nEff = Math.max(1, (x.basePixels * Math.min(step * step, CORRELATED_PIXELS)) / CORRELATED_PIXELS);
  const scatter = (1.4826 * x.spread) / Math.sqrt(nEff);
  const flakeDistance = x.flake.reduce((m, f) => Math.max(m, deltaE2000(x.base, f)), 0);
  const parts = [
    scatter,
    Math.hypot(U_LOSSLESS, U_PER_COMPRESSION * x.compression),
    U_PER_SHADING * x.shading,
    (U_PER_FLAKE + U_PER_FLAKE_COMPRESSED * x.compression) * x.coverage * flakeDistance,
    x.other > 0 ? U_OTHER : 0,
    // The truth lies between the two readings: a rectangular distribution of half-width D about
    // the one reported, u = D/√3 (JCGM 100:2008 §4.3.7).
    x.lightModel / Math.sqrt(3),
  ];
  return K * Math.sqrt(parts.reduce((s, u) => s + u * u, 0));
}
