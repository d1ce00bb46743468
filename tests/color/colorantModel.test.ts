import { describe, expect, it } from 'vitest';
import {
  adviseZone,
  boundedLeastSquares,
  deltaE2000,
  fitColorantModel,
  kubelkaMunkRatio,
  kubelkaMunkReflectance,
  predictMixture,
  redoseForThickness,
  startingRecipe,
  trustRatio,
  TRUST_START,
  type ColorantModel,
  type DoseObservation,
} from '@/lib/color';
import { rng } from './synth';

// A known model (invented coefficients, the truth of these tests) in the model's own channels:
// a red, a yellow and a black, each per drop per cup, and a white that scatters.
const TRUTH: ColorantModel = {
  base: [0.02, 0.025, 0.05],
  colorants: {
    'red:drops': { k: [0.03, 0.5, 0.35], s: [0, 0, 0], observations: 0, residual: 0 },
    'yellow:drops': { k: [0.01, 0.04, 0.6], s: [0, 0, 0], observations: 0, residual: 0 },
    'black:drops': { k: [0.4, 0.42, 0.45], s: [0, 0, 0], observations: 0, residual: 0 },
    'white:drops': { k: [0.002, 0.002, 0.002], s: [0.3, 0.3, 0.3], observations: 0, residual: 0 },
  },
  observations: 0,
  residual: 0,
};
const KEYS = Object.keys(TRUTH.colorants);
const observe = (doses: Record<string, number>): DoseObservation => ({ doses, lab: predictMixture(TRUTH, doses) });

function randomRecipes(n: number, seed: number, keys = KEYS) {
  const rand = rng(seed);
  return Array.from({ length: n }, () => {
    const d: Record<string, number> = {};
    for (const k of keys) if (rand() < 0.6) d[k] = Math.round((0.5 + rand() * 6) * 2) / 2;
    return d;
  });
}

describe('Kubelka–Munk remission function', () => {
  it('gives K/S = (1 − R)²/2R and inverts it', () => {
    // R∞ = 0.5 → K/S = 0.25/1 = 0.25 (Kubelka & Munk 1931; worked by hand).
    expect(kubelkaMunkRatio(0.5)).toBeCloseTo(0.25, 12);
    for (const r of [0.01, 0.1, 0.37, 0.8, 0.99]) expect(kubelkaMunkReflectance(kubelkaMunkRatio(r))).toBeCloseTo(r, 9);
    expect(kubelkaMunkReflectance(0)).toBe(1);
  });
});

describe('boundedLeastSquares', () => {
  // y = a·exp(−b·x) sampled exactly at a = 2, b = 0.5 (a textbook nonlinear fit).
  const xs = Array.from({ length: 12 }, (_, i) => i * 0.5);
  const ys = xs.map((x) => 2 * Math.exp(-0.5 * x));
  const evaluate = (p: number[], withJ: boolean) => {
    let cost = 0;
    const jtj = [[0, 0], [0, 0]];
    const jtr = [0, 0];
    xs.forEach((x, i) => {
      const e = Math.exp(-p[1]! * x);
      const r = p[0]! * e - ys[i]!;
      cost += 0.5 * r * r;
      const j = [e, -p[0]! * x * e];
      for (let u = 0; u < 2; u++) {
        jtr[u]! += j[u]! * r;
        for (let v = 0; v < 2; v++) jtj[u]![v]! += j[u]! * j[v]!;
      }
    });
    return withJ ? { cost, jtj, jtr } : { cost };
  };
  it('finds the exact parameters inside the box', () => {
    const r = boundedLeastSquares(evaluate, [1, 1], [0, 0], [10, 10]);
    expect(r.params[0]).toBeCloseTo(2, 5);
    expect(r.params[1]).toBeCloseTo(0.5, 5);
  });
  it('stops on an active bound and fits the rest given it', () => {
    const r = boundedLeastSquares(evaluate, [1, 0.1], [0, 0], [10, 0.3]);
    expect(r.params[1]).toBeCloseTo(0.3, 9);
    // The best a for b fixed at 0.3: Σ y·e / Σ e², e = exp(−0.3x) (linear least squares).
    const e = xs.map((x) => Math.exp(-0.3 * x));
    const a = ys.reduce((s, y, i) => s + y * e[i]!, 0) / e.reduce((s, v) => s + v * v, 0);
    expect(r.params[0]).toBeCloseTo(a, 4);
  });
});

describe('fitColorantModel', () => {
  it('learns the colorants from mixed recipes well enough to predict new ones', () => {
    const model = fitColorantModel([observe({}), ...randomRecipes(40, 1).map(observe)])!;
    for (const d of randomRecipes(15, 2)) expect(deltaE2000(predictMixture(TRUTH, d), predictMixture(model, d))).toBeLessThan(1);
    expect(model.residual).toBeLessThan(0.5);
    expect(model.colorants['black:drops']!.observations).toBeGreaterThan(10);
  });

  it('is monotone: more black predicts darker', () => {
    const model = fitColorantModel(randomRecipes(30, 3).map(observe))!;
    const ls = [0, 1, 2, 4, 8].map((b) => predictMixture(model, { 'red:drops': 2, 'black:drops': b }).l);
    for (let i = 1; i < ls.length; i++) expect(ls[i]!).toBeLessThan(ls[i - 1]!);
  });

  it('knows nothing without history, and nothing of a colorant never dosed', () => {
    expect(fitColorantModel([])).toBeNull();
    const model = fitColorantModel(randomRecipes(10, 4, ['red:drops', 'yellow:drops']).map(observe))!;
    expect(model.colorants['black:drops']).toBeUndefined();
  });

  it('stays finite on a degenerate history: one recipe poured again and again', () => {
    const same = Array.from({ length: 5 }, () => observe({ 'red:drops': 2, 'yellow:drops': 2 }));
    const model = fitColorantModel(same)!;
    for (const c of Object.values(model.colorants)) for (const v of [...c.k, ...c.s]) expect(Number.isFinite(v)).toBe(true);
    expect(deltaE2000(same[0]!.lab, predictMixture(model, same[0]!.doses))).toBeLessThan(0.5);
  });
});

describe('adviseZone', () => {
  const history = [observe({}), ...randomRecipes(40, 5).map(observe)];
  const model = fitColorantModel(history)!;
  const lines = (d: Record<string, number>) => Object.entries(d).map(([key, amount]) => ({ key, amount, step: 0.5 }));

  it('undoes a dose error in the bench steps, never below zero', () => {
    const goal = { 'red:drops': 3, 'yellow:drops': 4 };
    const pour = { 'red:drops': 4.5, 'yellow:drops': 3 };
    const a = adviseZone({ model, target: predictMixture(TRUTH, goal), pours: [observe(pour)], lines: lines(pour), candidates: [], tolerance: 1 });
    expect(a.status).toBe('suggested');
    if (a.status !== 'suggested') return;
    for (const c of a.changes) {
      expect(c.to).toBeGreaterThanOrEqual(0);
      expect((c.to * 2) % 1).toBeCloseTo(0, 9);
    }
    const next = { ...pour, ...Object.fromEntries(a.changes.map((c) => [c.key, c.to])) };
    expect(deltaE2000(predictMixture(TRUTH, goal), predictMixture(TRUTH, next))).toBeLessThan(1.5);
    expect(a.predicted.dE00).toBeLessThan(a.dE00);
  });

  it('says within tolerance, and names a colorant it has no data on', () => {
    const d = { 'red:drops': 2 };
    expect(adviseZone({ model, target: predictMixture(TRUTH, d), pours: [observe(d)], lines: lines(d), candidates: [], tolerance: 2 }).status).toBe('within_tolerance');
    const odd = { 'red:drops': 2, 'teal:drops': 1 };
    const a = adviseZone({ model, target: predictMixture(TRUTH, { 'red:drops': 5 }), pours: [{ doses: odd, lab: predictMixture(TRUTH, d) }], lines: lines(odd), candidates: [], tolerance: 2 });
    expect(a.status).toBe('no_history');
    if (a.status === 'no_history') expect(a.unknown).toEqual(['teal:drops']);
  });

  it('never empties a zone, even when the target is the bare base', () => {
    const d = { 'black:drops': 3 };
    const a = adviseZone({ model, target: predictMixture(TRUTH, {}), pours: [observe(d)], lines: lines(d), candidates: [], tolerance: 1 });
    expect(a.status).toBe('suggested');
    if (a.status === 'suggested') expect(a.changes[0]!.to).toBeGreaterThanOrEqual(0.5);
  });

  it('bounds the step: no dose more than triples on one pour at the starting trust', () => {
    const d = { 'red:drops': 1, 'yellow:drops': 1 };
    const a = adviseZone({ model, target: predictMixture(TRUTH, { 'red:drops': 12, 'yellow:drops': 10 }), pours: [observe(d)], lines: lines(d), candidates: [], tolerance: 1 });
    expect(a.status).toBe('suggested');
    if (a.status === 'suggested') for (const c of a.changes) expect(c.to).toBeLessThanOrEqual(c.from * (1 + 2 * TRUST_START) + 4 * 0.5 * TRUST_START + 1e-9);
  });

  it('for a target outside what the colorants reach, gives the closest and says so', () => {
    // A saturated blue from red, yellow and black: out of reach.
    const d = { 'red:drops': 1, 'yellow:drops': 1 };
    const a = adviseZone({ model, target: { l: 40, a: 10, b: -50 }, pours: [observe(d)], lines: lines(d), candidates: [], tolerance: 2 });
    const text = a.status === 'suggested' ? a.note : a.status === 'no_history' ? a.reason : '';
    expect(text).toMatch(/outside|nearest/);
  });

  it('adds a characterised colorant the zone lacks when it is needed (from: 0)', () => {
    const pour = { 'red:drops': 3 };
    const target = predictMixture(TRUTH, { 'red:drops': 3, 'yellow:drops': 3 });
    const a = adviseZone({ model, target, pours: [observe(pour)], lines: lines(pour), candidates: [{ key: 'yellow:drops', step: 0.5, typical: 3 }], tolerance: 1 });
    expect(a.status).toBe('suggested');
    if (a.status === 'suggested') expect(a.changes.find((c) => c.key === 'yellow:drops')?.from).toBe(0);
  });
});

describe('trustRatio', () => {
  it('grows when the model predicted the match pours and shrinks when it did not', () => {
    const good = [{ 'red:drops': 1 }, { 'red:drops': 3 }, { 'red:drops': 2.5 }].map(observe);
    expect(trustRatio(TRUTH, good)).toBeGreaterThan(TRUST_START);
    const bad = [observe({ 'red:drops': 1 }), { doses: { 'red:drops': 3 }, lab: predictMixture(TRUTH, { 'yellow:drops': 5 }) }, { doses: { 'red:drops': 2 }, lab: predictMixture(TRUTH, { 'black:drops': 3 }) }];
    expect(trustRatio(TRUTH, bad)).toBeLessThan(TRUST_START);
  });
});

describe('startingRecipe', () => {
  it('finds a recipe for a target made of two known colorants', () => {
    const target = predictMixture(TRUTH, { 'red:drops': 2.5, 'yellow:drops': 4 });
    const r = startingRecipe(TRUTH, target, KEYS.map((key) => ({ key, step: 0.5, typical: 3 })))!;
    expect(r.dE00).toBeLessThan(1);
    expect(r.lines.length).toBeLessThanOrEqual(3);
    for (const l of r.lines) expect((l.amount * 2) % 1).toBeCloseTo(0, 9);
  });
});

describe('mold thickness class', () => {
  it('learns how much of its dose a thin mold shows, and the standard colours stay as they were', () => {
    // Thin pours made with the truth at 0.6 of their dose (the model's own first-order form of a
    // thinner layer; an invented factor, the truth of this test).
    const standard = [observe({}), ...randomRecipes(30, 6).map(observe)];
    const thin = randomRecipes(12, 7).map((d) => ({ doses: d, lab: predictMixture(TRUTH, Object.fromEntries(Object.entries(d).map(([k, v]) => [k, v * 0.6]))), thickness: 'thin' as const }));
    const model = fitColorantModel([...standard, ...thin])!;
    expect(model.thickness!.thin.factor).toBeGreaterThan(0.5);
    expect(model.thickness!.thin.factor).toBeLessThan(0.7);
    expect(model.thickness!.thin.observations).toBe(12);
    expect(model.thickness!.thick.factor).toBe(1);
    for (const d of randomRecipes(5, 8)) expect(deltaE2000(predictMixture(TRUTH, d), predictMixture(model, d))).toBeLessThan(1);
  });
});

describe('redoseForThickness', () => {
  it('keeps the effective dose, on the bench step, never below one step', () => {
    // 4 drops in a standard mold (factor 1) for a thin one showing 0.6 of its dose: 4/0.6 ≈ 6.67 → 6.5.
    expect(redoseForThickness(4, 0.5, 1, 0.6)).toBeCloseTo(6.5, 9);
    expect(redoseForThickness(6.5, 0.5, 0.6, 1)).toBeCloseTo(4, 9);
    expect(redoseForThickness(0.5, 0.5, 0.2, 1)).toBeCloseTo(0.5, 9);
  });
});
