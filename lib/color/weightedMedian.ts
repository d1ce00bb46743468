export interface WeightedMedianOptions {
  /** Values are clamped to [lo, hi]. */
  range: [number, number];
  /** Width of the histogram's bins (the result is exact whatever it is; it sets the speed). */
  step: number;
  /** Only samples with include[i] !== 0 count (all when omitted). */
  include?: Uint8Array;
  /** The value of sample i is values[i·stride + offset] (interleaved channels). */
  stride?: number;
  offset?: number;
}

/**
 * Count-weighted median of the samples' values: the smallest value whose cumulative weight reaches
 * half the total. A histogram with bins of `step` finds the bin holding the middle weight in
 * O(n + bins); the values in that bin are then sorted, so the result is exact. NaN when nothing
 * is included.
 */
export function weightedMedian(values: Float64Array, weights: Uint32Array, options: WeightedMedianOptions): number {
  const { range: [lo, hi], step, include, stride = 1, offset = 0 } = options;
  const n = weights.length;
  const bins = Math.ceil((hi - lo) / step) + 1;
  const hist = new Float64Array(bins);
  let sum = 0;
  for (let i = 0; i < n; i++) {
    if (include !== undefined && include[i] === 0) continue;
    const b = Math.min(bins - 1, Math.max(0, Math.floor((values[i * stride + offset] - lo) / step)));
    hist[b] += weights[i];
    sum += weights[i];
  }
  if (sum === 0) return NaN;
  const half = sum / 2;
  let before = 0;
  let bin = 0;
  while (before + hist[bin] < half) before += hist[bin++];

  // The values in that bin (same arithmetic as above, so the same samples), sorted.
  const inBin: number[] = [];
  const inWeight: number[] = [];
  for (let i = 0; i < n; i++) {
    if (include !== undefined && include[i] === 0) continue;
    const v = values[i * stride + offset];
    if (Math.min(bins - 1, Math.max(0, Math.floor((v - lo) / step))) !== bin) continue;
    inBin.push(Math.min(hi, Math.max(lo, v)));
    inWeight.push(weights[i]);
  }
  const order = inBin.map((_, k) => k).sort((p, q) => inBin[p] - inBin[q]);
  for (const k of order) {
    before += inWeight[k];
    if (before >= half) return inBin[k];
  }
  return inBin[order[order.length - 1]];
}
