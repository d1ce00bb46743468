import { converter } from 'culori';
import type { Lab } from './types';

const toLab65 = converter('lab65');

// sRGB (IEC 61966-2-1) → CIELAB D65 (CIE 15:2004) through culori's lab65 mode: the reference
// path. r, g, b are 0..255 (8-bit code values; fractions allowed).
export function srgbToLab(r: number, g: number, b: number): Lab {
  const lab = toLab65({ mode: 'rgb', r: r / 255, g: g / 255, b: b / 255 });
  return { l: lab.l, a: lab.a, b: lab.b };
}
