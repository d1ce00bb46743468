import type { ColorSamples, Mat3, PixelWindow } from './types';
import { SRGB8_TO_LINEAR } from './srgbToLinear';
import { SRGB_TO_XYZ } from './rgbToXyzMatrix';
import { D65 } from './whitePoints';

// Multiplicative hashing with 2^32 / golden ratio (Knuth, TAOCP vol. 3, §6.4).
const HASH = 0x9e3779b1;
// CIE 15:2004 §8.2.1 constants (see xyzToLab.ts).
const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;
/** A colour with an 8-bit channel at or above this is clipped in that channel. */
export const CLIP_CODE = 250;

/**
 * A region's pixels kept in place: the distinct colours (`samples`, with Lab and linear XYZ) and,
 * for every sampled pixel, its cell on a grid (row-major, `gridW` wide; one cell per lattice
 * point) and which distinct colour it has. The grid lets measureRegion look at shape
 * (connected glare, a connected second colour, neighbours of flake) while every colour is
 * converted only once.
 */
export interface RegionPixels {
  samples: ColorSamples;
  /** XYZ (D65 white, Y = 1) per distinct colour, after any white-balance correction. */
  xyz: Float64Array;
  /** 1 for a colour clipped in at least one channel (≥ CLIP_CODE as decoded). */
  clipped: Uint8Array;
  gridW: number;
  gridH: number;
  /** Pixels between lattice points (1 = every pixel). */
  step: number;
  cell: Int32Array;
  sample: Int32Array;
  /**
   * On a lattice (step > 1): per sampled pixel, the largest difference of 8-bit code (any
   * channel) to a full-resolution neighbour within 1 pixel and within 2 (roughness: the rows either side only), so
   * that a sample can tell whether it sits beside a speck the lattice does not see. Null for every pixel.
   */
  rough: [Uint8Array, Uint8Array] | null;
}

/**
 * The pixels under `spans` (image coordinates, see shapeSpans), on the lattice of multiples of
 * `step` in x and y. `linear` turns code values into linear light per channel (the photo's own
 * transfer curve) and `toXyz` linear RGB into XYZ (D65), with a white-balance correction folded in
 * when there is one. Distinct colours by open-addressing hash on typed arrays (key = 24-bit
 * colour + 1, 0 = empty).
 */
export function regionPixels(
  window: PixelWindow,
  spans: Int32Array,
  toXyz: Mat3 = SRGB_TO_XYZ,
  step = 1,
  linear: [Float64Array, Float64Array, Float64Array] = [SRGB8_TO_LINEAR, SRGB8_TO_LINEAR, SRGB8_TO_LINEAR],
): RegionPixels {
  const { data, left, top, width, height } = window;
  let yMin = Infinity, yMax = -Infinity, xMin = Infinity, xMax = -Infinity, area = 0, pixels = 0;
  for (let s = 0; s < spans.length; s += 3) {
    const y = spans[s], x0 = spans[s + 1], x1 = spans[s + 2];
    if (y - top < 0 || y - top >= height || x0 - left < 0 || x1 - left > width) throw new RangeError('span outside the pixel window');
    pixels += x1 - x0;
    if (y % step !== 0) continue;
    const first = Math.ceil(x0 / step) * step;
    if (first >= x1) continue;
    area += Math.floor((x1 - 1 - first) / step) + 1;
    yMin = Math.min(yMin, y);
    yMax = Math.max(yMax, y);
    xMin = Math.min(xMin, first);
    xMax = Math.max(xMax, x1 - 1);
  }
  const gx0 = Math.floor(xMin / step), gy0 = Math.floor(yMin / step);
  const gridW = area ? Math.floor(xMax / step) - gx0 + 1 : 0;
  const gridH = area ? Math.floor(yMax / step) - gy0 + 1 : 0;
  const cell = new Int32Array(area);
  const slot = new Int32Array(area);
  const bits = Math.min(20, Math.max(10, Math.ceil(Math.log2(area + 1)) + 1));
  const keys = new Int32Array(1 << bits);
  const counts = new Uint32Array(1 << bits);
  const mask = keys.length - 1, shift = 32 - bits;
  let size = 0, n = 0;
  const xs = step > 1 ? new Int32Array(area) : null;
  const ys = step > 1 ? new Int32Array(area) : null;
  for (let s = 0; s < spans.length; s += 3) {
    const y = spans[s];
    if (y % step !== 0) continue;
    const first = Math.ceil(spans[s + 1] / step) * step;
    const rowCell = (y / step - gy0) * gridW - gx0;
    for (let x = first; x < spans[s + 2]; x += step) {
      const j = ((y - top) * width + (x - left)) * 3;
      const key = ((data[j] << 16) | (data[j + 1] << 8) | data[j + 2]) + 1;
      let h = Math.imul(key, HASH) >>> shift;
      let k = keys[h];
      while (k !== key && k !== 0) {
        h = (h + 1) & mask;
        k = keys[h];
      }
      if (k === 0) {
        keys[h] = key;
        size++;
      }
      counts[h]++;
      cell[n] = rowCell + x / step;
      if (xs) {
        xs[n] = x;
        ys![n] = y;
      }
      slot[n++] = h;
    }
  }
  // Compact the table: slot → sample id.
  const id = new Int32Array(keys.length).fill(-1);
  const rgb = new Uint8Array(size * 3);
  const outCounts = new Uint32Array(size);
  for (let h = 0, m = 0; h < keys.length; h++) {
    if (keys[h] === 0) continue;
    const key = keys[h] - 1;
    rgb[m * 3] = key >>> 16;
    rgb[m * 3 + 1] = (key >>> 8) & 255;
    rgb[m * 3 + 2] = key & 255;
    outCounts[m] = counts[h];
    id[h] = m++;
  }
  const sample = new Int32Array(area);
  for (let i = 0; i < n; i++) sample[i] = id[slot[i]];
  const rough = xs && ys ? roughness(window, xs, ys, n) : null;

  const xyz = new Float64Array(size * 3);
  const lab = new Float64Array(size * 3);
  const clipped = new Uint8Array(size);
  const [lr, lg, lb] = linear;
  const [m0, m1, m2] = toXyz;
  const srgbNeutral = toXyz === SRGB_TO_XYZ && lr === SRGB8_TO_LINEAR && lg === lr && lb === lr;
  for (let i = 0, j = 0; i < size; i++, j += 3) {
    const R = rgb[j], G = rgb[j + 1], B = rgb[j + 2];
    clipped[i] = R >= CLIP_CODE || G >= CLIP_CODE || B >= CLIP_CODE ? 1 : 0;
    const r = lr[R], g = lg[G], b = lb[B];
    const x = m0[0] * r + m0[1] * g + m0[2] * b;
    const Y = m1[0] * r + m1[1] * g + m1[2] * b;
    const z = m2[0] * r + m2[1] * g + m2[2] * b;
    xyz[j] = x;
    xyz[j + 1] = Y;
    xyz[j + 2] = z;
    labInto(x, Y, z, lab, j);
    // Neutral input stays exactly neutral, as in culori (floating-point residue otherwise).
    if (srgbNeutral && R === G && G === B) lab[j + 1] = lab[j + 2] = 0;
  }
  return { samples: { rgb, lab, counts: outCounts, size, total: n, pixels }, xyz, clipped, gridW, gridH, step, cell, sample, rough };
}

// Largest |Δcode| from a pixel of the window to its neighbours: the 3 × 3 square (within 1
// pixel), then out to 2 pixels along its own and the adjacent rows (a 5 × 3 block). Rows two away
// are left out: on a lattice each row touched is a fresh stretch of memory, and a speck that
// close is mostly caught by the rows either side (the lens spreads it).
const RING: [number, number][] = [];
for (let dy = -1; dy <= 1; dy++) for (let dx = -1; dx <= 1; dx++) if (dx || dy) RING.push([dx, dy]);
for (let dy = -1; dy <= 1; dy++) for (const dx of [-2, 2]) RING.push([dx, dy]);
const INNER = 8;

function roughness(window: PixelWindow, xs: Int32Array, ys: Int32Array, n: number): [Uint8Array, Uint8Array] {
  const { data, width, height, left, top } = window;
  const near = new Uint8Array(n), far = new Uint8Array(n);
  const offs = Int32Array.from(RING, ([dx, dy]) => (dy * width + dx) * 3);
  for (let i = 0; i < n; i++) {
    const x = xs[i] - left, y = ys[i] - top;
    const c = (y * width + x) * 3;
    const r0 = data[c], g0 = data[c + 1], b0 = data[c + 2];
    const inside = x >= 2 && y >= 1 && x < width - 2 && y < height - 1;
    let worst = 0;
    for (let k = 0; k < offs.length; k++) {
      if (k === INNER) near[i] = worst;
      if (!inside) {
        const xx = x + RING[k][0], yy = y + RING[k][1];
        if (xx < 0 || xx >= width || yy < 0 || yy >= height) continue;
      }
      const j = c + offs[k];
      let d = data[j] - r0;
      if (d < 0) d = -d;
      if (d > worst) worst = d;
      d = data[j + 1] - g0;
      if (d < 0) d = -d;
      if (d > worst) worst = d;
      d = data[j + 2] - b0;
      if (d < 0) d = -d;
      if (d > worst) worst = d;
    }
    far[i] = worst;
  }
  return [near, far];
}

/** CIE 15:2004 §8.2.1 CIELAB (D65) of one XYZ, written to out[j..j+2]. */
export function labInto(x: number, y: number, z: number, out: Float64Array | Float32Array, j: number): void {
  const X = x / D65[0], Z = z / D65[2];
  const fx = X > EPSILON ? Math.cbrt(X) : (KAPPA * X + 16) / 116;
  const fy = y > EPSILON ? Math.cbrt(y) : (KAPPA * y + 16) / 116;
  const fz = Z > EPSILON ? Math.cbrt(Z) : (KAPPA * Z + 16) / 116;
  out[j] = 116 * fy - 16;
  out[j + 1] = 500 * (fx - fy);
  out[j + 2] = 200 * (fy - fz);
}
