import type { Mat3 } from './types';
import { type LumaChroma, lumaChroma } from './lumaChroma';
import type { LumaCodeInput } from './areaByLumaCode';
import type { RegionPixels } from './regionPixels';

export interface RegionLuma {
  ycc: LumaChroma;
  /** What measureFlake needs to read an area from luma (areaByLumaCode). */
  luma: Omit<LumaCodeInput, 'flake'>;
}

/**
 * A region's pixels as JPEG stores them (lumaChroma; glare and the second colour left out) and
 * the base's luma and its noise σ from the truly base pixels (trulyBase: clear of specks, and luma
 * is not smeared). Null when there are too few of those.
 */
export function regionLuma(xyz: Float32Array, glare: Uint8Array, other: Uint8Array, truly: Uint8Array, rp: RegionPixels, toXyz: Mat3): RegionLuma | null {
  const n = glare.length;
  const usable = new Uint8Array(n);
  for (let i = 0; i < n; i++) usable[i] = glare[i] || other[i] ? 0 : 1;
  const ycc = lumaChroma(xyz, usable, toXyz);
  let sum = 0, count = 0;
  for (let i = 0; i < n; i++) {
    if (!truly[i] || !usable[i]) continue;
    sum += ycc.y[i];
    count++;
  }
  if (count < 2) return null;
  const base = sum / count;
  let v = 0;
  for (let i = 0; i < n; i++) if (truly[i] && usable[i]) v += (ycc.y[i] - base) ** 2;
  return { ycc, luma: { y: ycc.y, base, noise: Math.sqrt(v / (count - 1)), cell: rp.cell, gridW: rp.gridW, gridH: rp.gridH } };
}
