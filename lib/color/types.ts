// Shared types of the colour engine. Lab is CIELAB (CIE 15:2004) relative to the D65 white.
export interface Lab {
  l: number;
  a: number;
  b: number;
}

export type Vec3 = [number, number, number];
/** Row-major 3×3 matrix. */
export type Mat3 = [Vec3, Vec3, Vec3];

/** Shapes in coordinates normalised (0..1) to the image as displayed (EXIF orientation applied). */
export type RectShape = { type: 'rect'; x: number; y: number; w: number; h: number };
export type EllipseShape = { type: 'ellipse'; cx: number; cy: number; rx: number; ry: number };
export type PolygonShape = { type: 'polygon'; points: [number, number][] };
export type Shape = RectShape | EllipseShape | PolygonShape;

/** Pixel rectangle in image pixel coordinates. */
export interface PixelBox {
  left: number;
  top: number;
  width: number;
  height: number;
}

/** 8-bit RGB pixels (3 bytes each, row-major) covering `box` of a larger image. */
export interface PixelWindow extends PixelBox {
  data: Uint8Array;
}

/**
 * A region's colours, deduplicated: sample i stands for counts[i] pixels of 8-bit
 * colour rgb[3i..3i+2] (as decoded, before white balance) and Lab lab[3i..3i+2]
 * (after white balance, if any).
 */
export interface ColorSamples {
  rgb: Uint8Array;
  lab: Float64Array;
  counts: Uint32Array;
  /** Number of distinct samples. */
  size: number;
  /** Number of sampled pixels (sum of counts). */
  total: number;
  /** Number of pixels in the region; more than `total` when a lattice sample was taken. */
  pixels: number;
}

export type Band = 'indistinguishable' | 'close' | 'noticeable' | 'off';

export interface FlakeGroup {
  lab: Lab;
  hex: string;
  /** Fraction (0..1) of the flake pixels in this group. */
  share: number;
}

/** API.md's RegionMeasure without `name`. */
export interface RegionMeasure {
  lab: Lab;
  hex: string;
  pixels: number;
  kept: number;
  /** Median CIEDE2000 of the kept pixels to the base colour. */
  spread: number;
  /** Fraction (0..1) of the region's pixels taken as glare. */
  glare: number;
  /** `coverageUncertainty`: the ± (about 95 %, k = 2) of `coverage`, a fraction of the area (coverageUncertainty). */
  flake: { coverage: number; coverageUncertainty: number; groups: FlakeGroup[] };
  /** ΔE00 radius around `lab` holding the true base colour with about 95 % confidence (k = 2, JCGM 100:2008). */
  uncertainty: number;
  /** Range of L* that a smooth light fall-off across the region accounts for (0 when evenly lit). */
  shading: number;
  /** A second colour filling a connected part of the region, kept out of base and flake. */
  other: { share: number; lab: Lab } | null;
}

export interface LabComparison {
  dE00: number;
  dL: number;
  dC: number;
  dH: number;
  band: Band;
  withinTolerance: boolean;
}

/** A logged colour with the doses per cup that made it (a pour's zone, or a colorant swatch). */
export interface DoseObservation {
  /** Dose per cup by colorant key (colorant id and unit). */
  doses: Record<string, number>;
  lab: Lab;
  /** The mold's thickness class, when known (a thin body reads lighter for the same recipe). */
  thickness?: 'thin' | 'standard' | 'thick';
}

/** One colorant's Kubelka–Munk coefficients per unit dose, per linear sRGB channel. */
export interface ColorantCoefficients {
  /** Absorption per unit dose, relative to the base plastisol's scattering. */
  k: Vec3;
  /** Scattering per unit dose, relative to the base plastisol's scattering. */
  s: Vec3;
  /** Logged colours in which this colorant was dosed. */
  observations: number;
  /** Median ΔE00 between the model and those logged colours. */
  residual: number;
}

/** How the shop's colorants colour its plastisol (see fitColorantModel). */
export interface ColorantModel {
  /** The base plastisol's own K/S per channel (its scattering is the unit). */
  base: Vec3;
  colorants: Record<string, ColorantCoefficients>;
  observations: number;
  /** Median ΔE00 between the model and every logged colour. */
  residual: number;
  /** Dose factor per mold thickness class (standard = 1), with the logged colours behind it. */
  thickness?: Record<'thin' | 'standard' | 'thick', { factor: number; observations: number }>;
}

/** A match's own correction of the shop's model (see localCorrection). */
export interface LocalCorrection {
  /** Offset of log(K/S) per channel. */
  offset: Vec3;
  /** Factor on every dose: this match's colorants act this much stronger than the shop's. */
  scale: number;
}
