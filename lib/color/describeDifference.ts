import type { Lab } from './types';
import { labDifference } from './labDifference';

export type HueDirection = 'red' | 'yellow' | 'green' | 'blue';

export interface DifferenceWords {
  onTarget: boolean;
  lightness: 'lighter' | 'darker' | null;
  chroma: 'cleaner' | 'duller' | null;
  hue: HueDirection | null;
  /** e.g. ['lighter', 'duller', 'hue toward yellow'], or ['on target']. */
  words: string[];
  text: string;
}

/** Components smaller than this (in weighted ΔE units, see below) are not worth a word. */
export const DEAD_BAND = 0.5;

// CIELAB hue angles of the four unique-hue axes: +a* red (0°), +b* yellow (90°),
// −a* green (180°), −b* blue (270°) (CIE 15:2004 §8.2.1, h_ab measured from +a* toward +b*).
const AXES: HueDirection[] = ['red', 'yellow', 'green', 'blue'];
const deg = (rad: number) => ((rad * 180) / Math.PI + 360) % 360;

/**
 * Plain words for how a trial (sample) differs from its target (reference), from the ASTM D2244
 * components. Chroma and hue are first divided by the CIE94 weighting functions
 * S_C = 1 + 0.045·C̄ and S_H = 1 + 0.015·C̄ (CIE 116-1995), so the dead-band is about the same
 * visual step at any chroma. The hue word names the unique-hue axis the hue is turning toward:
 * the first axis at or beyond the trial's hue angle in the direction of ΔH (positive ΔH is
 * counter-clockwise, red → yellow → green → blue), so a red target whose trial turned past red
 * toward orange reads "hue toward yellow". For a near-neutral target it names the axis nearest
 * the trial's own hue (a cast).
 */
export function describeDifference(reference: Lab, sample: Lab, deadBand: number = DEAD_BAND): DifferenceWords {
  const { dL, dC, dH } = labDifference(reference, sample);
  const c1 = Math.hypot(reference.a, reference.b);
  const c2 = Math.hypot(sample.a, sample.b);
  const cMean = (c1 + c2) / 2;
  const wC = dC / (1 + 0.045 * cMean);
  const wH = dH / (1 + 0.015 * cMean);

  const pick = <T>(v: number, up: T, down: T): T | null => {
    if (v > deadBand) return up;
    return v < -deadBand ? down : null;
  };
  const lightness = pick(dL, 'lighter' as const, 'darker' as const);
  const chroma = pick(wC, 'cleaner' as const, 'duller' as const);
  let hue: HueDirection | null = null;
  const h2 = deg(Math.atan2(sample.b, sample.a));
  if (c1 < 2 * deadBand) {
    // Target is near neutral: its hue angle means nothing; name the trial's cast instead.
    if (c2 > 2 * deadBand) hue = AXES[Math.round(h2 / 90) % 4];
  } else if (Math.abs(wH) > deadBand) {
    hue = AXES[(dH > 0 ? Math.ceil(h2 / 90) : Math.floor(h2 / 90)) % 4];
  }

  const words: string[] = [];
  if (lightness) words.push(lightness);
  if (chroma) words.push(chroma);
  if (hue) words.push(`hue toward ${hue}`);
  const onTarget = words.length === 0;
  if (onTarget) words.push('on target');
  return { onTarget, lightness, chroma, hue, words, text: words.join(', ') };
}
