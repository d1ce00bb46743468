import {
  applyMat3,
  type ColorSamples,
  correctWhiteBalance,
  type Lab,
  type Mat3,
  meanLinearRgb,
  measureRegion,
  type PixelWindow,
  regionColors,
  type RegionMeasure,
  type Shape,
  shapeSpans,
  spanBounds,
  SRGB_TO_XYZ,
  xyzToLab,
} from '@/lib/color';
import { decodeImage } from './decodeImage';
import { ImageError } from './imageError';
import { inspectImage } from './inspectImage';

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
  };
  regions: (RegionMeasure & { name: string })[];
}

export interface MeasureOptions {
  /**
   * Regions with more pixels than this are measured on a regular lattice sample (every n-th pixel
   * of every n-th row, n = ceil(sqrt(pixels / maxSamples))). Half a million pixels leave the
   * sampling error far below the figures reported (tests/color/samples.test.ts compares a lattice
   * of ~20 000 with every pixel), and the lattice keeps specks in proportion. `pixels` still
   * counts the whole region and `kept` is scaled to it. Infinity measures every pixel.
   */
  maxSamples?: number;
}

export const DEFAULT_MAX_SAMPLES = 500_000;

// The region's colours, on a lattice when it holds more than maxSamples pixels (every pixel when
// the lattice would miss a thin region altogether).
function sampleRegion(window: PixelWindow, spans: Int32Array, toXyz: Mat3, maxSamples: number): ColorSamples {
  let n = 0;
  for (let s = 0; s < spans.length; s += 3) n += spans[s + 2] - spans[s + 1];
  const step = n > maxSamples ? Math.ceil(Math.sqrt(n / maxSamples)) : 1;
  const samples = regionColors(window, spans, toXyz, step);
  return samples.total > 0 || step === 1 ? samples : regionColors(window, spans, toXyz, 1);
}

/**
 * Measures named regions of a photo: header checks, then one decode of the box around all
 * regions (and the neutral patch), white balance from the neutral patch when one is given
 * (correctWhiteBalance: Bradford to D65), and measureRegion for each region. Shapes are expected
 * to have passed shapeSchema already. Throws ImageError ('empty_region' for a shape that covers
 * no pixel centre, 'unusable_neutral' for a clipped or black patch, and the decode kinds).
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
  const { window } = await decodeImage(buf, { header, crop: crop ?? undefined });

  let toXyz: Mat3 = SRGB_TO_XYZ;
  let whiteBalance: PhotoMeasure['whiteBalance'] = { applied: false, method: 'none' };
  if (neutral && neutralSpans) {
    const patch = meanLinearRgb(sampleRegion(window, neutralSpans, SRGB_TO_XYZ, maxSamples));
    if (patch.used === 0 || patch.rgb.some((v) => v <= 0)) {
      throw new ImageError(
        'unusable_neutral',
        patch.used === 0
          ? 'The neutral patch is blown out (clipped to white). Shoot with less exposure or mark a grey card.'
          : 'The neutral patch is black in at least one colour channel. Mark a grey or white card.',
      );
    }
    const wb = correctWhiteBalance(patch.rgb, neutral.L);
    toXyz = wb.toXyz;
    whiteBalance = { applied: true, method: wb.method, neutralLab: xyzToLab(applyMat3(SRGB_TO_XYZ, patch.rgb)) };
  }

  return {
    width,
    height,
    whiteBalance,
    regions: regions.map((r, i) => ({
      name: r.name,
      ...measureRegion(sampleRegion(window, spans[i], toXyz, maxSamples)),
    })),
  };
}
