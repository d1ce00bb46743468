import type { Lab } from './types';

const DEG = Math.PI / 180;
const POW25_7 = 25 ** 7;

/**
 * CIEDE2000's weighting functions S_L, S_C, S_H at one colour (CIE 142-2001; G. Sharma, W. Wu,
 * E. N. Dalal, "The CIEDE2000 color-difference formula", Color Res. Appl. 30(1), 2005, eq. 2–5 and
 * 16–19), with the pair's means L̄′, C̄′, h̄′ taken as this colour's own L*, C′ and h′. Near a colour,
 * a ΔE00 of 1 is a change of S_L in L*, S_C in C′ or S_H in H′ (k_L = k_C = k_H = 1), so a ΔE00
 * radius U around it spans U·S_L, U·S_C and U·S_H along lightness, chroma and hue.
 */
export function deltaE2000Weights(lab: Lab): { sL: number; sC: number; sH: number } {
  const c = Math.hypot(lab.a, lab.b);
  const c7 = c ** 7;
  const g = 0.5 * (1 - Math.sqrt(c7 / (c7 + POW25_7)));
  const ap = (1 + g) * lab.a;
  const cp = Math.hypot(ap, lab.b);
  let hp = cp === 0 ? 0 : Math.atan2(lab.b, ap) / DEG;
  if (hp < 0) hp += 360;
  const t = 1 - 0.17 * Math.cos((hp - 30) * DEG) + 0.24 * Math.cos(2 * hp * DEG) + 0.32 * Math.cos((3 * hp + 6) * DEG) - 0.2 * Math.cos((4 * hp - 63) * DEG);
  const l50 = (lab.l - 50) ** 2;
  return { sL: 1 + (0.015 * l50) / Math.sqrt(20 + l50), sC: 1 + 0.045 * cp, sH: 1 + 0.015 * cp * t };
}
