import type { RegionPixels } from './regionPixels';

/**
 * Every sampled pixel's own copy of its colour (Lab and linear XYZ, interleaved) and its grid
 * position, so that the steps that change pixels one by one (the fall-off, correctShading) can.
 */
export function pixelColours(rp: RegionPixels): { lab: Float32Array; xyz: Float32Array; cx: Int32Array; cy: Int32Array } {
  const { samples, xyz: sXyz, gridW, cell, sample } = rp;
  const n = samples.total;
  const sLab = samples.lab;
  const cx = new Int32Array(n), cy = new Int32Array(n);
  const lab = new Float32Array(n * 3);
  const xyz = new Float32Array(n * 3);
  for (let i = 0, j = 0; i < n; i++, j += 3) {
    const x = cell[i] % gridW;
    cx[i] = x;
    cy[i] = (cell[i] - x) / gridW;
    const s = sample[i] * 3;
    lab[j] = sLab[s]; lab[j + 1] = sLab[s + 1]; lab[j + 2] = sLab[s + 2];
    xyz[j] = sXyz[s]; xyz[j + 1] = sXyz[s + 1]; xyz[j + 2] = sXyz[s + 2];
  }
  return { lab, xyz, cx, cy };
}
