import { converter } from 'culori';
import type { Lab, Vec3 } from './types';

const toLab65 = converter('lab65');

// Linear-light sRGB (IEC 61966-2-1 primaries, D65 white) → CIELAB (D65, CIE 15:2004), through
// culori's lrgb and lab65 modes: the inverse of labToLinearRgb.
export function linearRgbToLab(rgb: Vec3): Lab {
  const c = toLab65({ mode: 'lrgb', r: rgb[0], g: rgb[1], b: rgb[2] });
  return { l: c.l, a: c.a, b: c.b };
}
