import { describe, expect, it } from 'vitest';
import { batchCost, batchDraws, convertDose, planRun, splitZoneCups, zoneCupsProblem } from '../../lib/recipes';

// Exact US customary definitions, NIST Handbook 44 (2024), Appendix C:
// 1 gal = 231 in³, 1 in = 25.4 mm, 16 cups per gallon, 48 teaspoons per cup.
const ML_PER_CUP = (231 * 25.4 ** 3) / 1000 / 16; // 236.5882365 mL
const ML_PER_TSP = ML_PER_CUP / 48;
const DROPS_PER_ML = 20; // about 20 drops per mL: common practice, a team setting

const recipe = [
  { zone: 'back', colorantId: 'brown', amount: 6, unit: 'drops' as const },
  { zone: 'back', colorantId: 'flake', amount: 0.25, unit: 'tsp' as const },
  { zone: 'belly', colorantId: 'white', amount: 3, unit: 'drops' as const },
];
const MOLDS = [
  { id: 'stick', name: 'Stick worm, 4 cavity', cavities: 4, mlPerCavity: 9.5 },
  { id: 'craw', name: 'Craw, 2 cavity', cavities: 2, mlPerCavity: 12 },
  { id: 'finesse', name: 'Finesse worm, 6 cavity', cavities: 6, mlPerCavity: 3.2 },
];

describe('laminate cups per zone', () => {
  it('splits a batch evenly between zones unless told otherwise', () => {
    expect(splitZoneCups(6, ['back', 'belly'])).toEqual([{ zone: 'back', cups: 3 }, { zone: 'belly', cups: 3 }]);
    expect(splitZoneCups(6, ['back', 'belly'], [{ zone: 'belly', cups: 2 }, { zone: 'back', cups: 4 }])).toEqual([{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 2 }]);
  });
  it('refuses a split that does not add up to the batch or misses a zone', () => {
    expect(zoneCupsProblem(6, ['back', 'belly'], [{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 1 }])).toMatch(/add up to 5 cups, not the batch's 6/);
    expect(zoneCupsProblem(6, ['back', 'belly'], [{ zone: 'back', cups: 6 }])).toMatch(/missing: belly/);
    expect(zoneCupsProblem(6, ['back', 'belly'], [{ zone: 'tail', cups: 6 }])).toMatch(/"tail" is not a zone/);
    expect(() => splitZoneCups(6, ['back', 'belly'], [{ zone: 'back', cups: 5 }, { zone: 'belly', cups: 0 }])).toThrow(RangeError);
  });
  it('scales each zone of a 6-cup laminate split 4 + 2 to its own cups', () => {
    const plan = planRun({
      direction: 'cups', cups: 6, molds: [MOLDS[0]!], sprueAllowanceMl: 0, dropsPerMl: DROPS_PER_ML, recipe,
      zones: [{ zone: 'back', weight: 4 }, { zone: 'belly', weight: 2 }],
    });
    const back = plan.zones.find((z) => z.zone === 'back')!;
    const belly = plan.zones.find((z) => z.zone === 'belly')!;
    expect(back.cups).toBeCloseTo(4, 12);
    expect(belly.cups).toBeCloseTo(2, 12);
    expect(back.recipe.map((l) => l.total)).toEqual([expect.closeTo(24, 12), expect.closeTo(1, 12)]); // 6 drops × 4 cups, ¼ tsp × 4 cups
    expect(belly.recipe.map((l) => l.total)).toEqual([expect.closeTo(6, 12)]); // 3 drops × 2 cups, not × 6
  });
});

describe('run plan across several molds', () => {
  const base = { molds: MOLDS.map((m, i) => ({ ...m, shots: [5, 3, 4][i] })), sprueAllowanceMl: 4, dropsPerMl: DROPS_PER_ML, recipe, zones: [{ zone: 'back', weight: 1 }, { zone: 'belly', weight: 1 }] };

  it('three molds yield Σ cavities × shots and need Σ their plastisol plus sprue', () => {
    const plan = planRun({ ...base, direction: 'baits' });
    expect(plan.baits).toBe(4 * 5 + 2 * 3 + 6 * 4); // 50
    expect(plan.molds.map((m) => m.baits)).toEqual([20, 6, 24]);
    const needed = 5 * (4 * 9.5 + 4) + 3 * (2 * 12 + 4) + 4 * (6 * 3.2 + 4); // 210 + 84 + 92.8 = 386.8 mL
    expect(plan.neededMl).toBeCloseTo(needed, 9);
    expect(plan.sprueMl).toBeCloseTo((5 + 3 + 4) * 4, 12);
    expect(plan.neededCups).toBeCloseTo(needed / ML_PER_CUP, 12);
    expect(plan.mixedMl).toBeCloseTo(needed, 9);
    expect(plan.leftoverMl).toBeCloseTo(0, 9);
    for (const z of plan.zones) expect(z.ml).toBeCloseTo(needed / 2, 9);
  });

  it('rounds each zone’s cup up to the bench step and reports the leftover', () => {
    const plan = planRun({ ...base, direction: 'baits', stepCups: 0.25 });
    // 386.8 mL / 2 = 193.4 mL per zone = 0.8174 cups → 1 cup each.
    expect(plan.zones.map((z) => z.cups)).toEqual([1, 1]);
    expect(plan.mixedMl).toBeCloseTo(2 * ML_PER_CUP, 9);
    expect(plan.leftoverMl).toBeCloseTo(2 * ML_PER_CUP - 386.8, 9);
    expect(plan.zones[0]!.recipe[0]!.total).toBeCloseTo(6, 12);
  });

  it('from cups to baits: fills the molds in turn and keeps what no shot can use', () => {
    const plan = planRun({ ...base, direction: 'cups', cups: 2 });
    const total = 2 * ML_PER_CUP; // 473.18 mL
    const used = plan.molds.reduce((s, m) => s + m.shots * m.mlPerShot, 0);
    expect(used).toBeLessThanOrEqual(total + 1e-9);
    expect(plan.leftoverMl).toBeCloseTo(total - used, 9);
    // No mold's next shot fits the leftover.
    for (const m of plan.molds) expect(plan.leftoverMl).toBeLessThan(m.mlPerShot);
    // Turns: a round takes 42 + 28 + 23.2 = 93.2 mL; 5 rounds = 466 mL, 7.18 mL left: no shot fits.
    expect(plan.molds.map((m) => m.shots)).toEqual([5, 5, 5]);
    expect(plan.baits).toBe(5 * (4 + 2 + 6));
    // Both directions agree: planning those shots needs what was used.
    const back = planRun({ ...base, direction: 'baits', molds: plan.molds.map((m) => ({ ...m })) });
    expect(back.neededMl).toBeCloseTo(used, 9);
  });

  it('refuses a plan without molds or shots', () => {
    expect(() => planRun({ ...base, direction: 'baits', molds: [] })).toThrow(/at least one mold/);
    expect(() => planRun({ ...base, direction: 'baits', molds: MOLDS.map((m) => ({ ...m, shots: 0 })) })).toThrow(/at least one shot/);
    expect(() => planRun({ ...base, direction: 'cups', cups: 0 })).toThrow(RangeError);
  });
});

describe('stock draws and cost', () => {
  const colorants = [
    { id: 'brown', name: 'Pigment, brown', unit: 'drops' as const, costPerUnit: 0.02 },
    { id: 'flake', name: 'Flake, black', unit: 'tsp' as const, costPerUnit: null },
    { id: 'white', name: 'Pigment, white', unit: 'ml' as const, costPerUnit: 0.5 },
  ];
  const base = { id: 'base', name: 'Base plastisol', unit: 'ml' as const, costPerUnit: 0.01 };

  it('converts doses between drops, teaspoons and mL (1 tsp = 1/48 cup; 20 drops per mL)', () => {
    expect(convertDose(20, 'drops', 'ml', 20)).toBeCloseTo(1, 12);
    expect(convertDose(1, 'tsp', 'ml', 20)).toBeCloseTo(ML_PER_TSP, 12);
    expect(convertDose(1, 'tsp', 'drops', 20)).toBeCloseTo(ML_PER_TSP * 20, 9);
    expect(convertDose(2, 'g', 'ml', 20)).toBeNull();
    expect(convertDose(2, 'g', 'g', 20)).toBe(2);
  });

  it('draws each zone’s doses for its own cups and the whole batch’s plastisol, in each colorant’s unit', () => {
    const { draws, undrawn } = batchDraws({ zoneCups: [{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 2 }], recipe, colorants, base, dropsPerMl: 20 });
    const get = (id: string) => draws.find((d) => d.colorantId === id)!.amount;
    expect(get('brown')).toBeCloseTo(24, 12);
    expect(get('flake')).toBeCloseTo(1, 12);
    expect(get('white')).toBeCloseTo((3 * 2) / 20, 12); // 6 drops at 20 drops per mL
    expect(get('base')).toBeCloseTo(6 * ML_PER_CUP, 9);
    expect(undrawn).toEqual([]);
  });

  it('costs a batch, names lines without a cost and prices a bait per mold', () => {
    const d = batchDraws({ zoneCups: [{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 2 }], recipe, colorants, base, dropsPerMl: 20 });
    const cost = batchCost({ ...d, batchMl: 6 * ML_PER_CUP, sprueAllowanceMl: 4, molds: [MOLDS[0]!], baits: 120 });
    const expected = 24 * 0.02 + 0.3 * 0.5 + 6 * ML_PER_CUP * 0.01;
    expect(cost.total).toBeCloseTo(expected, 9);
    expect(cost.complete).toBe(false);
    expect(cost.missing).toEqual(['Flake, black']);
    expect(cost.perBait).toBeCloseTo(expected / 120, 12);
    expect(cost.molds[0]!.mlPerBait).toBeCloseTo(9.5 + 4 / 4, 12);
    expect(cost.molds[0]!.perBait).toBeCloseTo((expected / (6 * ML_PER_CUP)) * 10.5, 12);
  });
});

describe('"Log as batch" carries the plan in the URL', () => {
  it('round-trips cups, each side’s cups, the plan and the mold', async () => {
    const { decodeBatchPrefill, encodeBatchPrefill } = await import('../../lib/recipes');
    const prefill = { cups: 2, zoneCups: [{ zone: 'back', cups: 1.25 }, { zone: 'belly', cups: 0.75 }], plan: [{ moldId: 'm 1', shots: 5 }, { moldId: 'm2', shots: 3 }], moldId: 'm 1' };
    const q = new URLSearchParams(encodeBatchPrefill(prefill));
    expect(q.get('log')).toBe('batch');
    expect(decodeBatchPrefill(q)).toEqual(prefill);
    expect(decodeBatchPrefill(new URLSearchParams('batch=x'))).toBeNull();
    // Nonsense is dropped, not guessed: no negative cups, no fractional shots.
    expect(decodeBatchPrefill(new URLSearchParams('log=batch&cups=-1&zoneCups=back:x&plan=m1:2.5'))).toEqual({ cups: null, zoneCups: null, plan: null, moldId: null });
  });
});
