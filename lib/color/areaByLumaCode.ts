/**
 * A pixel is inside a speck above this share of the first (quantile) estimate: under a half, as
 * that estimate is the brightest sparkle's and dim specks must count; over the fifth or so of a
 * speck that the lens blurs onto the pixels beside it. Ours.
 */
const INSIDE = 0.3;
/** Fewer interior pixels than this and the quantile's mean stands. Ours. */
const MIN_INTERIOR = 10;
/** The pure flake's luma is the mean of its pixels beyond this quantile of offset from the base (as flakeEndmembers). */
const CORE_QUANTILE = 0.95;
/** The flake's luma must differ from the base's by this many noise σ and at least MIN_CONTRAST (0..1 scale, 3 codes). Ours. */
const CONTRAST_SIGMAS = 4;
const MIN_CONTRAST = 3 / 255;

export interface LumaCodeInput {
  /** Per pixel JFIF luma Y' (lumaChroma; NaN where not usable). */
  y: Float64Array;
  /** 1 for flake pixels (neither base, glare nor the second colour). */
  flake: Uint8Array;
  /** The base's luma and its noise σ (baseBehindSmear). */
  base: number;
  noise: number;
  /** Grid cell of each pixel (row-major, gridW wide; every pixel, no lattice). */
  cell: Int32Array;
  gridW: number;
  gridH: number;
}

/**
 * A flake's area from JPEG's own full-resolution channel, the luma Y' (ITU-T T.81; JFIF 1.02 §7),
 * for a flake whose lightness L* is too close to the base's for luminance to tell (areaByLuma) but
 * whose Y' is not: Y' weighs the encoded channels, so two colours of one L* and different chroma
 * differ in Y' (the "constant luminance" failure of Y'CbCr, C. Poynton, Digital Video and HD, 2nd
 * ed., ch. 28). The flake's own offset is the mean over the specks' interiors (interiorMean), or
 * of its most offset pixels (beyond CORE_QUANTILE) when the specks are too small to have any; each pixel counts by its offset over that (linear mixing:
 * N. Keshava & J. F. Mustard, IEEE Signal Processing Magazine 19(1), 2002; linear in Y' where
 * flake and base share a lightness). Returns the area in pixels, or null when the contrast is
 * too small to tell.
 */
export function areaByLumaCode({ y, flake, base, noise, cell, gridW, gridH }: LumaCodeInput): number | null {
  const offs: number[] = [];
  let sum = 0, sumFlake = 0;
  for (let i = 0; i < y.length; i++) {
    if (Number.isNaN(y[i])) continue;
    const d = y[i] - base;
    sum += d;
    if (flake[i]) {
      offs.push(d);
      sumFlake += d;
    }
  }
  if (offs.length === 0) return null;
  const sign = Math.sign(sumFlake) || 1;
  const keyed = offs.map((d) => d * sign).sort((a, b) => a - b);
  const from = Math.min(keyed.length - 1, Math.floor(CORE_QUANTILE * keyed.length));
  let core = 0;
  for (let k = from; k < keyed.length; k++) core += keyed[k];
  core /= keyed.length - from;
  if (core < Math.max(MIN_CONTRAST, CONTRAST_SIGMAS * noise)) return null;
  core = interiorMean(y, base, sign, core, cell, gridW, gridH) ?? core;
  const area = (sum * sign) / core;
  return area > 0 ? area : null;
}

/**
 * The flake's offset from the pixels inside its specks: above INSIDE of the first estimate and
 * with all eight neighbours so too. Their mean, unlike an extreme quantile, is not
 * pushed out by noise or by the brightest sparkle. Null when there are too few.
 */
function interiorMean(y: Float64Array, base: number, sign: number, first: number, cell: Int32Array, gridW: number, gridH: number): number | null {
  const high = new Uint8Array(gridW * gridH);
  for (let i = 0; i < y.length; i++) if (!Number.isNaN(y[i]) && (y[i] - base) * sign >= INSIDE * first) high[cell[i]] = 1;
  let sum = 0, count = 0;
  for (let i = 0; i < y.length; i++) {
    const c = cell[i];
    if (!high[c]) continue;
    const cx = c % gridW, cy = (c - cx) / gridW;
    if (cx === 0 || cy === 0 || cx === gridW - 1 || cy === gridH - 1) continue;
    let inside = true;
    for (let dy = -1; dy <= 1 && inside; dy++) for (let dx = -1; dx <= 1; dx++) if (!high[c + dy * gridW + dx]) { inside = false; break; }
    if (!inside) continue;
    sum += (y[i] - base) * sign;
    count++;
  }
  return count >= MIN_INTERIOR ? sum / count : null;
}
