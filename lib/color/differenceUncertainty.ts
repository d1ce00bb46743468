import type { Lab } from './types';
import { deltaE2000Weights } from './deltaE2000Weights';

/**
 * The ± (about 95 %, k = 2) of ΔL*, ΔC* and ΔH* between two measured colours, each known to
 * within a ΔE00 radius (`uReference`, `uSample`: regionUncertainty's k = 2 radii). Each radius
 * becomes a radius in lightness, chroma and hue at its own colour through CIEDE2000's weights
 * (deltaE2000Weights: U·S_L, U·S_C, U·S_H; CIE 142-2001, Sharma et al. 2005), and the two
 * independent measurements combine in quadrature (JCGM 100:2008 §5.1.2). Left out on purpose:
 * CIEDE2000's a′ stretch (G), which makes a chroma change in C′ larger than in C*ab, so U·S_C is
 * if anything generous for ΔC*ab, and the rotation term R_T of the blue region, which couples
 * chroma and hue there.
 */
export function differenceUncertainty(reference: Lab, uReference: number, sample: Lab, uSample: number): { dL: number; dC: number; dH: number } {
  const r = deltaE2000Weights(reference);
  const s = deltaE2000Weights(sample);
  return {
    dL: Math.hypot(uReference * r.sL, uSample * s.sL),
    dC: Math.hypot(uReference * r.sC, uSample * s.sC),
    dH: Math.hypot(uReference * r.sH, uSample * s.sH),
  };
}
