import { describe, expect, it } from 'vitest';
import { deltaE2000, estimateColorantEffects, solveLinear, suggestAdjustment, type DoseStep, type Lab } from '@/lib/color';

// Synthetic shop history with a known linear response (invented numbers, the
// truth of the test): the fit must find it again, and the suggestion must undo
// a known dose error.
const TRUTH: Record<string, Lab> = {
  'brown:drops': { l: -1.5, a: 0.3, b: 0.8 },
  'red:drops': { l: -0.2, a: 1.8, b: 0.9 },
  'flake:tsp': { l: -6, a: 0, b: -1 },
};
const move = (doses: Record<string, number>): Lab => {
  const out = { l: 0, a: 0, b: 0 };
  for (const [k, d] of Object.entries(doses)) {
    out.l += TRUTH[k]!.l * d;
    out.a += TRUTH[k]!.a * d;
    out.b += TRUTH[k]!.b * d;
  }
  return out;
};

describe('solveLinear', () => {
  it('solves a 3×3 system and refuses a singular one', () => {
    // 2x + y − z = 8, −3x − y + 2z = −11, −2x + y + 2z = −3 → (2, 3, −1) (a textbook example).
    const x = solveLinear([[2, 1, -1], [-3, -1, 2], [-2, 1, 2]], [8, -11, -3])!;
    expect(x[0]).toBeCloseTo(2, 10);
    expect(x[1]).toBeCloseTo(3, 10);
    expect(x[2]).toBeCloseTo(-1, 10);
    expect(solveLinear([[1, 2], [2, 4]], [1, 2])).toBeNull();
  });
});

describe('estimateColorantEffects', () => {
  it('recovers each colorant\'s Lab effect per unit dose from consecutive pours', () => {
    const doseSteps: Record<string, number>[] = [
      { 'brown:drops': 1 },
      { 'red:drops': 0.5 },
      { 'brown:drops': 0.5, 'red:drops': -0.5 },
      { 'flake:tsp': 0.125 },
      { 'brown:drops': -1, 'flake:tsp': 0.0625 },
      { 'red:drops': 1, 'flake:tsp': -0.125 },
    ];
    const steps: DoseStep[] = doseSteps.map((doses) => ({ doses, moved: move(doses) }));
    const fx = estimateColorantEffects(steps);
    for (const [k, t] of Object.entries(TRUTH)) {
      expect(fx[k]!.effect.l, k).toBeCloseTo(t.l, 1);
      expect(fx[k]!.effect.a, k).toBeCloseTo(t.a, 1);
      expect(fx[k]!.effect.b, k).toBeCloseTo(t.b, 1);
    }
    expect(fx['brown:drops']!.steps).toBe(3);
  });

  it('knows nothing without history', () => {
    expect(estimateColorantEffects([])).toEqual({});
  });
});

describe('suggestAdjustment', () => {
  const effects = Object.fromEntries(Object.entries(TRUTH).map(([k, effect]) => [k, { effect, steps: 3 }]));
  const target = { l: 38, a: 10, b: 22 };

  it('undoes a known dose error, in the maker\'s dosing steps', () => {
    // The pour had 1 drop of brown too few and 0.5 drop of red too many.
    const error = { 'brown:drops': -1, 'red:drops': 0.5 };
    const m = move(error);
    const pour = { l: target.l + m.l, a: target.a + m.a, b: target.b + m.b };
    const s = suggestAdjustment(pour, target, [
      { key: 'brown:drops', amount: 4, step: 0.5 },
      { key: 'red:drops', amount: 1.5, step: 0.5 },
    ], effects)!;
    expect(deltaE2000(target, pour)).toBeGreaterThan(1.0);
    expect(s.changes).toEqual([
      { key: 'brown:drops', from: 4, to: 5 },
      { key: 'red:drops', from: 1.5, to: 1 },
    ]);
    expect(s.predictedDE00).toBeLessThan(0.5);
  });

  it('never doses below zero and skips colorants with no known effect', () => {
    const pour = { l: target.l - 10, a: target.a, b: target.b }; // far too dark
    const s = suggestAdjustment(pour, target, [
      { key: 'brown:drops', amount: 1, step: 0.5 },
      { key: 'unknown:g', amount: 2, step: 0.1 },
    ], effects)!;
    expect(s.changes).toEqual([{ key: 'brown:drops', from: 1, to: 0 }]);
    expect(suggestAdjustment(pour, target, [{ key: 'unknown:g', amount: 2, step: 0.1 }], effects)).toBeNull();
  });
});
