import type { Lab, Vec3 } from './types';
import { D65 } from './whitePoints';

// CIE 15:2004 §8.2.1 inverted: XYZ from CIELAB (the exact ε = 216/24389 and κ = 24389/27 of
// xyzToLab.ts, so the two round-trip to floating-point precision).
const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;

function labFInverse(f: number): number {
  const t = f * f * f;
  return t > EPSILON ? t : (116 * f - 16) / KAPPA;
}

export function labToXyz(lab: Lab, white: Vec3 = D65): Vec3 {
  const fy = (lab.l + 16) / 116;
  const fx = fy + lab.a / 500;
  const fz = fy - lab.b / 200;
  const y = lab.l > KAPPA * EPSILON ? fy * fy * fy : lab.l / KAPPA;
  return [white[0] * labFInverse(fx), white[1] * y, white[2] * labFInverse(fz)];
}
