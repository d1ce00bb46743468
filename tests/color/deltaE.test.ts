import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { bandFor, compareLab, deltaE2000, describeDifference, labDifference, type Lab } from '@/lib/color';

// Sharma, Wu & Dalal (2005), "The CIEDE2000 color-difference formula: implementation notes,
// supplementary test data, and mathematical observations", Color Res. Appl. 30(1), Table 1.
const table = JSON.parse(fs.readFileSync(path.join(__dirname, '../fixtures/ciede2000-sharma-2005.json'), 'utf8')) as {
  pairs: number[][];
};
const lab = (l: number, a: number, b: number): Lab => ({ l, a, b });

describe('deltaE2000', () => {
  it('has all 34 pairs of Sharma et al. (2005) Table 1', () => {
    expect(table.pairs).toHaveLength(34);
  });

  // Table 1 prints ΔE00 to 4 decimals, so agreement within 1e-4 is the test.
  it.each(table.pairs.map((p, i) => [i + 1, ...p]))('pair %i matches Table 1 within 1e-4, both orders', (_n, L1, a1, b1, L2, a2, b2, dE) => {
    expect(Math.abs(deltaE2000(lab(L1, a1, b1), lab(L2, a2, b2)) - dE)).toBeLessThan(1e-4);
    expect(Math.abs(deltaE2000(lab(L2, a2, b2), lab(L1, a1, b1)) - dE)).toBeLessThan(1e-4);
  });

  it('is zero for identical colours', () => {
    expect(deltaE2000(lab(50, 10, -20), lab(50, 10, -20))).toBeLessThan(1e-12);
  });
});

describe('labDifference (ASTM D2244 components)', () => {
  it('splits ΔE*ab into ΔL*, ΔC*ab, ΔH*ab: ΔE*ab² = ΔL*² + ΔC*ab² + ΔH*ab² (CIE 15:2004 §8.2.2)', () => {
    const pairs: [Lab, Lab][] = [
      [lab(50, 20, 30), lab(55, 25, 20)],
      [lab(40, -30, 10), lab(38, -20, -15)],
      [lab(70, 5, 60), lab(71, -5, 62)],
    ];
    for (const [r, s] of pairs) {
      const { dL, dC, dH } = labDifference(r, s);
      const dE = Math.hypot(s.l - r.l, s.a - r.a, s.b - r.b);
      expect(Math.abs(dL * dL + dC * dC + dH * dH - dE * dE)).toBeLessThan(1e-9);
    }
  });

  it('equals ASTM D2244-15a eq. 18–19 written out literally, on 1000 seeded pairs', () => {
    let seed = 7;
    const rand = () => ((seed = (seed * 16807) % 2147483647) / 2147483647) * 2 - 1;
    for (let k = 0; k < 1000; k++) {
      const S = lab(50 + 40 * rand(), 80 * rand(), 80 * rand()); // standard (reference)
      const B = lab(50 + 40 * rand(), 80 * rand(), 80 * rand()); // batch (sample)
      const cS = Math.hypot(S.a, S.b);
      const cB = Math.hypot(B.a, B.b);
      const s = S.a * B.b > B.a * S.b ? 1 : -1;
      const astm = s * Math.sqrt(Math.max(0, 2 * (cB * cS - B.a * S.a - B.b * S.b)));
      expect(Math.abs(labDifference(S, B).dH - astm)).toBeLessThan(1e-9);
    }
  });

  it('signs: lighter, higher chroma and counter-clockwise hue are positive (ASTM D2244-15a §6.2.5, eq. 19)', () => {
    // Reference on +a* (h = 0°); sample turned toward +b* (counter-clockwise): ΔH > 0.
    const ccw = labDifference(lab(50, 30, 0), lab(52, 30, 5));
    expect(ccw.dL).toBeCloseTo(2, 12);
    expect(ccw.dH).toBeGreaterThan(0);
    const cw = labDifference(lab(50, 30, 0), lab(50, 30, -5));
    expect(cw.dH).toBeLessThan(0);
    expect(cw.dC).toBeGreaterThan(0);
    // Across the ±180° seam: h 179° → −179° (181°) is a small counter-clockwise step.
    const seam = labDifference(lab(50, -30, 0.5), lab(50, -30, -0.5));
    expect(seam.dH).toBeGreaterThan(0);
    expect(Math.abs(seam.dH)).toBeLessThan(1.01);
  });
});

describe('bandFor (rule-of-thumb bands, PRODUCT.md "Verdict")', () => {
  it('puts the limits in the lower band', () => {
    expect(bandFor(0)).toBe('indistinguishable');
    expect(bandFor(1.0)).toBe('indistinguishable');
    expect(bandFor(1.0001)).toBe('close');
    expect(bandFor(2.0)).toBe('close');
    expect(bandFor(3.5)).toBe('noticeable');
    expect(bandFor(3.5001)).toBe('off');
  });
});

describe('compareLab', () => {
  it('returns ΔE00, components, band and tolerance verdict', () => {
    // Sharma et al. (2005) Table 1, pair 1: ΔE00 = 2.0425.
    const c = compareLab(lab(50, 2.6772, -79.7751), lab(50, 0, -82.7485));
    expect(c.dE00).toBeCloseTo(2.0425, 4);
    expect(c.band).toBe('noticeable');
    expect(c.withinTolerance).toBe(false); // team default tolerance 2.0
    expect(compareLab(lab(50, 2.6772, -79.7751), lab(50, 0, -82.7485), 2.5).withinTolerance).toBe(true);
    expect(c.dL).toBeCloseTo(0, 12);
  });
});

describe('describeDifference', () => {
  it('says "on target" inside the dead-band', () => {
    const d = describeDifference(lab(50, 20, 30), lab(50.2, 20.1, 30.2));
    expect(d.onTarget).toBe(true);
    expect(d.text).toBe('on target');
  });

  it('names lightness and chroma', () => {
    expect(describeDifference(lab(50, 20, 30), lab(54, 20, 30)).words).toEqual(['lighter']);
    expect(describeDifference(lab(50, 20, 30), lab(46, 20, 30)).words).toEqual(['darker']);
    expect(describeDifference(lab(50, 20, 30), lab(50, 30, 45)).chroma).toBe('cleaner');
    expect(describeDifference(lab(50, 20, 30), lab(50, 12, 18)).chroma).toBe('duller');
  });

  it('names the hue axis the trial turns toward', () => {
    // Orange-red target (h ≈ 30°): turning counter-clockwise goes toward yellow (90°).
    const toYellow = (h: number) => lab(50, 40 * Math.cos((h * Math.PI) / 180), 40 * Math.sin((h * Math.PI) / 180));
    expect(describeDifference(toYellow(30), toYellow(40)).hue).toBe('yellow');
    expect(describeDifference(toYellow(30), toYellow(20)).hue).toBe('red');
    expect(describeDifference(toYellow(100), toYellow(95)).hue).toBe('yellow');
    expect(describeDifference(toYellow(100), toYellow(110)).hue).toBe('green');
    expect(describeDifference(toYellow(200), toYellow(210)).hue).toBe('blue');
    expect(describeDifference(toYellow(350), toYellow(5)).hue).toBe('yellow');
    // Neutral target, bluish trial: a cast toward blue.
    expect(describeDifference(lab(50, 0, 0), lab(50, 0, -4)).hue).toBe('blue');
  });
});
