import type { Lab } from './types';

export interface LabDifference {
  /** ΔL* = L*sample − L*reference: positive is lighter. */
  dL: number;
  /** ΔC*ab = C*sample − C*reference: positive is higher chroma (cleaner, more saturated). */
  dC: number;
  /**
   * ΔH*ab, signed: positive when the sample's hue angle h_ab lies counter-clockwise of the
   * reference's (in the a*, b* plane, a* to the right and b* up), i.e. the hue angle grew.
   */
  dH: number;
}

// ASTM D2244-15a §6.2.5 (eq. 18–19) and CIE 15:2004 §8.2.2: ΔL*, ΔC*ab and ΔH*ab, sample (batch)
// minus reference (standard). ASTM writes ΔH*ab = s·[2(C*B·C*S − a*B·a*S − b*B·b*S)]^½ with
// s = +1 when a*S·b*B > a*B·b*S (the sample lies counter-clockwise of the standard), else −1.
// Here the same value as 2·sqrt(C*1·C*2)·sin(Δh/2), Δh the hue-angle difference wrapped into
// (−180°, 180°]: equal magnitude, and sin(Δh/2) carries exactly that sign.
export function labDifference(reference: Lab, sample: Lab): LabDifference {
  const c1 = Math.hypot(reference.a, reference.b);
  const c2 = Math.hypot(sample.a, sample.b);
  let dh = 0;
  if (c1 > 0 && c2 > 0) {
    dh = Math.atan2(sample.b, sample.a) - Math.atan2(reference.b, reference.a);
    if (dh > Math.PI) dh -= 2 * Math.PI;
    else if (dh <= -Math.PI) dh += 2 * Math.PI;
  }
  return {
    dL: sample.l - reference.l,
    dC: c2 - c1,
    dH: 2 * Math.sqrt(c1 * c2) * Math.sin(dh / 2),
  };
}
