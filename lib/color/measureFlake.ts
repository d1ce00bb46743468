import type { ColorSamples, FlakeGroup, Lab, Vec3 } from './types';
import { areaByLuma } from './areaByLuma';
import { areaByLumaCode, type LumaCodeInput } from './areaByLumaCode';
import { clusterFlake } from './clusterFlake';
import { flakeEndmembers } from './flakeEndmembers';
import { labToHex } from './labToHex';
import { unmixCoverage } from './unmixCoverage';
import { xyzToLab } from './xyzToLab';

/** Flake samples farther than this many keep-thresholds from the base are whole flake (core). */
export const FLAKE_CORE = 2;

/**
 * Noise alone leaves a few pixels past the keep threshold, on every side of the base and none far
 * out: flake needs at least this many core pixels (and this share of the region), or off pixels
 * that lean one way (oneSided). Ours, from plain synthetic photos (tests/color/realPhotos.test.ts).
 */
export const MIN_CORE = 3;
export const MIN_CORE_SHARE = 0.0005;
/** The flake's area cannot be much more than the pixels that differ from the base: past this many times their count, the unmixing has gone astray. Ours. */
export const AREA_CAP = 1.5;
/** Off pixels lean one way when their mean offset from the base is at least this share of their mean distance. Ours. */
export const ONE_SIDED = 0.5;

export interface FlakeInput {
  lab: Float32Array;
  xyz: Float32Array;
  /** CIE94 distance of each pixel to the base (keepNearBase). */
  dist: Float32Array;
  keepWithin: number;
  /** 1 for pixels that are neither base nor glare; `other` marks the second colour among them. */
  off: Uint8Array;
  other: Uint8Array;
  glare: Uint8Array;
  base: Lab;
  /** The base colour in linear XYZ (trulyBase). */
  bx: Vec3;
  /** The photo's chroma is subsampled (JPEG 4:2:0): one flake colour's area comes from luminance (areaByLuma). */
  lumaArea?: boolean;
  /** The groups are one flake colour seen through smeared chroma (isOneSmearedFlake): keep the one farthest from the base. */
  oneColour?: boolean;
  /** With subsampled chroma: every pixel's luma Y' and the base's (regionLuma), for areaByLumaCode. */
  luma?: () => Omit<LumaCodeInput, 'flake'> | null;
}

/**
 * Step 6 of measureRegion: the flake is what is neither base, glare nor the second colour. Its
 * colour groups come from clusterFlake (on the core, clear of blended edges, when there is one),
 * each group's pure colour from flakeEndmembers, and the area by linear unmixing in linear light
 * (unmixCoverage) of the summed deviation from the base of every pixel but glare and other: a
 * pixel that is part flake counts by its part. Off pixels that noise explains (no core, no lean
 * to one side) are no flake. With subsampled chroma and one flake colour of a
 * clearly different lightness, the area comes from luminance alone (areaByLuma). Returns the area
 * in sampled pixels.
 */
export function measureFlake(x: FlakeInput): { area: number; groups: FlakeGroup[] } {
  const { lab, xyz, dist, keepWithin, off, other, glare, base, bx } = x;
  const n = off.length;
  let flakeCount = 0, coreCount = 0;
  for (let i = 0; i < n; i++) if (off[i] && !other[i]) flakeCount++;
  const fl = new Float64Array(flakeCount * 3);
  const core = new Uint8Array(flakeCount);
  const flakeIdx = new Int32Array(flakeCount);
  for (let i = 0, k = 0; i < n; i++) {
    if (!off[i] || other[i]) continue;
    fl[k * 3] = lab[i * 3]; fl[k * 3 + 1] = lab[i * 3 + 1]; fl[k * 3 + 2] = lab[i * 3 + 2];
    core[k] = dist[i] > FLAKE_CORE * keepWithin ? 1 : 0;
    coreCount += core[k];
    flakeIdx[k++] = i;
  }
  if (flakeCount === 0 || (coreCount < Math.max(MIN_CORE, MIN_CORE_SHARE * n) && !oneSided(fl, base))) return { area: 0, groups: [] };
  const samples: ColorSamples = { rgb: new Uint8Array(0), lab: fl, counts: new Uint32Array(flakeCount).fill(1), size: flakeCount, total: flakeCount, pixels: flakeCount };
  const all = clusterFlake(samples, coreCount > 0 ? core : new Uint8Array(flakeCount).fill(1), base);
  const far = (g: { lab: Lab }) => (g.lab.l - base.l) ** 2 + (g.lab.a - base.a) ** 2 + (g.lab.b - base.b) ** 2;
  const farthest = all.length > 1 ? [all.reduce((p, q) => (far(q) > far(p) ? q : p))] : all;

  const sum: Vec3 = [0, 0, 0];
  let counted = 0;
  for (let i = 0, j = 0; i < n; i++, j += 3) {
    if (glare[i] || other[i]) continue;
    counted++;
    sum[0] += xyz[j] - bx[0]; sum[1] += xyz[j + 1] - bx[1]; sum[2] += xyz[j + 2] - bx[2];
  }
  const areaOf = (clustered: { lab: Lab }[]): { area: number; groups: FlakeGroup[] } => {
    const ends = flakeEndmembers(clustered.map((g) => g.lab), fl, flakeIdx, xyz, bx);
    const byLuma = x.lumaArea && ends.length === 1 ? areaByLuma(sum[1], counted, bx[1], ends[0].xyz[1]) : null;
    if (byLuma !== null) return { area: byLuma, groups: [{ lab: ends[0].lab, hex: labToHex(ends[0].lab), share: 1 }] };
    const luma = x.lumaArea && ends.length === 1 ? x.luma?.() : null;
    if (luma) {
      const flake = new Uint8Array(n);
      for (let i = 0; i < n; i++) flake[i] = off[i] && !other[i] ? 1 : 0;
      const area = areaByLumaCode({ ...luma, flake });
      // Its colour: the base plus the region's mean deviation over the area (linear mixing), which
      // the smear keeps, where the cores' own chroma has been spread away.
      if (area !== null && area <= counted) {
        const lab = xyzToLab([bx[0] + sum[0] / area, bx[1] + sum[1] / area, bx[2] + sum[2] / area]);
        return { area, groups: [{ lab, hex: labToHex(lab), share: 1 }] };
      }
    }
    const areas = ends.length ? unmixCoverage(sum, bx, ends.map((e) => e.xyz)) : [];
    const area = areas.reduce((t, v) => t + v, 0);
    const groups = ends
      .map((e, k) => ({ lab: e.lab, hex: labToHex(e.lab), share: area > 0 ? areas[k] / area : 0 }))
      .filter((g) => g.share > 0)
      .sort((g, h) => h.share - g.share);
    return { area, groups };
  };
  if (x.oneColour) return areaOf(farthest);
  const read = areaOf(all);
  // Groups on opposite sides of the base (JPEG's ringing puts a halo of the opposite hue round a
  // speck) let the summed deviation be split into any two large areas that cancel: an area far
  // beyond the pixels that differ from the base at all is that, so keep the farthest group alone.
  return all.length > 1 && read.area > AREA_CAP * flakeCount ? areaOf(farthest) : read;
}

/** Whether the off pixels (Lab, interleaved) sit mostly on one side of the base, as flake does and noise does not. */
function oneSided(fl: Float64Array, base: Lab): boolean {
  const m = fl.length / 3;
  let sl = 0, sa = 0, sb = 0, dist = 0;
  for (let k = 0; k < m; k++) {
    const dl = fl[k * 3] - base.l, da = fl[k * 3 + 1] - base.a, db = fl[k * 3 + 2] - base.b;
    sl += dl; sa += da; sb += db;
    dist += Math.sqrt(dl * dl + da * da + db * db);
  }
  return Math.hypot(sl, sa, sb) >= ONE_SIDED * dist;
}
