import type { Mat3, Vec3 } from './types';
import { applyMat3 } from './applyMat3';
import { bradfordMatrix } from './bradfordMatrix';
import { invertMat3 } from './invertMat3';
import { lightnessToY } from './lightnessToY';
import { multiplyMat3 } from './multiplyMat3';
import { SRGB_TO_XYZ } from './rgbToXyzMatrix';
import { D65 } from './whitePoints';

/** The space the card's correction is a per-channel scale in. */
export type WhiteBalanceMethod = 'bradford' | 'channel';

export interface WhiteBalance {
  method: WhiteBalanceMethod;
  /** Linear RGB → corrected XYZ (D65): the adaptation folded into the photo's RGB → XYZ matrix. */
  toXyz: Mat3;
  /** The adaptation alone, XYZ → XYZ. */
  adaptation: Mat3;
  /** The patch as photographed, XYZ. */
  patchXyz: Vec3;
}

/**
 * White balance from a neutral patch (grey or white card), as a von Kries transform: a scale of
 * each channel of some RGB space that turns the patch neutral (D65, or the card's nominal L*).
 * Both kinds cost one 3×3 matrix per photo and none per pixel.
 *
 * - 'channel': the scale in the photo's own linear RGB (the camera's output, linear sRGB for an
 *   sRGB photo). A camera's white-balance error is a gain per channel of its linear signal, and
 *   that is undone exactly by the inverse gains in the same space.
 * - 'bradford': the scale in Bradford cone space (K. M. Lam 1985; ICC.1:2010 Annex E.3), fitted to
 *   corresponding colours: how the eye adapts to a change of light.
 *
 * One grey card cannot tell the two apart (both leave it neutral); away from grey they differ,
 * more the further the light is from daylight. measurePhoto corrects by both and reports how far
 * apart they leave each region (castAmbiguity).
 *
 * Without `nominalL` the patch keeps its luminance (exposure untouched) and only loses its cast.
 * With the card's nominal L* the destination white is scaled so the patch reads exactly
 * (nominalL, 0, 0): exposure is corrected as well.
 */
export function correctWhiteBalance(patchLinearRgb: Vec3, nominalL?: number, rgbToXyz: Mat3 = SRGB_TO_XYZ, method: WhiteBalanceMethod = 'bradford'): WhiteBalance {
  const patchXyz = applyMat3(rgbToXyz, patchLinearRgb);
  if (!(patchXyz[1] > 0) || patchLinearRgb.some((v) => !(v > 0))) {
    throw new RangeError('the neutral patch is black in at least one channel; it cannot set the white');
  }
  const targetY = nominalL === undefined ? patchXyz[1] : lightnessToY(nominalL);
  const dstWhite: Vec3 = [D65[0] * targetY, D65[1] * targetY, D65[2] * targetY];
  if (method === 'bradford') {
    const adaptation = bradfordMatrix(patchXyz, dstWhite);
    return { method, toXyz: multiplyMat3(adaptation, rgbToXyz), adaptation, patchXyz };
  }
  // The photo's RGB of the destination white, over the patch's: the gain of each channel.
  const fromXyz = invertMat3(rgbToXyz);
  const dstRgb = applyMat3(fromXyz, dstWhite);
  const gain: Mat3 = [
    [dstRgb[0] / patchLinearRgb[0], 0, 0],
    [0, dstRgb[1] / patchLinearRgb[1], 0],
    [0, 0, dstRgb[2] / patchLinearRgb[2]],
  ];
  const toXyz = multiplyMat3(rgbToXyz, gain);
  return { method, toXyz, adaptation: multiplyMat3(toXyz, fromXyz), patchXyz };
}
