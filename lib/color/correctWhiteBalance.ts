import type { Mat3, Vec3 } from './types';
import { applyMat3 } from './applyMat3';
import { bradfordMatrix } from './bradfordMatrix';
import { lightnessToY } from './lightnessToY';
import { multiplyMat3 } from './multiplyMat3';
import { SRGB_TO_XYZ } from './rgbToXyzMatrix';
import { D65 } from './whitePoints';

export interface WhiteBalance {
  method: 'bradford';
  /** Linear RGB → corrected XYZ (D65): the adaptation folded into the photo's RGB → XYZ matrix. */
  toXyz: Mat3;
  /** The adaptation alone, XYZ → XYZ. */
  adaptation: Mat3;
  /** The patch as photographed, XYZ. */
  patchXyz: Vec3;
}

/**
 * White balance from a neutral patch (grey or white card): the patch's mean linear sRGB is taken
 * as the photo's white and adapted to D65 with the Bradford transform (bradfordMatrix.ts).
 *
 * Why Bradford rather than per-channel scaling in linear sRGB: both cost one 3×3 matrix per photo
 * (none per pixel), and both make the card exactly neutral. Bradford was fitted to
 * corresponding-colour data (Lam 1985) and is the transform ICC.1:2010 Annex E uses for a change
 * of white; per-channel scaling in sRGB is a von Kries transform in the sRGB display primaries,
 * which were never chosen to model adaptation. On synthetic photos with a camera white-balance
 * error (gains in a made-up camera RGB) neither is uniformly better: Bradford did better on warm
 * casts, per-channel scaling on cool and green ones, both within about ΔE00 2 for moderate casts
 * (tests/color/measurePhoto.test.ts holds the warm and cool cases).
 *
 * Without `nominalL` the patch keeps its luminance (exposure untouched) and only loses its cast.
 * With the card's nominal L* the destination white is scaled so the patch reads exactly
 * (nominalL, 0, 0): exposure is corrected as well.
 */
export function correctWhiteBalance(patchLinearRgb: Vec3, nominalL?: number, rgbToXyz: Mat3 = SRGB_TO_XYZ): WhiteBalance {
  const patchXyz = applyMat3(rgbToXyz, patchLinearRgb);
  if (!(patchXyz[1] > 0) || patchLinearRgb.some((v) => !(v > 0))) {
    throw new RangeError('the neutral patch is black in at least one channel; it cannot set the white');
  }
  const targetY = nominalL === undefined ? patchXyz[1] : lightnessToY(nominalL);
  const dstWhite: Vec3 = [D65[0] * targetY, D65[1] * targetY, D65[2] * targetY];
  const adaptation = bradfordMatrix(patchXyz, dstWhite);
  return { method: 'bradford', toXyz: multiplyMat3(adaptation, rgbToXyz), adaptation, patchXyz };
}
