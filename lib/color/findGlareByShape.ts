import type { RegionPixels } from './regionPixels';
import { boxMorphology } from './boxMorphology';
import { labelComponents } from './labelComponents';
import { weightedMedian } from './weightedMedian';

// Glare thresholds. Ours, set on synthetic photos (tests/support/photoGen.ts); no standard defines glare.
/** A highlight is clipped in a channel and at least GLARE_DL lighter (ΔL*) than the region's
 * median, or washed out and at least GLARE_WASHED_DL lighter and GLARE_WASHED_L light: chroma ≤
 * GLARE_C_RATIO × median chroma + GLARE_C_OFFSET (a highlight adds the light's own near-white
 * colour to the surface colour). */
export const GLARE_DL = 6;
export const GLARE_WASHED_DL = 15;
export const GLARE_WASHED_L = 80;
export const GLARE_C_RATIO = 0.5;
export const GLARE_C_OFFSET = 5;
/** If more than this share of the region would be glare, it is the colour, not glare. */
export const GLARE_MAX_SHARE = 0.5;
/** A highlight patch of at least this many pixels (full resolution) is glare… */
export const GLARE_MIN_AREA = 60;
/** …or one at least this long in any direction (a streak). */
export const GLARE_MIN_LENGTH = 12;
/** A highlight is solid: at least this share of its pixels have all eight neighbours in it too
 * (touching specks of silver flake make spindly clusters). */
export const GLARE_SOLID = 0.15;
/** On a lattice, a sample whose full-resolution neighbours within 1 px differ by at most this many codes is inside a solid highlight. Ours. */
export const GLARE_SMOOTH = 24;
/** …and mostly blown out: at least this share of its pixels clipped in a channel. */
export const GLARE_BLOWN = 0.5;
/**
 * A clipped pixel is a highlight only when it is less colourful than the region (chroma at most
 * GLARE_CLIP_C × the median): a highlight adds the light's own near-white colour, while more
 * light on a saturated colour (the lit side of a shaded body) clips its strongest channel and
 * keeps its chroma. Regions greyer than GLARE_GREY_C (C*ab) cannot tell the two apart.
 */
export const GLARE_CLIP_C = 0.85;
export const GLARE_GREY_C = 10;
/** Pixels within this distance of glare (its blurred fringe) are glare too, when lighter than the
 * region's median L* by GLARE_FRINGE_DL. */
export const GLARE_FRINGE = 2;
export const GLARE_FRINGE_DL = 3;

/**
 * Glare by shape: a highlight is a smooth, connected streak or blob of bright pixels, while
 * silver or white flake and pearl sparkle are many small specks. Highlight pixels (clipped
 * or washed out, and lighter than the median) are grouped into 8-connected components (labelComponents); a component at least
 * GLARE_MIN_AREA pixels in area or GLARE_MIN_LENGTH long, solid (GLARE_SOLID) and mostly clipped (GLARE_BLOWN), is
 * glare, with its lighter neighbours up to
 * GLARE_FRINGE pixels away (the lens spreads the highlight into them). Smaller specks stay flake. When more than GLARE_MAX_SHARE of the region
 * would be glare (a white bait, a blown-out photo), nothing is: the majority is the colour.
 * Returns 1 per sampled pixel (in `cell` order) for glare.
 */
export function findGlareByShape(rp: RegionPixels): Uint8Array {
  const { gridW, gridH, cell, sample, clipped, step } = rp;
  const n = cell.length;
  const glare = new Uint8Array(n);
  const { lab, counts, size } = rp.samples;
  const chroma = new Float64Array(size);
  for (let i = 0; i < size; i++) chroma[i] = Math.sqrt(lab[i * 3 + 1] * lab[i * 3 + 1] + lab[i * 3 + 2] * lab[i * 3 + 2]);
  const medL = weightedMedian(lab, counts, { range: [-1, 110], step: 0.05, stride: 3, offset: 0 });
  const medC = weightedMedian(chroma, counts, { range: [0, 200], step: 0.05 });
  const cMax = GLARE_C_RATIO * medC + GLARE_C_OFFSET;
  const cClip = medC < GLARE_GREY_C ? Infinity : GLARE_CLIP_C * medC;
  const bright = new Uint8Array(size);
  const washedL = Math.max(medL + GLARE_WASHED_DL, GLARE_WASHED_L);
  for (let i = 0; i < size; i++) {
    const l = lab[i * 3];
    bright[i] = (clipped[i] && l >= medL + GLARE_DL && chroma[i] <= cClip) || (chroma[i] <= cMax && l >= washedL) ? 1 : 0;
  }
  const mask = new Uint8Array(gridW * gridH);
  let any = 0;
  for (let i = 0; i < n; i++)
    if (bright[sample[i]]) {
      mask[cell[i]] = 1;
      any++;
    }
  if (any === 0 || any > GLARE_MAX_SHARE * n) return glare;
  const { labels, area, box } = labelComponents(mask, gridW, gridH);
  const inner = boxMorphology(mask, gridW, gridH, 1, 'erode');
  const solid = new Array<number>(area.length).fill(0);
  const blown = new Array<number>(area.length).fill(0);
  if (step > 1 && rp.rough) {
    // On a lattice the neighbours in the grid are step pixels apart: a sample is inside a solid
    // highlight when its full-resolution neighbours within 1 px are alike (regionPixels' rough).
    const near = rp.rough[0];
    for (let i = 0; i < n; i++) if (labels[cell[i]] && near[i] <= GLARE_SMOOTH) solid[labels[cell[i]] - 1]++;
  } else for (let c = 0; c < inner.length; c++) if (inner[c]) solid[labels[c] - 1]++;
  for (let i = 0; i < n; i++) if (clipped[sample[i]] && labels[cell[i]]) blown[labels[cell[i]] - 1]++;
  const isGlare = area.map((a, k) => {
    const [x0, y0, x1, y1] = box[k];
    const length = Math.hypot(x1 - x0 + 1, y1 - y0 + 1) * step;
    const big = a * step * step >= GLARE_MIN_AREA || length >= GLARE_MIN_LENGTH;
    return big && blown[k] >= GLARE_BLOWN * a && (solid[k] >= GLARE_SOLID * a || (step > 1 && !rp.rough));
  });
  if (!isGlare.some(Boolean)) return glare;
  const core = new Uint8Array(gridW * gridH);
  for (let c = 0; c < core.length; c++) if (labels[c] && isGlare[labels[c] - 1]) core[c] = 1;
  const fringe = Math.max(1, Math.round(GLARE_FRINGE / step));
  const wide = boxMorphology(core, gridW, gridH, fringe, 'dilate');
  const lighter = medL + GLARE_FRINGE_DL;
  for (let i = 0; i < n; i++) glare[i] = core[cell[i]] || (wide[cell[i]] && lab[sample[i] * 3] > lighter) ? 1 : 0;
  return glare;
}
