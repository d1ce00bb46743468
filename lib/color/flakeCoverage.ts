import type { ColorSamples, Lab } from './types';

export interface FlakeCoverage {
  /** Estimated fraction (0..1) of the region's area that is flake. */
  coverage: number;
  /** Fraction of that flake area per group, in the order of `centres`. */
  shares: number[];
}

/**
 * Flake area, counting blended edge pixels by their flake fraction. A speck's outline pixels
 * (and, in a JPEG, the 2×2 chroma blocks and ringing around it) mix flake with base, so counting
 * every non-base pixel as flake reads coverage high. Each flake sample is modelled as
 * base + α·(group − base): it takes the group whose mixing line passes closest, and α is its
 * projection on that line, clamped to 0..1 (linear unmixing in CIELAB, which is near enough to the
 * gamma-encoded space JPEG blends in). Pure flake pixels sit at α ≈ 1.
 */
export function flakeCoverage(samples: ColorSamples, flake: Uint8Array, base: Lab, centres: Lab[]): FlakeCoverage {
  const { lab, counts, size, total } = samples;
  const area = centres.map(() => 0);
  if (centres.length === 0) return { coverage: 0, shares: [] };
  const dirs = centres.map((c) => [c.l - base.l, c.a - base.a, c.b - base.b]);
  const norms = dirs.map((d) => d[0] * d[0] + d[1] * d[1] + d[2] * d[2]);
  for (let i = 0, j = 0; i < size; i++, j += 3) {
    if (!flake[i]) continue;
    const pl = lab[j] - base.l;
    const pa = lab[j + 1] - base.a;
    const pb = lab[j + 2] - base.b;
    let best = 0;
    let bestErr = Infinity;
    let alpha = 1;
    for (let g = 0; g < centres.length; g++) {
      const d = dirs[g];
      const t = Math.min(1, Math.max(0, (pl * d[0] + pa * d[1] + pb * d[2]) / norms[g]));
      const el = pl - t * d[0];
      const ea = pa - t * d[1];
      const eb = pb - t * d[2];
      const err = el * el + ea * ea + eb * eb;
      if (err < bestErr) {
        bestErr = err;
        best = g;
        alpha = t;
      }
    }
    area[best] += counts[i] * alpha;
  }
  const flakeArea = area.reduce((s, v) => s + v, 0);
  return { coverage: flakeArea / total, shares: area.map((v) => (flakeArea > 0 ? v / flakeArea : 0)) };
}
