import type { Lab } from './types';
import { boxMorphology } from './boxMorphology';
import { labelComponents } from './labelComponents';

// Ours, set on synthetic photos (tests/support/photoGen.ts).
/** Erosion radius (px): a second colour is solid over a (2r + 1)² square; specks of flake are not. */
export const OTHER_ERODE = 2;
/** What is left after erosion must hold at least this many cells and this share of the region. */
export const OTHER_MIN_CELLS = 12;
export const OTHER_MIN_SHARE = 0.004;
/** Solid parts whose colours lie within this ΔE*ab of the largest one are the same second colour. */
export const OTHER_SAME = 10;

/**
 * A second colour filling a connected part of the region (the other side of a laminate line, a
 * corner of background): among the pixels that are neither base nor glare (`off`, one per pixel in
 * `cell` order), the parts that survive a morphological opening's erosion by a square of side
 * 2·OTHER_ERODE + 1 (Gonzalez & Woods, Digital Image Processing, 4th ed., §9.3), large enough, and
 * of one colour. The part is grown back by the erosion radius plus a two-pixel rim (the blended
 * line between the two colours) within `off`. Returns the per-pixel mask and the part's colour
 * (mean Lab of its solid core), or null.
 */
export function findOtherColour(
  off: Uint8Array,
  cell: Int32Array,
  lab: Float32Array,
  gridW: number,
  gridH: number,
  step: number,
): { mask: Uint8Array; lab: Lab } | null {
  const n = cell.length;
  const r = Math.max(1, Math.round(OTHER_ERODE / step));
  const grid = new Uint8Array(gridW * gridH);
  for (let i = 0; i < n; i++) if (off[i]) grid[cell[i]] = 1;
  const solid = boxMorphology(grid, gridW, gridH, r, 'erode');
  const { labels, area } = labelComponents(solid, gridW, gridH);
  const minCells = Math.max(OTHER_MIN_CELLS, OTHER_MIN_SHARE * n);
  const big = area.map((a, k) => (a >= minCells ? k : -1)).filter((k) => k >= 0);
  if (big.length === 0) return null;
  // Mean colour of each big part's core.
  const sums = new Map<number, [number, number, number, number]>(big.map((k) => [k, [0, 0, 0, 0]]));
  for (let i = 0; i < n; i++) {
    const id = labels[cell[i]] - 1;
    const s = id >= 0 ? sums.get(id) : undefined;
    if (!s) continue;
    s[0] += lab[i * 3];
    s[1] += lab[i * 3 + 1];
    s[2] += lab[i * 3 + 2];
    s[3]++;
  }
  const mean = (s: [number, number, number, number]): Lab => ({ l: s[0] / s[3], a: s[1] / s[3], b: s[2] / s[3] });
  const largest = big.reduce((p, k) => (area[k] > area[p] ? k : p), big[0]);
  const ref = mean(sums.get(largest)!);
  const keep = new Set(big.filter((k) => {
    const m = mean(sums.get(k)!);
    return Math.hypot(m.l - ref.l, m.a - ref.a, m.b - ref.b) <= OTHER_SAME;
  }));
  const seed = new Uint8Array(gridW * gridH);
  const total: [number, number, number, number] = [0, 0, 0, 0];
  for (const k of keep) sums.get(k)!.forEach((v, j) => (total[j] += v));
  for (let c = 0; c < seed.length; c++) if (labels[c] && keep.has(labels[c] - 1)) seed[c] = 1;
  const reach = boxMorphology(seed, gridW, gridH, r + Math.max(1, Math.round(2 / step)), 'dilate');
  const mask = new Uint8Array(n);
  for (let i = 0; i < n; i++) mask[i] = off[i] && reach[cell[i]] ? 1 : 0;
  return { mask, lab: mean(total) };
}
