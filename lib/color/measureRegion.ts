import { differenceCiede2000 } from 'culori';
import type { ColorSamples, Lab, Mat3, RegionMeasure, Vec3 } from './types';
import { castAmbiguity } from './castAmbiguity';
import { clusterFlake } from './clusterFlake';
import { findGlareByShape } from './findGlareByShape';
import { findOtherColour } from './findOtherColour';
import { cie94Distances } from './cie94Distances';
import { correctShading } from './correctShading';
import { flakeEndmembers } from './flakeEndmembers';
import { labToHex } from './labToHex';
import { labInto, type RegionPixels } from './regionPixels';
import { regionUncertainty } from './regionUncertainty';
import { trulyBase } from './trulyBase';
import { unmixCoverage } from './unmixCoverage';
import { weightedMedian } from './weightedMedian';

// Thresholds of the base-colour estimate (ours, tuned on synthetic photos; see the method below).
/** Keep-threshold = clamp(KEEP_FACTOR × median distance to the first estimate, KEEP_MIN, KEEP_MAX). */
export const KEEP_FACTOR = 3;
export const KEEP_MIN = 4;
export const KEEP_MAX = 12;
const MAX_ITERATIONS = 8;
const CONVERGED = 0.01; // ΔE*ab: far below anything visible or reported
/** Flake samples farther than this many keep-thresholds from the base are whole flake (core). */
export const FLAKE_CORE = 2;
/** Spread is exact up to this many kept pixels, else estimated from an even subset. */
export const SPREAD_SAMPLE = 800;

const ciede2000 = differenceCiede2000(1, 1, 1);

export interface RegionContext {
  /** How coarse the file's lossy compression was: 0 lossless, ≈ 0.2 JPEG q90, ≈ 0.5 q75 (jpegQuantScale). */
  compression?: number;
  /** With a grey card: the other correction's XYZ over the one applied (castAmbiguity). */
  otherLight?: Mat3;
}

/**
 * Robust base colour, flake, glare, shading and a second colour of a region (regionPixels):
 * 1. Glare by shape (findGlareByShape): connected clipped streaks and blobs, not small specks.
 * 2. Shading: a quadratic surface of L* across the region (fitShading, robust to flake) divides
 *    the light fall-off out of every pixel in linear light, keeping the mean light over the region;
 *    its L* range is `shading`.
 * 3. Base: per-channel median, then the mean of the pixels within T of the estimate until it
 *    settles; T = clamp(3 × median distance, 4, 12) in CIE94 (CIE 116-1995, graphic-arts weights:
 *    S_C = 1 + 0.045·C*, S_H = 1 + 0.015·C*, CIEDE2000's chroma weighting at a few multiplications).
 * 4. Other (findOtherColour): a solid, connected second colour among the pixels that are not base.
 * 5. The base colour is the mean in linear light of the truly base pixels: kept, and with no
 *    non-base pixel among their eight neighbours, so specks blurred into their neighbours by the
 *    lens and the JPEG do not tint it.
 * 6. Flake: the rest. Colour groups by clusterFlake, each group's pure colour by flakeEndmembers,
 *    and the area by linear unmixing in linear light (unmixCoverage): a pixel that is part flake
 *    counts by its part. spread = median CIEDE2000 (culori) of the kept pixels to the base.
 * 7. uncertainty (regionUncertainty).
 */
export function measureRegion(rp: RegionPixels, ctx: RegionContext = {}): RegionMeasure {
  const { samples, xyz: sXyz, gridW, gridH, cell, sample, step } = rp;
  const n = samples.total;
  if (n === 0) throw new RangeError('region has no pixels');
  const glare = findGlareByShape(rp);
  let glareCount = 0;
  const live = new Uint32Array(samples.size);
  for (let i = 0; i < n; i++) {
    if (glare[i]) glareCount++;
    else live[sample[i]]++;
  }
  if (glareCount === n) {
    glare.fill(0);
    glareCount = 0;
    live.set(samples.counts);
  }
  const sLab = samples.lab;
  const med: Lab = {
    l: weightedMedian(sLab, live, -1, 110, 0.05, undefined, 3, 0),
    a: weightedMedian(sLab, live, -200, 200, 0.05, undefined, 3, 1),
    b: weightedMedian(sLab, live, -200, 200, 0.05, undefined, 3, 2),
  };

  // Per-pixel colour, with the fall-off divided out when there is one.
  const cx = new Int32Array(n), cy = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    cx[i] = cell[i] % gridW;
    cy[i] = (cell[i] - cx[i]) / gridW;
  }
  const lab = new Float32Array(n * 3);
  const xyz = new Float32Array(n * 3);
  for (let i = 0; i < n; i++) {
    const s = sample[i] * 3;
    lab[i * 3] = sLab[s]; lab[i * 3 + 1] = sLab[s + 1]; lab[i * 3 + 2] = sLab[s + 2];
    xyz[i * 3] = sXyz[s]; xyz[i * 3 + 1] = sXyz[s + 1]; xyz[i * 3 + 2] = sXyz[s + 2];
  }
  const shading = correctShading(lab, xyz, cx, cy, glare, med, gridW, gridH);

  // Base: iterate the mean of the pixels near the estimate.
  const dist = new Float32Array(n);
  let base = med;
  cie94Distances(lab, base, dist);
  const keepWithin = Math.min(KEEP_MAX, Math.max(KEEP_MIN, KEEP_FACTOR * medianOf(dist, glare)));
  const kept = new Uint8Array(n);
  for (let round = 0; round < MAX_ITERATIONS; round++) {
    let sl = 0, sa = 0, sb = 0, w = 0;
    for (let i = 0; i < n; i++) {
      kept[i] = !glare[i] && dist[i] <= keepWithin ? 1 : 0;
      if (!kept[i]) continue;
      w++;
      sl += lab[i * 3]; sa += lab[i * 3 + 1]; sb += lab[i * 3 + 2];
    }
    if (w === 0) {
      // Nothing near the median (a region split between two colours): keep all but glare.
      for (let i = 0; i < n; i++) kept[i] = glare[i] ? 0 : 1;
      break;
    }
    const next = { l: sl / w, a: sa / w, b: sb / w };
    const moved = Math.hypot(next.l - base.l, next.a - base.a, next.b - base.b);
    base = next;
    cie94Distances(lab, base, dist);
    if (moved < CONVERGED) break;
  }

  // The rest: a connected second colour, then flake.
  const off = new Uint8Array(n);
  for (let i = 0; i < n; i++) off[i] = !glare[i] && !kept[i] ? 1 : 0;
  const other = findOtherColour(off, cell, lab, gridW, gridH, step);
  const otherMask = other?.mask ?? new Uint8Array(n);

  // Truly base: near the mode of the base colours, and with nothing else close by.
  let keptCount = 0;
  for (let i = 0; i < n; i++) keptCount += kept[i];
  const { xyz: bx, count: nb } = trulyBase(lab, xyz, kept, glare, cell, gridW, gridH, base, keepWithin, (ctx.compression ?? 0) > 0 ? 2 : 1);
  const out = new Float64Array(3);
  labInto(bx[0], bx[1], bx[2], out, 0);
  base = { l: out[0], a: out[1], b: out[2] };

  // Flake groups from the flake pixels (the core, clear of blended edges, when there is one).
  let flakeCount = 0, coreCount = 0;
  for (let i = 0; i < n; i++) if (off[i] && !otherMask[i]) flakeCount++;
  const fl = new Float64Array(flakeCount * 3);
  const core = new Uint8Array(flakeCount);
  const flakeIdx = new Int32Array(flakeCount);
  for (let i = 0, k = 0; i < n; i++) {
    if (!off[i] || otherMask[i]) continue;
    fl[k * 3] = lab[i * 3]; fl[k * 3 + 1] = lab[i * 3 + 1]; fl[k * 3 + 2] = lab[i * 3 + 2];
    core[k] = dist[i] > FLAKE_CORE * keepWithin ? 1 : 0;
    coreCount += core[k];
    flakeIdx[k++] = i;
  }
  const flakeSamples: ColorSamples = { rgb: new Uint8Array(0), lab: fl, counts: new Uint32Array(flakeCount).fill(1), size: flakeCount, total: flakeCount, pixels: flakeCount };
  const groups = flakeCount ? clusterFlake(flakeSamples, coreCount > 0 ? core : new Uint8Array(flakeCount).fill(1), base) : [];
  const ends = flakeEndmembers(groups.map((g) => g.lab), fl, flakeIdx, xyz, bx);

  // Area by unmixing the summed deviation from the base of every pixel but glare and other.
  const sum: Vec3 = [0, 0, 0];
  let otherCount = 0;
  for (let i = 0; i < n; i++) {
    if (otherMask[i]) otherCount++;
    if (glare[i] || otherMask[i]) continue;
    sum[0] += xyz[i * 3] - bx[0]; sum[1] += xyz[i * 3 + 1] - bx[1]; sum[2] += xyz[i * 3 + 2] - bx[2];
  }
  const areas = ends.length ? unmixCoverage(sum, bx, ends.map((e) => e.xyz)) : [];
  const flakeArea = areas.reduce((s, v) => s + v, 0);
  const coverage = Math.min(flakeArea / n, (n - glareCount - otherCount) / n);

  const spread = spreadOf(lab, kept, base, keptCount);
  const flake = {
    coverage,
    groups: ends
      .map((e, k) => ({ lab: e.lab, hex: labToHex(e.lab), share: flakeArea > 0 ? areas[k] / flakeArea : 0 }))
      .filter((g) => g.share > 0)
      .sort((g, h) => h.share - g.share),
  };
  const otherOut = other ? { share: otherCount / n, lab: other.lab } : null;
  return {
    lab: base,
    hex: labToHex(base),
    pixels: samples.pixels,
    kept: Math.round((keptCount * samples.pixels) / n),
    spread,
    glare: glareCount / n,
    flake,
    uncertainty: regionUncertainty({ spread, basePixels: nb * step * step, compression: ctx.compression ?? 0, shading, coverage, flake: flake.groups.map((g) => g.lab), base, other: otherOut?.share ?? 0, lightModel: ctx.otherLight ? castAmbiguity(base, ctx.otherLight).dE00 : 0 }),
    shading,
    other: otherOut,
  };
}

// Median of v over the pixels not excluded, from a histogram of 0.01 bins (exact enough for a threshold).
function medianOf(v: Float32Array, exclude: Uint8Array): number {
  const bins = new Uint32Array(20001);
  let count = 0;
  for (let i = 0; i < v.length; i++) {
    if (exclude[i]) continue;
    bins[Math.min(20000, Math.floor(v[i] * 100))]++;
    count++;
  }
  for (let b = 0, acc = 0; b < bins.length; b++) if ((acc += bins[b]) * 2 >= count) return (b + 0.5) / 100;
  return 0;
}

function spreadOf(lab: Float32Array, kept: Uint8Array, base: Lab, keptCount: number): number {
  const every = Math.max(1, Math.ceil(keptCount / SPREAD_SAMPLE));
  const ref = { mode: 'lab65' as const, ...base };
  const smp = { mode: 'lab65' as const, l: 0, a: 0, b: 0 };
  const de: number[] = [];
  for (let i = 0, k = 0; i < kept.length; i++) {
    if (!kept[i] || k++ % every !== 0) continue;
    smp.l = lab[i * 3]; smp.a = lab[i * 3 + 1]; smp.b = lab[i * 3 + 2];
    de.push(ciede2000(ref, smp));
  }
  de.sort((x, y) => x - y);
  return de.length ? de[Math.floor((de.length - 1) / 2)] : 0;
}
