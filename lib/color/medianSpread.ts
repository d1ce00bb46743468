import { differenceCiede2000 } from 'culori';
import type { Lab } from './types';

/** Spread is exact up to this many kept pixels, else estimated from an even subset. */
export const SPREAD_SAMPLE = 800;

const ciede2000 = differenceCiede2000(1, 1, 1);

/** The spread of the kept pixels: median CIEDE2000 (culori) of them to the base colour. */
export function medianSpread(lab: Float32Array, kept: Uint8Array, base: Lab, keptCount: number): number {
  const every = Math.max(1, Math.ceil(keptCount / SPREAD_SAMPLE));
  const ref = { mode: 'lab65' as const, ...base };
  const smp = { mode: 'lab65' as const, l: 0, a: 0, b: 0 };
  const de: number[] = [];
  for (let i = 0, k = 0; i < kept.length; i++) {
    if (!kept[i] || k++ % every !== 0) continue;
    smp.l = lab[i * 3]; smp.a = lab[i * 3 + 1]; smp.b = lab[i * 3 + 2];
    de.push(ciede2000(ref, smp));
  }
  de.sort((x, y) => x - y);
  return de.length ? de[Math.floor((de.length - 1) / 2)] : 0;
}
