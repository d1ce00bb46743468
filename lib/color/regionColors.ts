import type { ColorSamples, Mat3, PixelWindow } from './types';
import { packedRgbToLab } from './packedRgbToLab';
import { SRGB_TO_XYZ } from './rgbToXyzMatrix';

// Multiplicative hashing with 2^32 / golden ratio (Knuth, TAOCP vol. 3, §6.4).
const HASH = 0x9e3779b1;

/**
 * The distinct colours of the pixels under `spans` (image coordinates, see shapeSpans) and how
 * many pixels carry each, with their Lab (through `toXyz`, which may carry a white-balance
 * correction). Every statistic of measureRegion is a count-weighted sum over these samples, so it
 * equals the per-pixel result while converting each distinct colour to Lab once; a photo region
 * of millions of pixels typically holds a few thousand to a few hundred thousand colours.
 *
 * With step > 1 only the pixels on a regular lattice (x and y multiples of `step`, in image
 * coordinates) are counted: an unbiased sample for large regions (see measurePhoto). `pixels`
 * always counts every pixel under the spans; `total` counts the sampled ones.
 *
 * Open-addressing hash (linear probing) on typed arrays: key = 24-bit colour + 1, 0 = empty.
 * (No closures over the table in the hot loop: V8 keeps plain locals in registers.)
 */
export function regionColors(window: PixelWindow, spans: Int32Array, toXyz: Mat3 = SRGB_TO_XYZ, step = 1): ColorSamples {
  const { data, left, top, width, height } = window;
  // Start the table near its final size (at most 2^16 slots) to spare most rehashing.
  let area = 0;
  for (let s = 0; s < spans.length; s += 3) area += spans[s + 2] - spans[s + 1];
  let bits = Math.min(16, Math.max(10, Math.ceil(Math.log2(area / (step * step) + 1))));
  let keys: Int32Array = new Int32Array(1 << bits);
  let counts: Uint32Array = new Uint32Array(1 << bits);
  let mask = keys.length - 1;
  let shift = 32 - bits;
  let size = 0;
  let total = 0;
  let pixels = 0;

  for (let s = 0; s < spans.length; s += 3) {
    const y = spans[s] - top;
    const x0 = spans[s + 1] - left;
    const x1 = spans[s + 2] - left;
    if (y < 0 || y >= height || x0 < 0 || x1 > width) throw new RangeError('span outside the pixel window');
    pixels += x1 - x0;
    if (spans[s] % step !== 0) continue;
    const first = Math.ceil(spans[s + 1] / step) * step - left;
    if (first >= x1) continue;
    total += Math.floor((x1 - 1 - first) / step) + 1;
    for (let j = (y * width + first) * 3, end = (y * width + x1) * 3, by = 3 * step; j < end; j += by) {
      const key = ((data[j] << 16) | (data[j + 1] << 8) | data[j + 2]) + 1;
      let h = Math.imul(key, HASH) >>> shift;
      let k = keys[h];
      while (k !== key && k !== 0) {
        h = (h + 1) & mask;
        k = keys[h];
      }
      if (k === key) {
        counts[h]++;
        continue;
      }
      keys[h] = key;
      counts[h] = 1;
      if (++size * 2 > keys.length) {
        bits++;
        [keys, counts] = rehash(keys, counts, bits);
        mask = keys.length - 1;
        shift = 32 - bits;
      }
    }
  }

  const rgb = new Uint8Array(size * 3);
  const outCounts = new Uint32Array(size);
  for (let i = 0, n = 0; i < keys.length; i++) {
    const key = keys[i] - 1;
    if (key < 0) continue;
    rgb[n * 3] = key >>> 16;
    rgb[n * 3 + 1] = (key >>> 8) & 255;
    rgb[n * 3 + 2] = key & 255;
    outCounts[n++] = counts[i];
  }
  return { rgb, lab: packedRgbToLab(rgb, size, toXyz), counts: outCounts, size, total, pixels };
}

function rehash(keys: Int32Array, counts: Uint32Array, bits: number): [Int32Array, Uint32Array] {
  const nextKeys = new Int32Array(1 << bits);
  const nextCounts = new Uint32Array(1 << bits);
  const mask = nextKeys.length - 1;
  for (let i = 0; i < keys.length; i++) {
    const k = keys[i];
    if (k === 0) continue;
    let h = Math.imul(k, HASH) >>> (32 - bits);
    while (nextKeys[h] !== 0) h = (h + 1) & mask;
    nextKeys[h] = k;
    nextCounts[h] = counts[i];
  }
  return [nextKeys, nextCounts];
}
