import type { Lab, Vec3 } from './types';
import { D65 } from './whitePoints';

// CIE 15:2004 §8.2.1: CIELAB from XYZ relative to a reference white. The exact rational
// constants ε = 216/24389 and κ = 24389/27 (CIE 15:2004 Note 3 gives (6/29)³ and (29/3)³)
// keep the two branches continuous; culori uses the same.
const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;

function labF(t: number): number {
  return t > EPSILON ? Math.cbrt(t) : (KAPPA * t + 16) / 116;
}

export function xyzToLab(xyz: Vec3, white: Vec3 = D65): Lab {
  const fx = labF(xyz[0] / white[0]);
  const fy = labF(xyz[1] / white[1]);
  const fz = labF(xyz[2] / white[2]);
  return { l: 116 * fy - 16, a: 500 * (fx - fy), b: 200 * (fy - fz) };
}
