import type { Lab, Mat3 } from './types';
import { applyMat3 } from './applyMat3';
import { deltaE2000 } from './deltaE2000';
import { labToXyz } from './labToXyz';
import { xyzToLab } from './xyzToLab';

/**
 * How far apart two corrections from the same grey card leave one colour: `lab` as corrected by
 * the first, `otherFromFirst` the second correction's XYZ over the first's (both are 3×3 matrices
 * on the photo's linear RGB, so a colour that is a mean in linear light maps exactly). The card
 * alone cannot say which correction the light called for; the truth lies about between the two
 * (see correctWhiteBalance). Returns the other reading and the ΔE00 (CIEDE2000) between them.
 */
export function castAmbiguity(lab: Lab, otherFromFirst: Mat3): { lab: Lab; dE00: number } {
  const other = xyzToLab(applyMat3(otherFromFirst, labToXyz(lab)));
  return { lab: other, dE00: deltaE2000(lab, other) };
}
