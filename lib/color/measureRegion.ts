import type { Mat3, RegionMeasure, Vec3 } from './types';
import { type RegionLuma, regionLuma } from './regionLuma';
import { smearedFlake } from './smearedFlake';
import { castAmbiguity } from './castAmbiguity';
import { correctShading } from './correctShading';
import { coverageUncertainty } from './coverageUncertainty';
import { findOtherColour } from './findOtherColour';
import { keepNearBase } from './keepNearBase';
import { labToHex } from './labToHex';
import { labToXyz } from './labToXyz';
import { type FlakeInput, measureFlake } from './measureFlake';
import { medianLab } from './medianLab';
import { medianSpread } from './medianSpread';
import { pixelColours } from './pixelColours';
import { labInto, type RegionPixels } from './regionPixels';
import { regionUncertainty } from './regionUncertainty';
import { separateGlare } from './separateGlare';
import { trulyBase } from './trulyBase';

/**
 * Chroma smeared this coarsely (jpegQuantScale: 0.2 at JPEG q90, 0.5 at q75; this is about q82)
 * is read through the luma (smearedFlake). Finer, the truly base pixels are clean enough. Ours,
 * from tests/color/fineFlake.test.ts.
 */
export const SMEAR_COMPRESSION = 0.35;

export interface RegionContext {
  /** How coarse the file's lossy compression was: 0 lossless, ≈ 0.2 JPEG q90, ≈ 0.5 q75 (jpegQuantScale). */
  compression?: number;
  /** Chroma kept at lower resolution than luma (JPEG 4:2:0 or 4:2:2, lossy WebP): flake area from luminance. */
  subsampled?: boolean;
  /** With a grey card: the other correction's XYZ over the one applied (castAmbiguity). */
  otherLight?: Mat3;
  /** The photo's linear RGB → XYZ as applied (card included): with subsampled chroma, flake is read through luma (regionLuma, smearedFlake). */
  toXyz?: Mat3;
}

/**
 * Robust base colour, flake, glare, shading and a second colour of a region (regionPixels), in
 * seven steps, each its own function:
 * 1. Glare by shape (separateGlare: connected clipped streaks and blobs, not small specks).
 * 2. Shading (correctShading): a quadratic surface of L* across the region, robust to flake,
 *    divides the light fall-off out of every pixel in linear light; its L* range is `shading`.
 * 3. Base (keepNearBase): from the per-channel median (medianLab), the mean of the pixels near
 *    the estimate until it settles.
 * 4. Other (findOtherColour): a solid, connected second colour among the pixels that are not base.
 * 5. The base colour is the mean in linear light of the truly base pixels (trulyBase): kept, and
 *    with no non-base pixel close by, so specks blurred into their neighbours do not tint it.
 * 6. Flake (measureFlake): colour groups, pure colours and the area by linear unmixing (by
 *    luminance alone when the chroma is subsampled and the flake's lightness differs enough, by
 *    JPEG's luma Y' when only that differs: regionLuma, areaByLumaCode). With coarsely
 *    subsampled chroma (SMEAR_COMPRESSION) the base is read from behind the smear and the flake
 *    measured again against it (smearedFlake).
 * 7. The ± (regionUncertainty; coverageUncertainty for the flake's area); spread = median
 *    CIEDE2000 of the kept pixels to the base.
 */
export function measureRegion(rp: RegionPixels, ctx: RegionContext = {}): RegionMeasure {
  const { samples, gridW, gridH, cell, step } = rp;
  const n = samples.total;
  if (n === 0) throw new RangeError('region has no pixels');
  const { glare, glareCount, live } = separateGlare(rp);
  const start = medianLab(samples.lab, live);
  const { lab, xyz, cx, cy } = pixelColours(rp);
  const shading = correctShading(lab, xyz, cx, cy, glare, start, gridW, gridH);
  const { base: near, kept, keptCount, dist, keepWithin } = keepNearBase(lab, glare, start);

  const off = new Uint8Array(n);
  for (let i = 0; i < n; i++) off[i] = !glare[i] && !kept[i] ? 1 : 0;
  const other = findOtherColour(off, cell, lab, gridW, gridH, step);
  const otherMask = other?.mask ?? new Uint8Array(n);
  let otherCount = 0;
  for (let i = 0; i < n; i++) otherCount += otherMask[i];

  const truly = trulyBase({ lab, xyz, kept, glare, rp, start: near, keepWithin, radius: (ctx.compression ?? 0) > 0 ? 2 : 1 });
  const nb = truly.count;
  const flakeOf = (bx: Vec3, oneColour = false, luma?: FlakeInput['luma']) => {
    const out = new Float64Array(3);
    labInto(bx[0], bx[1], bx[2], out, 0);
    const base = { l: out[0], a: out[1], b: out[2] };
    return { base, bx, ...measureFlake({ lab, xyz, dist, keepWithin, off, other: otherMask, glare, base, bx, lumaArea: ctx.subsampled ?? false, oneColour, luma }) };
  };
  // With subsampled chroma (JPEG 4:2:0) each pixel's luma is still its own: read it once.
  // (Only when a step needs it: it costs a conversion of every pixel.)
  let rl: RegionLuma | null | undefined;
  const getLuma = () => (rl === undefined ? (rl = ctx.subsampled && ctx.toXyz && step === 1 ? regionLuma(xyz, glare, otherMask, truly.mask, rp, ctx.toXyz) : null) : rl);
  // Coarse chroma tints every pixel near a speck and spreads a speck's colour: read through the
  // luma. (Finer, the flake's own pixels keep enough of its colour to unmix: a mixture's luma can
  // overshoot both colours, which luma alone cannot read.)
  const smeared = (ctx.compression ?? 0) >= SMEAR_COMPRESSION;
  let flake = flakeOf(truly.xyz, false, smeared ? () => getLuma()?.luma ?? null : undefined);
  const coarse = ctx.toXyz && smeared && flake.groups.length > 0 ? getLuma() : null;
  if (coarse && ctx.toXyz) flake = smearedFlake(coarse, truly.mask, rp, ctx.toXyz, flakeOf) ?? flake;
  const base = flake.base;
  const coverage = Math.min(flake.area / n, (n - glareCount - otherCount) / n);
  const spread = medianSpread(lab, kept, base, keptCount);
  const otherOut = other ? { share: otherCount / n, lab: other.lab } : null;
  return {
    lab: base,
    hex: labToHex(base),
    pixels: samples.pixels,
    kept: Math.round((keptCount * samples.pixels) / n),
    spread,
    glare: glareCount / n,
    flake: {
      coverage,
      coverageUncertainty: coverageUncertainty({
        xyz, bx: flake.bx, kept, glare, other: otherMask, coverage, step, compression: ctx.compression ?? 0,
        flake: flake.groups.map((g) => ({ xyz: labToXyz(g.lab), share: g.share })),
      }),
      groups: flake.groups,
    },
    uncertainty: regionUncertainty({
      spread,
      basePixels: nb,
      step,
      compression: ctx.compression ?? 0,
      shading,
      coverage,
      flake: flake.groups.map((g) => g.lab),
      base,
      other: otherOut?.share ?? 0,
      lightModel: ctx.otherLight ? castAmbiguity(base, ctx.otherLight).dE00 : 0,
    }),
    shading,
    other: otherOut,
  };
}
