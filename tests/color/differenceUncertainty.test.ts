// The ± of ΔL*, ΔC*, ΔH* (differenceUncertainty) and CIEDE2000's weights behind it
// (deltaE2000Weights, CIE 142-2001; Sharma, Wu & Dalal 2005, eq. 2–5 and 16–19), checked against
// culori's own CIEDE2000 (deltaE2000) and by Monte Carlo.
import { describe, expect, it } from 'vitest';
import { deltaE2000, deltaE2000Weights, differenceUncertainty, labDifference, type Lab } from '@/lib/color';
import { gauss, rng } from './synth';

const COLOURS: Lab[] = [
  { l: 55, a: -30, b: 25 },
  { l: 82, a: -15, b: 65 },
  { l: 35, a: 5, b: -25 },
  { l: 62, a: 30, b: 55 },
  { l: 72, a: 35, b: 5 },
  { l: 20, a: 40, b: -50 },
];

// A small step along lightness, chroma or hue, in CIEDE2000's own a′ (Sharma et al. eq. 2–3).
function step(c: Lab, along: 'L' | 'C' | 'H', size: number): Lab {
  if (along === 'L') return { ...c, l: c.l + size };
  const cab = Math.hypot(c.a, c.b);
  const g = 0.5 * (1 - Math.sqrt(cab ** 7 / (cab ** 7 + 25 ** 7)));
  const ap = (1 + g) * c.a;
  const cp = Math.hypot(ap, c.b);
  const h = Math.atan2(c.b, ap);
  const [cn, hn] = along === 'C' ? [cp + size, h] : [cp, h + size / cp];
  return { l: c.l, a: (cn * Math.cos(hn)) / (1 + g), b: cn * Math.sin(hn) };
}

describe('deltaE2000Weights', () => {
  it('a step of ε·S along L, C′ or H′ is ΔE00 ε by culori (within 3 %)', () => {
    const eps = 0.05;
    for (const c of COLOURS) {
      const w = deltaE2000Weights(c);
      for (const [along, s] of [['L', w.sL], ['C', w.sC], ['H', w.sH]] as const) {
        expect(Math.abs(deltaE2000(c, step(c, along, eps * s)) / eps - 1)).toBeLessThan(0.03);
      }
    }
  });

  it('S_L is 1 at L* 50 and grows away from it; S_C = 1 for a neutral (Sharma et al. eq. 16–17)', () => {
    expect(deltaE2000Weights({ l: 50, a: 0, b: 0 })).toEqual({ sL: 1, sC: 1, sH: 1 });
    expect(deltaE2000Weights({ l: 90, a: 0, b: 0 }).sL).toBeGreaterThan(deltaE2000Weights({ l: 60, a: 0, b: 0 }).sL);
  });
});

// Monte Carlo: each measurement's error is normal in CIEDE2000's local metric with a standard
// deviation U/2 along each of lightness, chroma and hue (U its k = 2 radius, JCGM 100:2008 §6).
// The radii must hold the error of ΔL*, ΔC*ab, ΔH*ab (ASTM D2244, labDifference) in ≈ 95 % of draws.
describe('differenceUncertainty, Monte Carlo', () => {
  it('each radius holds 93–97.5 % of the drawn errors', () => {
    const normal = gauss(rng(11));
    const hits = { dL: 0, dC: 0, dH: 0 };
    let draws = 0;
    for (let p = 0; p < COLOURS.length; p++) {
      const ref = COLOURS[p];
      const sample = step(step(ref, 'L', 1.2), 'C', -1.5);
      const [uR, uS] = [0.3 + 0.1 * p, 0.8 - 0.1 * p];
      const radius = differenceUncertainty(ref, uR, sample, uS);
      const truth = labDifference(ref, sample);
      const jitter = (c: Lab, u: number) => {
        const w = deltaE2000Weights(c);
        return step(step(step(c, 'L', (u / 2) * w.sL * normal()), 'C', (u / 2) * w.sC * normal()), 'H', (u / 2) * w.sH * normal());
      };
      for (let k = 0; k < 4000; k++) {
        const got = labDifference(jitter(ref, uR), jitter(sample, uS));
        for (const key of ['dL', 'dC', 'dH'] as const) if (Math.abs(got[key] - truth[key]) <= radius[key]) hits[key]++;
        draws++;
      }
    }
    for (const key of ['dL', 'dC', 'dH'] as const) {
      expect(hits[key] / draws, key).toBeGreaterThanOrEqual(0.93);
      expect(hits[key] / draws, key).toBeLessThanOrEqual(0.975);
    }
  });

  it('grows with either measurement and is 0 when both are exact', () => {
    const [a, b] = [COLOURS[0], COLOURS[3]];
    expect(differenceUncertainty(a, 0, b, 0)).toEqual({ dL: 0, dC: 0, dH: 0 });
    const small = differenceUncertainty(a, 0.3, b, 0.3);
    const large = differenceUncertainty(a, 0.3, b, 0.9);
    for (const key of ['dL', 'dC', 'dH'] as const) expect(large[key]).toBeGreaterThan(small[key]);
  });
});
