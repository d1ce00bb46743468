import { deltaE2000 } from './deltaE2000';
import { localCorrection } from './localCorrection';
import { predictMixture } from './predictMixture';
import type { ColorantModel, DoseObservation } from './types';

export const TRUST_START = 1;
export const TRUST_MIN = 0.25;
export const TRUST_MAX = 3;

// The trust region's size for the next step, replayed over the match's own pours (Moré 1983,
// "Recent developments in algorithms and software for trust region methods": grow the region
// when the model predicted the last step well, shrink it when it did not). For each pour after
// the first, the model corrected by the pours before it predicts that pour; an error small
// against the colour's move (or under 1 ΔE00) grows the ratio, a large one halves it.
export function trustRatio(model: ColorantModel, pours: DoseObservation[]): number {
  let ratio = TRUST_START;
  for (let i = 1; i < pours.length; i++) {
    const predicted = predictMixture(model, pours[i]!.doses, localCorrection(model, pours.slice(0, i)));
    const error = deltaE2000(pours[i]!.lab, predicted);
    const move = deltaE2000(pours[i - 1]!.lab, pours[i]!.lab);
    if (error <= Math.max(1, 0.35 * move)) ratio = Math.min(TRUST_MAX, ratio * 1.6);
    else if (error > Math.max(2, 0.7 * move)) ratio = Math.max(TRUST_MIN, ratio / 2);
  }
  return ratio;
}
