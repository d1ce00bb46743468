import { converter } from 'culori';
import type { Lab, Vec3 } from './types';

const toLrgb = converter('lrgb');

// CIELAB (D65) → linear-light sRGB (IEC 61966-2-1 primaries, D65 white, no transfer curve),
// through culori's lab65 and lrgb modes. Out-of-gamut colours give values outside 0..1; callers
// that need a reflectance clamp them.
export function labToLinearRgb(lab: Lab): Vec3 {
  const c = toLrgb({ mode: 'lab65', l: lab.l, a: lab.a, b: lab.b });
  return [c.r, c.g, c.b];
}
