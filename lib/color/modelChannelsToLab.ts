import { MODEL_BASIS_INVERSE, MODEL_WHITE } from './modelBasis';
import type { Lab, Vec3 } from './types';
import { D65 } from './whitePoints';
import { xyzToLab } from './xyzToLab';

// The colorant model's channels → CIELAB (D65): back to XYZ through the inverse basis, then
// CIE 15:2004 §8.2.1 (xyzToLab) — the inverse of labToModelChannels, written out rather than
// through culori because the dose solve calls it thousands of times per suggestion.
export function modelChannelsToLab(ch: Vec3): Lab {
  const v = [ch[0] * MODEL_WHITE[0], ch[1] * MODEL_WHITE[1], ch[2] * MODEL_WHITE[2]];
  const m = MODEL_BASIS_INVERSE;
  return xyzToLab(
    [m[0][0] * v[0]! + m[0][1] * v[1]! + m[0][2] * v[2]!, m[1][0] * v[0]! + m[1][1] * v[1]! + m[1][2] * v[2]!, m[2][0] * v[0]! + m[2][1] * v[1]! + m[2][2] * v[2]!],
    D65,
  );
}
