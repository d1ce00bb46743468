import { describe, expect, it } from 'vitest';
import { adviseFlake, fitFlakeRate, flakeDoseForCoverage } from '@/lib/color';
import { rng } from './synth';

// A Monte-Carlo of random specks: discs of one radius dropped uniformly on a unit square with
// wrap-around edges (no edge effect), their count in proportion to the dose; the covered area is
// counted on a 400 × 400 grid. The Boolean-model coverage 1 − exp(−n·πr²) (Matheron 1975) is
// what fitFlakeRate assumes; here the fit only sees the simulated coverages.
const GRID = 400;
const RADIUS = 0.012;
const SPECKS_PER_UNIT = 300;

function simulateCoverage(dose: number, seed: number): number {
  const rand = rng(seed);
  const covered = new Uint8Array(GRID * GRID);
  const n = Math.round(SPECKS_PER_UNIT * dose);
  const r = RADIUS * GRID;
  for (let s = 0; s < n; s++) {
    const cx = rand() * GRID;
    const cy = rand() * GRID;
    for (let y = Math.floor(cy - r); y <= Math.ceil(cy + r); y++) {
      for (let x = Math.floor(cx - r); x <= Math.ceil(cx + r); x++) {
        if ((x + 0.5 - cx) ** 2 + (y + 0.5 - cy) ** 2 > r * r) continue;
        covered[(((y % GRID) + GRID) % GRID) * GRID + (((x % GRID) + GRID) % GRID)] = 1;
      }
    }
  }
  return covered.reduce((s, v) => s + v, 0) / covered.length;
}

describe('flake by coverage (Poisson model)', () => {
  it('fits k from a few pours and predicts the coverage of other doses within 0.02', () => {
    const fit = fitFlakeRate([0.25, 0.5, 1].map((dose, i) => ({ dose, coverage: simulateCoverage(dose, i + 1) })))!;
    // The Boolean model's own rate: specks per unit dose × speck area.
    expect(fit.k).toBeCloseTo(SPECKS_PER_UNIT * Math.PI * RADIUS ** 2, 1);
    for (const [i, dose] of [0.125, 0.75, 1.5, 2.5].entries()) {
      const simulated = simulateCoverage(dose, 100 + i);
      expect(Math.abs(1 - Math.exp(-fit.k * dose) - simulated), `dose ${dose}`).toBeLessThan(0.02);
    }
  });

  it('gives the dose for a wanted coverage, and nothing without data', () => {
    const k = 0.8;
    const d = flakeDoseForCoverage(k, 0.3);
    expect(1 - Math.exp(-k * d)).toBeCloseTo(0.3, 12);
    expect(flakeDoseForCoverage(k, 0)).toBe(0);
    expect(fitFlakeRate([])).toBeNull();
    expect(fitFlakeRate([{ dose: 0, coverage: 0.2 }])).toBeNull();
  });
});

describe('adviseFlake', () => {
  it('re-doses a zone\'s flake from its own coverage, on 1/32 tsp steps and bounded', () => {
    // 1/8 tsp covered 10 %: k = −ln 0.9 / 0.125 ≈ 0.843; 20 % needs −ln 0.8 / k ≈ 0.265 tsp → 8/32.
    const a = adviseFlake({ key: 'f:tsp', amount: 0.125, step: 1 / 32 }, 0.1, 0.2, null)!;
    expect(a.to).toBeCloseTo(0.25, 9);
    expect(a.note).toMatch(/Poisson/);
    // Far more wanted than one pour may take: at most double.
    expect(adviseFlake({ key: 'f:tsp', amount: 0.125, step: 1 / 32 }, 0.05, 0.6, null)!.to).toBeCloseTo(0.25, 9);
    expect(adviseFlake({ key: 'f:tsp', amount: 0.125, step: 1 / 32 }, 0.19, 0.2, null)).toBeNull();
    // No flake seen on the pour: the shop's rate decides.
    expect(adviseFlake({ key: 'f:tsp', amount: 0.125, step: 1 / 32 }, 0, 0.1, 0.5)!.to).toBeCloseTo(0.21875, 9);
  });
});
