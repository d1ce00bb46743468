// Shared pieces of the realistic-photo tests: the bait colours, the flakes, an independent
// CIEDE2000 (colorjs.io) and the bookkeeping of errors against each region's ±.
import Color from 'colorjs.io';
import { deltaE2000 } from '@/lib/color';
import { measurePhoto, type PhotoMeasure } from '@/lib/image';
import type { Lab, PhotoSpec, PhotoTruth } from './photoGen';
import { makePhoto } from './photoGen';

/** Five bait bases (invented, D65 Lab): watermelon green, chartreuse, junebug blue, pumpkin, bubblegum. */
export const BASES: Record<string, Lab> = {
  green: { l: 55, a: -30, b: 25 },
  chartreuse: { l: 82, a: -15, b: 65 },
  blue: { l: 35, a: 5, b: -25 },
  pumpkin: { l: 62, a: 30, b: 55 },
  bubblegum: { l: 72, a: 35, b: 5 },
};
/** Flake colours (invented): black, a vivid blue, and silver (bright neutral that sparkles). */
export const FLAKES: Record<string, { colour: Lab; sparkle: number }> = {
  black: { colour: { l: 8, a: 0, b: 0 }, sparkle: 0 },
  blue: { colour: { l: 35, a: 15, b: -60 }, sparkle: 0 },
  silver: { colour: { l: 92, a: 0, b: 0 }, sparkle: 0.15 },
};

/**
 * CIEDE2000 by colorjs.io, fed our D65 Lab as its 'lab' coordinates so that it applies the formula
 * to these numbers (its own 'lab' is D50: given 'lab-d65' colours it would convert them first).
 */
export function colorjsDe00(x: Lab, y: Lab): number {
  return new Color('lab', [x.l, x.a, x.b]).deltaE(new Color('lab', [y.l, y.a, y.b]), '2000');
}

export interface Outcome {
  label: string;
  truth: PhotoTruth;
  out: PhotoMeasure;
  /** ΔE00 (culori) of the measured base to the truth. */
  error: number;
}

/** Makes the photo, measures its region (with the card when the spec has one) and the error. */
export async function measureSpec(label: string, spec: PhotoSpec, box?: Parameters<typeof makePhoto>[1]): Promise<Outcome> {
  const truth = await makePhoto(spec, box);
  const neutral = truth.card && spec.cardL !== undefined ? { shape: truth.card, L: spec.cardL } : undefined;
  const out = await measurePhoto(truth.file, [{ name: 'zone', shape: truth.region }], neutral);
  const error = deltaE2000(out.regions[0].lab, truth.lab);
  return { label, truth, out, error };
}

export const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

/** Share of outcomes whose true error lies inside the region's ± (uncertainty). */
export const covered = (xs: Outcome[]) => xs.filter((o) => o.error <= o.out.regions[0].uncertainty).length / xs.length;

/**
 * One line of the figures a table row asks for (median and worst base ΔE00, coverage within
 * ±0.04, worst glare, share of regions whose ± holds the true error, median ±), printed by the
 * tests so a run shows them beside the pass/fail.
 */
export function printFigures(row: string, xs: Outcome[]): void {
  if (xs.length === 0) return;
  const r = (o: Outcome) => o.out.regions[0];
  const within = xs.filter((o) => Math.abs(r(o).flake.coverage - o.truth.coverage) <= 0.04).length;
  console.log(
    `[figures, ${row}] ${xs.length} photos: base ΔE00 median ${median(xs.map((o) => o.error)).toFixed(2)}, worst ${Math.max(...xs.map((o) => o.error)).toFixed(2)}; ` +
      `coverage within ±0.04 on ${within}/${xs.length}; glare worst ${Math.max(...xs.map((o) => r(o).glare)).toFixed(3)}; ` +
      `± holds ${(covered(xs) * 100).toFixed(0)} %, median ± ${median(xs.map((o) => r(o).uncertainty)).toFixed(2)}`,
  );
}
