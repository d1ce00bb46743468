import 'server-only';
import {
  applyMat3,
  correctWhiteBalance,
  deltaE2000,
  type Lab,
  type Mat3,
  meanLinearRgb,
  measureRegion,
  type PixelWindow,
  regionPixels,
  type RegionMeasure,
  type RegionPixels,
  type RgbProfile,
  type Shape,
  shapeSpans,
  spanBounds,
  xyzToLab,
} from '@/lib/color';
import { decodeImage } from './decodeImage';
import { ImageError } from './imageError';
import { inspectImage } from './inspectImage';
import { jpegQuantScale } from './jpegQuantScale';

export interface PhotoRegion {
  name: string;
  shape: Shape;
}

export interface NeutralPatch {
  shape: Shape;
  /** The card's nominal L*; when given, exposure is corrected too. */
  L?: number;
}

export interface PhotoMeasure {
  /** Size of the displayed (oriented) image. */
  width: number;
  height: number;
  whiteBalance: {
    applied: boolean;
    method: 'bradford' | 'none';
    /** The neutral patch as photographed (before correction): its cast and exposure. */
    neutralLab?: Lab;
    /** ΔE00 of the card from a neutral grey of the same L*, before correction (0 without a card). */
    cast: number;
    /** Why the reading may not be trustworthy, or null. */
    warning: string | null;
  };
  regions: (RegionMeasure & { name: string })[];
}

export interface MeasureOptions {
  /**
   * Regions with more pixels than this are measured on a regular lattice sample (every n-th pixel
   * of every n-th row, n = ceil(sqrt(pixels / maxSamples))). Thirty thousand pixels leave the
   * sampling error far below the figures reported (the mean of 30 000 noisy pixels moves by about
   * 0.6 % of their scatter) (tests/color/samples.test.ts compares a
   * lattice of ~20 000 with every pixel), and the lattice keeps specks in proportion. `pixels`
   * still counts the whole region and `kept` is scaled to it. Infinity measures every pixel.
   */
  maxSamples?: number;
}

export const DEFAULT_MAX_SAMPLES = 30_000;
/**
 * A card further than this (ΔE00) from grey means light far from daylight. One grey card cannot
 * tell a cast that scales the camera's channels from one the eye would adapt to (Bradford): both
 * leave the card grey once corrected, yet differ elsewhere by up to about half the card's cast
 * (tests/color/realPhotos.test.ts: under shade, ΔE00 ≈ 5 on the card, both kinds stay within 1.3;
 * under fluorescent, ≈ 14, a channel cast is left up to ≈ 5 off). Ours, set there.
 */
export const CAST_WARNING = 8;

// The region's pixels, on a lattice when it holds more than maxSamples pixels (every pixel when
// the lattice would miss a thin region altogether).
function sampleRegion(window: PixelWindow, spans: Int32Array, toXyz: Mat3, profile: RgbProfile, maxSamples: number): RegionPixels {
  let n = 0;
  for (let s = 0; s < spans.length; s += 3) n += spans[s + 2] - spans[s + 1];
  const step = n > maxSamples ? Math.ceil(Math.sqrt(n / maxSamples)) : 1;
  const rp = regionPixels(window, spans, toXyz, step, profile.linear);
  return rp.samples.total > 0 || step === 1 ? rp : regionPixels(window, spans, toXyz, 1, profile.linear);
}

/**
 * Measures named regions of a photo: header checks, then one decode of the box around all
 * regions (and the neutral patch) in the photo's own colour space (decodeImage), white balance
 * from the neutral patch when one is given (correctWhiteBalance), and measureRegion for each
 * region. A plain async function of plain inputs returning a plain object, so it can run in a
 * worker thread. Shapes are expected to have passed shapeSchema already. Throws ImageError
 * ('empty_region' for a shape that covers no pixel centre, 'unusable_neutral' for a clipped or
 * black patch, and the decode kinds).
 */
export async function measurePhoto(
  buf: Buffer,
  regions: PhotoRegion[],
  neutral?: NeutralPatch,
  { maxSamples = DEFAULT_MAX_SAMPLES }: MeasureOptions = {},
): Promise<PhotoMeasure> {
  const header = await inspectImage(buf);
  const { width, height } = header;
  const spans = regions.map((r) => {
    const s = shapeSpans(r.shape, width, height);
    if (s.length === 0) {
      throw new ImageError('empty_region', `Region "${r.name}" is too small to cover any pixel of this ${width} × ${height} photo. Draw it larger.`);
    }
    return s;
  });
  const neutralSpans = neutral ? shapeSpans(neutral.shape, width, height) : null;
  if (neutralSpans && neutralSpans.length === 0) {
    throw new ImageError('empty_region', 'The neutral patch is too small to cover any pixel of this photo. Draw it larger.');
  }
  const crop = spanBounds(...spans, ...(neutralSpans ? [neutralSpans] : []));
  const { window, profile } = await decodeImage(buf, { header, crop: crop ?? undefined });

  let toXyz: Mat3 = profile.toXyz;
  let whiteBalance: PhotoMeasure['whiteBalance'] = { applied: false, method: 'none', cast: 0, warning: null };
  if (neutral && neutralSpans) {
    const patch = meanLinearRgb(sampleRegion(window, neutralSpans, toXyz, profile, maxSamples).samples, profile.linear);
    if (patch.used === 0 || patch.rgb.some((v) => v <= 0)) {
      throw new ImageError(
        'unusable_neutral',
        patch.used === 0
          ? 'The neutral patch is blown out (clipped to white). Shoot with less exposure or mark a grey card.'
          : 'The neutral patch is black in at least one colour channel. Mark a grey or white card.',
      );
    }
    const wb = correctWhiteBalance(patch.rgb, neutral.L, profile.toXyz);
    toXyz = wb.toXyz;
    const neutralLab = xyzToLab(applyMat3(profile.toXyz, patch.rgb));
    const cast = deltaE2000(neutralLab, { l: neutralLab.l, a: 0, b: 0 });
    whiteBalance = {
      applied: true,
      method: wb.method,
      neutralLab,
      cast,
      warning:
        cast > CAST_WARNING
          ? `The grey card reads ${cast.toFixed(1)} ΔE00 off grey: the light is too far from daylight for a trustworthy correction. Reshoot under daylight-balanced light with the card in frame.`
          : null,
    };
  }

  // JPEG: how coarse its quantisation was (jpegQuantScale); WebP may be lossy: counted as a mid JPEG.
  const compression = header.format === 'png' ? 0 : header.format === 'jpeg' ? (jpegQuantScale(buf) ?? 0.5) : 0.5;
  return {
    width,
    height,
    whiteBalance,
    regions: regions.map((r, i) => ({
      name: r.name,
      ...measureRegion(sampleRegion(window, spans[i], toXyz, profile, maxSamples), { compression, cast: whiteBalance.cast }),
    })),
  };
}
