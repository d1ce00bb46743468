import {
  applyMat3,
  correctWhiteBalance,
  deltaE2000,
  invertMat3,
  type Lab,
  type Mat3,
  meanLinearRgb,
  multiplyMat3,
  type RegionPixels,
  type RgbProfile,
  type Vec3,
  xyzToLab,
} from '@/lib/color';
import { ImageError } from './imageError';

export interface CardBalance {
  /** Linear RGB → XYZ (D65) with the card's correction folded in. */
  toXyz: Mat3;
  /** The other reading's XYZ over this one's (castAmbiguity), for the ± and the warning. */
  otherFromFirst: Mat3;
  neutralLab: Lab;
  /** ΔE00 of the card from a neutral grey of the same L*, before correction. */
  cast: number;
}

/**
 * The correction a marked grey card calls for. The card is corrected as a per-channel scale of the
 * photo's own linear RGB (correctWhiteBalance 'channel': what a camera's white-balance error is),
 * and the same card's Bradford correction is kept beside it: where the two disagree on a region,
 * the card alone cannot settle its colour, and the ± and the warning say so (measurePhoto).
 * Throws ImageError 'unusable_neutral' for a card that is clipped or black in a channel.
 */
export function whiteBalanceFromCard(card: RegionPixels, profile: RgbProfile, nominalL?: number): CardBalance {
  const patch = meanLinearRgb(card.samples, profile.linear);
  if (patch.used === 0 || patch.rgb.some((v) => v <= 0)) {
    throw new ImageError(
      'unusable_neutral',
      patch.used === 0
        ? 'The neutral patch is blown out (clipped to white). Shoot with less exposure or mark a grey card.'
        : 'The neutral patch is black in at least one colour channel. Mark a grey or white card.',
    );
  }
  const first = correctWhiteBalance(patch.rgb, nominalL, profile.toXyz, 'channel');
  const other = correctWhiteBalance(patch.rgb, nominalL, profile.toXyz, 'bradford');
  const neutralLab = xyzToLab(applyMat3(profile.toXyz, patch.rgb as Vec3));
  return {
    toXyz: first.toXyz,
    otherFromFirst: multiplyMat3(other.toXyz, invertMat3(first.toXyz)),
    neutralLab,
    cast: deltaE2000(neutralLab, { l: neutralLab.l, a: 0, b: 0 }),
  };
}
