import { differenceCiede2000 } from 'culori';
import type { ColorSamples, Lab, RegionMeasure } from './types';
import { clusterFlake } from './clusterFlake';
import { findGlare } from './findGlare';
import { flakeCoverage } from './flakeCoverage';
import { labToHex } from './labToHex';
import { weightedMedian } from './weightedMedian';

// Thresholds of the base-colour estimate (ours, tuned on synthetic photos; see the method below).
/** Keep-threshold = clamp(KEEP_FACTOR × median distance to the first estimate, KEEP_MIN, KEEP_MAX). */
export const KEEP_FACTOR = 3;
export const KEEP_MIN = 4;
export const KEEP_MAX = 12;
const MAX_ITERATIONS = 10;
const CONVERGED = 1e-3; // ΔE*ab: far below anything visible or reported
/** Flake samples farther than this many keep-thresholds from the base are whole flake (core). */
export const FLAKE_CORE = 2;
/** Spread is exact up to this many distinct kept colours, else estimated from an even subset. */
export const SPREAD_SAMPLE = 4000;

const ciede2000 = differenceCiede2000(1, 1, 1);

const meanOf = ({ lab, counts, size }: ColorSamples, include: Uint8Array): Lab => {
  let l = 0, a = 0, b = 0, w = 0;
  for (let i = 0; i < size; i++) {
    if (!include[i]) continue;
    w += counts[i];
    l += counts[i] * lab[i * 3];
    a += counts[i] * lab[i * 3 + 1];
    b += counts[i] * lab[i * 3 + 2];
  }
  return { l: l / w, a: a / w, b: b / w };
};

/**
 * Robust base colour of a region (samples from regionColors), in four steps:
 * 1. Glare: findGlare flags clipped and bright washed-out pixels; they never enter the base.
 * 2. First estimate: the per-channel median of L*, a*, b* over the other pixels.
 * 3. Refinement: keep the pixels within T of the estimate and take their mean as the new estimate,
 *    until it moves less than 0.001 (at most 10 rounds). T = clamp(3 × median distance of the
 *    non-glare pixels to the first estimate, 4, 12), so it follows the photo's own noise and
 *    shading. The distance here is CIE94 (CIE 116-1995, graphic-arts weights k_L = 1,
 *    K1 = 0.045, K2 = 0.015) with the estimate as reference: it has CIEDE2000's chroma weighting
 *    (S_C = 1 + 0.045·C*, S_H ≈ 1 + 0.015·C*), so the threshold means about the same visual step
 *    for a pale and a vivid bait, unlike ΔE*ab, at a few multiplications per sample.
 * 4. Whatever is neither glare nor kept is flake: its coverage, and colour groups by clusterFlake.
 * spread = median CIEDE2000 (culori) of the kept pixels to the base.
 */
export function measureRegion(samples: ColorSamples): RegionMeasure {
  const { lab, counts, size, total } = samples;
  if (total === 0) throw new RangeError('region has no pixels');
  const glare = findGlare(samples);
  const candidate = new Uint8Array(size);
  for (let i = 0; i < size; i++) candidate[i] = 1 - glare[i];
  let glareWeight = 0;
  for (let i = 0; i < size; i++) if (glare[i]) glareWeight += counts[i];

  let base: Lab = {
    l: weightedMedian(lab, counts, -1, 110, 0.05, candidate, 3, 0),
    a: weightedMedian(lab, counts, -200, 200, 0.05, candidate, 3, 1),
    b: weightedMedian(lab, counts, -200, 200, 0.05, candidate, 3, 2),
  };

  const dist = new Float64Array(size);
  const distances = (ref: Lab) => {
    // CIE 116-1995 (CIE94): ΔE94 = sqrt(ΔL² + (ΔC / S_C)² + (ΔH / S_H)²), S_C = 1 + 0.045·C*ref,
    // S_H = 1 + 0.015·C*ref, ΔH² = Δa² + Δb² − ΔC².
    const cRef = Math.hypot(ref.a, ref.b);
    const sc = 1 + 0.045 * cRef;
    const sh = 1 + 0.015 * cRef;
    for (let i = 0, j = 0; i < size; i++, j += 3) {
      const dl = lab[j] - ref.l;
      const da = lab[j + 1] - ref.a;
      const db = lab[j + 2] - ref.b;
      const dc = Math.sqrt(lab[j + 1] * lab[j + 1] + lab[j + 2] * lab[j + 2]) - cRef;
      const dh2 = Math.max(0, da * da + db * db - dc * dc);
      dist[i] = Math.sqrt(dl * dl + (dc / sc) * (dc / sc) + dh2 / (sh * sh));
    }
  };

  distances(base);
  const spreadGuess = weightedMedian(dist, counts, 0, 200, 0.01, candidate);
  const keepWithin = Math.min(KEEP_MAX, Math.max(KEEP_MIN, KEEP_FACTOR * spreadGuess));
  const kept = new Uint8Array(size);
  let keptWeight = 0;
  for (let round = 0; round < MAX_ITERATIONS; round++) {
    let sl = 0, sa = 0, sb = 0;
    keptWeight = 0;
    for (let i = 0, j = 0; i < size; i++, j += 3) {
      kept[i] = candidate[i] && dist[i] <= keepWithin ? 1 : 0;
      if (!kept[i]) continue;
      const w = counts[i];
      keptWeight += w;
      sl += w * lab[j];
      sa += w * lab[j + 1];
      sb += w * lab[j + 2];
    }
    if (keptWeight === 0) {
      // Nothing near the median (a region split between two colours): keep all non-glare.
      base = meanOf(samples, candidate);
      kept.set(candidate);
      keptWeight = total - glareWeight;
      break;
    }
    const next = { l: sl / keptWeight, a: sa / keptWeight, b: sb / keptWeight };
    const moved = Math.hypot(next.l - base.l, next.a - base.a, next.b - base.b);
    base = next;
    if (moved < CONVERGED) break;
    distances(base);
  }

  // Spread: CIEDE2000 of kept samples to the base (an evenly strided subset when there are many).
  let keptCount = 0;
  for (let i = 0; i < size; i++) keptCount += kept[i];
  const every = Math.max(1, Math.ceil(keptCount / SPREAD_SAMPLE));
  const ref = { mode: 'lab65' as const, ...base };
  const smp = { mode: 'lab65' as const, l: 0, a: 0, b: 0 };
  const de = new Float64Array(size);
  const inSpread = new Uint8Array(size);
  for (let i = 0, k = 0; i < size; i++) {
    if (!kept[i] || k++ % every !== 0) continue;
    smp.l = lab[i * 3];
    smp.a = lab[i * 3 + 1];
    smp.b = lab[i * 3 + 2];
    de[i] = ciede2000(ref, smp);
    inSpread[i] = 1;
  }
  const spread = weightedMedian(de, counts, 0, 100, 0.01, inSpread);

  // Flake: neither glare nor kept. Its colours come from the core (beyond FLAKE_CORE × T from the
  // base, clear of blended edges) when there is one; its area from flakeCoverage.
  const flake = new Uint8Array(size);
  const core = new Uint8Array(size);
  let coreCount = 0;
  for (let i = 0; i < size; i++) {
    flake[i] = candidate[i] && !kept[i] ? 1 : 0;
    core[i] = flake[i] && dist[i] > FLAKE_CORE * keepWithin ? 1 : 0;
    coreCount += core[i];
  }
  const groups = clusterFlake(samples, coreCount > 0 ? core : flake, base);
  const { coverage, shares } = flakeCoverage(samples, flake, base, groups.map((g) => g.lab));

  return {
    lab: base,
    hex: labToHex(base),
    pixels: samples.pixels,
    kept: Math.round((keptWeight * samples.pixels) / total),
    spread,
    glare: glareWeight / total,
    flake: { coverage, groups: groups.map((g, k) => ({ ...g, share: shares[k] })) },
  };
}
