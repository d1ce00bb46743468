import 'server-only';
import {
  blackClippedShare,
  castAmbiguity,
  type Lab,
  type Mat3,
  measureRegion,
  patchSample,
  type PixelWindow,
  type RegionContext,
  regionPixels,
  type RegionMeasure,
  type RegionPixels,
  type RgbProfile,
  type Shape,
  shapeSpans,
  SMEAR_COMPRESSION,
  spanBounds,
} from '@/lib/color';
import { type CardBalance, whiteBalanceFromCard } from './whiteBalanceFromCard';
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
    /** 'channel': a scale of each channel of the photo's own linear RGB, set by the card. */
    method: 'channel' | 'none';
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
   * Regions of four times this many pixels or more are measured on a regular lattice sample
   * (every n-th pixel of every n-th row, n = floor(sqrt(pixels / maxSamples)), so at least
   * maxSamples and under four times as many; smaller regions in every pixel). Ten thousand samples
   * leave the sampling error far below the figures reported: lattice points several pixels apart
   * carry independent noise, so their mean moves by 1 % of their scatter, and a coverage of 10 % is
   * counted to ±0.3 % (one standard error, binomial); the ± counts them as such
   * (regionUncertainty). tests/color/samples.test.ts compares the default lattice with every
   * pixel on a realistic 1600 × 1200 photo. `pixels` still counts the whole region and `kept` is
   * scaled to it. Infinity measures every pixel.
   */
  maxSamples?: number;
}

export const DEFAULT_MAX_SAMPLES = 10_000;
/**
 * A region whose two card corrections (whiteBalanceFromCard) differ by more than this (ΔE00) gets
 * the warning: either could be the truth, so the reading may be off by about this much. Ours: the
 * table of issue 11 asks for ≤ 2.5 where no warning is given; 2.0 leaves room for the photo's own
 * noise and compression on top (tests/color/realPhotos.test.ts).
 */
export const LIGHT_AMBIGUITY_WARNING = 2;
/** A region with at least this share of its pixels clipped to black in a channel gets a warning (ours). */
export const BLACK_CLIP_WARNING = 0.2;

// The region's pixels, on a lattice when it holds more than maxSamples pixels (every pixel when
// the lattice would miss a thin region altogether).
function sampleRegion(window: PixelWindow, spans: Int32Array, toXyz: Mat3, profile: RgbProfile, maxSamples: number): RegionPixels {
  let n = 0;
  for (let s = 0; s < spans.length; s += 3) n += spans[s + 2] - spans[s + 1];
  const step = Math.max(1, Math.floor(Math.sqrt(n / maxSamples)));
  const rp = regionPixels(window, spans, toXyz, step, profile.linear);
  return rp.samples.total > 0 || step === 1 ? rp : regionPixels(window, spans, toXyz, 1, profile.linear);
}

/**
 * A lattice reading with at least this much flake in a coarsely subsampled photo (SMEAR_COMPRESSION)
 * is read again on patches; in a finer one, only this dense flake tints enough of the base to
 * matter (tests/color/samples.test.ts). Ours.
 */
export const PATCH_FLAKE_MIN = 0.01;
export const PATCH_FLAKE_DENSE = 0.12;

// Subsampled chroma (JPEG 4:2:0) spreads a fine speck's colour over its neighbours, which a
// lattice does not see: the base and flake are read again on patches of every pixel (patchSample,
// about twice the lattice's pixels), where each pixel's neighbours and its own luma are seen
// (trulyBase, regionLuma) and smearedFlake can model the smear. Glare, the second
// colour and the shading stay the lattice's, read over the whole region.
function withPatches(m: RegionMeasure, window: PixelWindow, spans: Int32Array, profile: RgbProfile, ctx: RegionContext, maxSamples: number): RegionMeasure {
  const patches = patchSample(window, spans, 2 * maxSamples);
  if (!patches) return m;
  const p = measureRegion(regionPixels(patches.window, patches.spans, ctx.toXyz, 1, profile.linear), ctx);
  return { ...m, lab: p.lab, hex: p.hex, flake: p.flake, uncertainty: p.uncertainty, kept: Math.round((p.kept / p.pixels) * m.pixels), spread: p.spread };
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
  let card: CardBalance | null = null;
  if (neutral && neutralSpans) {
    card = whiteBalanceFromCard(sampleRegion(window, neutralSpans, toXyz, profile, maxSamples), profile, neutral.L);
    toXyz = card.toXyz;
  }
  // JPEG: how coarse its quantisation was (jpegQuantScale); WebP may be lossy: counted as a mid JPEG.
  const compression = header.format === 'png' ? 0 : header.format === 'jpeg' ? (jpegQuantScale(buf) ?? 0.5) : 0.5;
  // Chroma at less than full resolution (ITU-T T.81 sampling factors; lossy WebP is always 4:2:0).
  const subsampled = header.format === 'jpeg' ? !!header.chromaSubsampling && !header.chromaSubsampling.startsWith('4:4:4') : header.format === 'webp';
  const clippedBlack: string[] = [];
  const ctx = { compression, subsampled, otherLight: card?.otherFromFirst, toXyz };
  const measured = regions.map((r, i) => {
    const rp = sampleRegion(window, spans[i], toXyz, profile, maxSamples);
    if (blackClippedShare(rp.samples) >= BLACK_CLIP_WARNING) clippedBlack.push(r.name);
    const m = measureRegion(rp, ctx);
    const smeared = subsampled && rp.step > 1 && m.flake.coverage >= (compression >= SMEAR_COMPRESSION ? PATCH_FLAKE_MIN : PATCH_FLAKE_DENSE);
    return { name: r.name, ...(smeared ? withPatches(m, window, spans[i], profile, ctx, maxSamples) : m) };
  });
  const clipWarning = clippedBlack.length
    ? `A colour channel is clipped to black in ${clippedBlack.map((n) => `"${n}"`).join(', ')}: the camera lost part of ${clippedBlack.length > 1 ? 'their' : 'its'} colour, and no correction brings it back. Reshoot under daylight-balanced light, a little brighter.`
    : null;
  const warning = [card ? lightWarning(measured, card) : null, clipWarning].filter((w) => w !== null).join(' ') || null;
  const whiteBalance: PhotoMeasure['whiteBalance'] = card
    ? { applied: true, method: 'channel', neutralLab: card.neutralLab, cast: card.cast, warning }
    : { applied: false, method: 'none', cast: 0, warning };
  return { width, height, whiteBalance, regions: measured };
}

/**
 * The warning when the card cannot settle a region's colour: its two corrections
 * (whiteBalanceFromCard) leave the region more than LIGHT_AMBIGUITY_WARNING ΔE00 apart.
 */
function lightWarning(measured: { name: string; lab: Lab }[], card: CardBalance): string | null {
  const far = measured
    .map((r) => ({ name: r.name, dE00: castAmbiguity(r.lab, card.otherFromFirst).dE00 }))
    .filter((r) => r.dE00 > LIGHT_AMBIGUITY_WARNING);
  if (far.length === 0) return null;
  const worst = far.reduce((a, b) => (b.dE00 > a.dE00 ? b : a));
  return `The light is too far from daylight to trust the correction for ${far.map((r) => `"${r.name}"`).join(', ')}: the grey card (${card.cast.toFixed(1)} ΔE00 off grey) leaves ${far.length > 1 ? 'them' : 'it'} uncertain by up to ${worst.dE00.toFixed(1)} ΔE00. Reshoot under daylight-balanced light with the card in frame.`;
}
