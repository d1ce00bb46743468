import type { ColorSamples, FlakeGroup, Lab } from './types';
import { deltaE2000 } from './deltaE2000';
import { labToHex } from './labToHex';

/** At most this many flake colour groups (PRODUCT.md: up to three). */
export const MAX_FLAKE_GROUPS = 3;
/** Groups whose centres are closer than this (CIEDE2000) are one colour of flake. */
export const FLAKE_MERGE_DE00 = 5;
/** Groups holding less than this fraction of the flake pixels join their nearest group. */
export const FLAKE_MIN_SHARE = 0.05;
/** A group is a blend of the base and a farther group when it projects onto that line within
 * BLEND_T and lies off it by less than BLEND_RESIDUAL × its own distance from the base. */
export const BLEND_T: [number, number] = [0.05, 0.95];
export const BLEND_RESIDUAL = 0.5;
const ITERATIONS = 15;
/** k-means iterates on at most about this many distinct colours. */
const KMEANS_SAMPLE = 4096;

interface Group {
  lab: Lab;
  w: number;
}

/**
 * Groups the flake samples (flake[i] = 1) by colour: count-weighted k-means in CIELAB (Lloyd's
 * algorithm, S. P. Lloyd, IEEE Trans. Inf. Theory 28(2), 1982; Euclidean ΔE*ab as k-means
 * requires) with k = 3, seeded deterministically — the heaviest colour first, then each next seed
 * the colour maximising count × squared distance to the seeds so far (a deterministic take on
 * k-means++, Arthur & Vassilvitskii, SODA 2007). Then groups closer than FLAKE_MERGE_DE00
 * merge, and groups under FLAKE_MIN_SHARE join their nearest group. Given the base colour, groups
 * that are only blends of the base with another group are dropped. Largest share first; `share` is
 * by pixel count here (measureRegion replaces it with flakeCoverage's area shares).
 */
export function clusterFlake(samples: ColorSamples, flake: Uint8Array, base?: Lab): FlakeGroup[] {
  const { lab: all, counts } = samples;
  let n = 0;
  for (let i = 0; i < samples.size; i++) n += flake[i];
  if (n === 0) return [];
  const lab = new Float64Array(n * 3);
  const w = new Float64Array(n);
  for (let i = 0, k = 0; i < samples.size; i++) {
    if (!flake[i]) continue;
    lab[k * 3] = all[i * 3];
    lab[k * 3 + 1] = all[i * 3 + 1];
    lab[k * 3 + 2] = all[i * 3 + 2];
    w[k++] = counts[i];
  }

  // Seeds.
  const c = new Float64Array(MAX_FLAKE_GROUPS * 3);
  const nearD2 = new Float64Array(n).fill(Infinity);
  let k = 0;
  let pick = 0;
  for (let i = 1; i < n; i++) if (w[i] > w[pick]) pick = i;
  while (pick >= 0 && k < MAX_FLAKE_GROUPS) {
    c.set(lab.subarray(pick * 3, pick * 3 + 3), k * 3);
    k++;
    pick = -1;
    let best = 0;
    for (let i = 0; i < n; i++) {
      const d = d2(lab, i, c, k - 1);
      if (d < nearD2[i]) nearD2[i] = d;
      if (w[i] * nearD2[i] > best) {
        best = w[i] * nearD2[i];
        pick = i;
      }
    }
  }

  // Lloyd iterations, on an evenly strided subset when there are many colours (the centres settle
  // long before every colour is needed), until no assignment changes; then one full pass.
  const assign = new Int32Array(n).fill(-1);
  const sums = new Float64Array(k * 4);
  const every = Math.max(1, Math.ceil(n / KMEANS_SAMPLE));
  for (let it = 0; it <= ITERATIONS; it++) {
    const last = it === ITERATIONS;
    const by = last ? 1 : every;
    let changed = false;
    sums.fill(0);
    for (let i = 0; i < n; i += by) {
      let g = 0;
      let best = d2(lab, i, c, 0);
      for (let h = 1; h < k; h++) {
        const d = d2(lab, i, c, h);
        if (d < best) {
          best = d;
          g = h;
        }
      }
      if (assign[i] !== g) changed = true;
      assign[i] = g;
      sums[g * 4] += w[i] * lab[i * 3];
      sums[g * 4 + 1] += w[i] * lab[i * 3 + 1];
      sums[g * 4 + 2] += w[i] * lab[i * 3 + 2];
      sums[g * 4 + 3] += w[i];
    }
    for (let g = 0; g < k; g++) {
      const sw = sums[g * 4 + 3];
      if (sw > 0) for (let a = 0; a < 3; a++) c[g * 3 + a] = sums[g * 4 + a] / sw;
    }
    if (last) break;
    if (!changed) it = ITERATIONS - 1;
  }
  let groups: Group[] = [];
  for (let g = 0; g < k; g++) {
    if (sums[g * 4 + 3] > 0) groups.push({ lab: { l: c[g * 3], a: c[g * 3 + 1], b: c[g * 3 + 2] }, w: sums[g * 4 + 3] });
  }
  const flakeWeight = groups.reduce((s, g) => s + g.w, 0);

  groups = mergeGroups(groups, flakeWeight);
  if (base) groups = groups.filter((g) => !groups.some((o) => o !== g && isBlend(g.lab, o.lab, base)));
  return groups
    .sort((g, h) => h.w - g.w)
    .map((g) => ({ lab: g.lab, hex: labToHex(g.lab), share: g.w / flakeWeight }));
}

function d2(lab: Float64Array, i: number, c: Float64Array, g: number): number {
  const dl = lab[i * 3] - c[g * 3];
  const da = lab[i * 3 + 1] - c[g * 3 + 1];
  const db = lab[i * 3 + 2] - c[g * 3 + 2];
  return dl * dl + da * da + db * db;
}

// Merge, one pair at a time: the closest pair under FLAKE_MERGE_DE00, else the smallest group
// (when under FLAKE_MIN_SHARE) into its nearest neighbour.
function mergeGroups(input: Group[], flakeWeight: number): Group[] {
  let groups = input;
  for (;;) {
    let pair: [number, number] | null = null;
    let best = FLAKE_MERGE_DE00;
    for (let p = 0; p < groups.length; p++)
      for (let q = p + 1; q < groups.length; q++) {
        const de = deltaE2000(groups[p].lab, groups[q].lab);
        if (de < best) {
          best = de;
          pair = [p, q];
        }
      }
    if (!pair && groups.length > 1) {
      const small = groups.reduce((m, g, i) => (g.w < groups[m].w ? i : m), 0);
      if (groups[small].w < FLAKE_MIN_SHARE * flakeWeight) {
        let other = -1;
        let bestDe = Infinity;
        groups.forEach((g, i) => {
          const de = i === small ? Infinity : deltaE2000(g.lab, groups[small].lab);
          if (de < bestDe) {
            bestDe = de;
            other = i;
          }
        });
        pair = [other, small];
      }
    }
    if (!pair) return groups;
    const [p, q] = pair;
    const g = groups[p];
    const h = groups[q];
    const sw = g.w + h.w;
    const merged: Group = {
      lab: { l: (g.lab.l * g.w + h.lab.l * h.w) / sw, a: (g.lab.a * g.w + h.lab.a * h.w) / sw, b: (g.lab.b * g.w + h.lab.b * h.w) / sw },
      w: sw,
    };
    groups = groups.map((x, i) => (i === p ? merged : x)).filter((_, i) => i !== q);
  }
}

// A blend: part-way along the line from the base to a farther group, and close to that line. A
// JPEG's chroma bleed around specks makes such rings; they are edges of that flake, not a colour.
function isBlend(g: Lab, other: Lab, base: Lab): boolean {
  const p = [g.l - base.l, g.a - base.a, g.b - base.b];
  const d = [other.l - base.l, other.a - base.a, other.b - base.b];
  const pn2 = p[0] * p[0] + p[1] * p[1] + p[2] * p[2];
  const dn2 = d[0] * d[0] + d[1] * d[1] + d[2] * d[2];
  if (dn2 <= pn2) return false;
  const t = (p[0] * d[0] + p[1] * d[1] + p[2] * d[2]) / dn2;
  const residual = Math.hypot(p[0] - t * d[0], p[1] - t * d[1], p[2] - t * d[2]);
  return t > BLEND_T[0] && t < BLEND_T[1] && residual < BLEND_RESIDUAL * Math.sqrt(pn2);
}
