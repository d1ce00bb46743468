import { describe, expect, it } from 'vitest';
import { buildBatchSheet, type BatchSheetInput } from '../../lib/batches/buildBatchSheet';
import { BATCH_SHEET_CAUTIONS, SAFETY_CAUTIONS, temperatureNote } from '../../lib/batches/safetyCautions';

// Exact US customary definitions, NIST Handbook 44 (2024), Appendix C:
// 1 gal = 231 in³, 1 in = 25.4 mm, 16 cups per gallon, 48 teaspoons per cup.
const ML_PER_IN3 = 25.4 ** 3 / 1000; // 16.387064 mL
const ML_PER_CUP = (231 * ML_PER_IN3) / 16; // 236.5882365 mL
const ML_PER_TSP = ML_PER_CUP / 48; // 4.92892159375 mL

const base: BatchSheetInput = {
  cups: 3,
  dropsPerMl: 20, // about 20 drops per mL: common practice, a team setting
  sprueAllowanceMl: 4,
  zones: [
    { name: 'back', lab: { l: 38, a: 10, b: 22 }, hex: '#6b4f2f' },
    { name: 'belly', lab: { l: 62, a: 12, b: 30 }, hex: '#b38d5e' },
  ],
  recipe: [
    { zone: 'back', colorantId: 'p1', colorant: 'Pigment, marsh brown', kind: 'pigment', amount: 6, unit: 'drops' },
    { zone: 'back', colorantId: 'f1', colorant: 'Flake, black 0.015 in', kind: 'flake', amount: 0.25, unit: 'tsp' },
    { zone: 'belly', colorantId: 'p2', colorant: 'Pigment, brick red', kind: 'pigment', amount: 2.5, unit: 'drops' },
    { zone: 'belly', colorantId: 's1', colorant: 'Softener', kind: 'additive', amount: 1.5, unit: 'g' },
  ],
  molds: [
    { id: 'm4', name: 'Stick worm 5 in, 4 cavity', cavities: 4, mlPerCavity: 9.5, thickness: 'thick' },
    { id: 'm6', name: 'Finesse worm 4 in, 6 cavity', cavities: 6, mlPerCavity: 3.2, thickness: 'thin' },
  ],
  selectedMoldId: 'm4',
  tempF: 340,
};

describe('batch sheet arithmetic (NIST Handbook 44, Appendix C definitions)', () => {
  it('checks the cup it is built on: 231 in³ ÷ 16 = 236.5882365 mL', () => {
    expect(ML_PER_CUP).toBeCloseTo(236.5882365, 9);
    const sheet = buildBatchSheet(base);
    expect(sheet.batchMl).toBeCloseTo(3 * 236.5882365, 9);
  });

  it('scales each zone to its own cup: 3 cups split evenly is 1.5 cups of back and 1.5 of belly', () => {
    const { recipe, layout } = buildBatchSheet(base);
    const [drops, flake, belly, softener] = recipe;
    expect(layout.map((l) => l.cups)).toEqual([1.5, 1.5]);
    expect(layout[0]!.ml).toBeCloseTo(1.5 * ML_PER_CUP, 9);
    expect(drops!.total).toBeCloseTo(9, 12); // 6 drops per cup × 1.5 cups of back
    expect(drops!.perCup).toBe(6);
    expect(drops!.approxMl).toBeCloseTo(9 / 20, 12); // through the team's 20 drops/mL
    expect(flake!.total).toBeCloseTo(0.375, 12);
    expect(flake!.approxMl).toBeCloseTo(0.375 * ML_PER_TSP, 9); // 1 tsp = 1/48 cup
    expect(belly!.total).toBeCloseTo(3.75, 12);
    expect(softener!.total).toBeCloseTo(2.25, 12);
    expect(softener!.approxMl).toBeNull(); // grams have no volume without a density
    expect(recipe.map((l) => l.colorant)).toEqual(base.recipe.map((l) => l.colorant));
  });

  it('a 6-cup laminate split 4 + 2 scales each zone’s doses to its own cups', () => {
    const sheet = buildBatchSheet({ ...base, cups: 6, zoneCups: [{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 2 }] });
    expect(sheet.layout.map((l) => [l.zone, l.cups])).toEqual([['back', 4], ['belly', 2]]);
    expect(sheet.layout[0]!.recipe.map((l) => l.total)).toEqual([expect.closeTo(24, 12), expect.closeTo(1, 12)]); // 6 drops, ¼ tsp × 4
    expect(sheet.layout[1]!.recipe.map((l) => l.total)).toEqual([expect.closeTo(5, 12), expect.closeTo(3, 12)]); // 2.5 drops, 1.5 g × 2
    expect(() => buildBatchSheet({ ...base, cups: 6, zoneCups: [{ zone: 'back', cups: 4 }, { zone: 'belly', cups: 1 }] })).toThrow(RangeError);
  });

  it('prints a run plan: Σ cavities × shots baits, Σ plastisol plus sprue, and what is left over', () => {
    const sheet = buildBatchSheet({ ...base, plan: [{ ...base.molds[0]!, shots: 10 }, { ...base.molds[1]!, shots: 5 }] });
    expect(sheet.plan!.baits).toBe(4 * 10 + 6 * 5);
    expect(sheet.plan!.neededMl).toBeCloseTo(10 * (4 * 9.5 + 4) + 5 * (6 * 3.2 + 4), 9); // 420 + 116 = 536 mL
    expect(sheet.plan!.sprueMl).toBeCloseTo(15 * 4, 12);
    expect(sheet.plan!.leftoverMl).toBeCloseTo(3 * ML_PER_CUP - 536, 9);
    expect(sheet.plan!.shortMl).toBe(0);
    expect(buildBatchSheet({ ...base, cups: 2, plan: [{ ...base.molds[0]!, shots: 12 }] }).plan!.shortMl).toBeCloseTo(12 * 42 - 2 * ML_PER_CUP, 9);
  });

  it('gives each mold its yield: floor(3 × 236.5882365 / (9.5 × 4 + sprue)) shots', () => {
    const { molds } = buildBatchSheet(base);
    const stick = molds.find((m) => m.id === 'm4')!;
    const expectedShots = Math.floor((3 * ML_PER_CUP) / (9.5 * 4 + 4)); // 709.76 / 42 → 16
    expect(expectedShots).toBe(16);
    expect(stick.mlPerShot).toBeCloseTo(42, 12);
    expect(stick.shots).toBe(expectedShots);
    expect(stick.baits).toBe(expectedShots * 4);
    expect(stick.leftoverMl!).toBeCloseTo(3 * ML_PER_CUP - 16 * 42, 9);
    expect(stick.selected).toBe(true);
    const finesse = molds.find((m) => m.id === 'm6')!;
    expect(finesse.shots).toBe(Math.floor((3 * ML_PER_CUP) / (3.2 * 6 + 4))); // 709.76 / 23.2 → 30
    expect(finesse.baits).toBe(30 * 6);
    expect(finesse.selected).toBe(false);

    const noSprue = buildBatchSheet({ ...base, sprueAllowanceMl: 0 }).molds.find((m) => m.id === 'm4')!;
    expect(noSprue.shots).toBe(Math.floor((3 * ML_PER_CUP) / 38)); // 18
  });

  it('lays out a laminate top to bottom with each zone\'s recipe', () => {
    const sheet = buildBatchSheet(base);
    expect(sheet.laminate).toBe(true);
    expect(sheet.order).toBe('back over belly');
    expect(sheet.layout.map((l) => [l.zone, l.position, l.recipe.length])).toEqual([['back', 0, 2], ['belly', 1, 2]]);
    expect(sheet.layout[0]!.recipe[0]!.total).toBeCloseTo(9, 12);
    const single = buildBatchSheet({ ...base, zones: [base.zones[0]!], recipe: base.recipe.slice(0, 2) });
    expect(single.laminate).toBe(false);
  });

  it('carries the temperature (°C = (°F − 32) × 5/9) and the cautions as plain strings', () => {
    const sheet = buildBatchSheet(base);
    expect(sheet.tempF).toBe(340);
    expect(sheet.tempC!).toBeCloseTo(171.111, 3);
    expect(sheet.tempNote).toBeNull();
    expect(temperatureNote(380)).toMatch(/above/);
    expect(temperatureNote(300)).toMatch(/below/);
    expect(buildBatchSheet({ ...base, tempF: null }).tempC).toBeNull();
    expect(sheet.cautions).toEqual([...BATCH_SHEET_CAUTIONS]);
    expect(sheet.cautions.every((c) => typeof c === 'string' && c.length > 0)).toBe(true);
    // Sources named as in PRODUCT.md, "Trade facts for checks and cautions".
    expect(sheet.cautions.some((c) => c.includes('325–350 °F (homemadetackle.com, "Plastisol"'))).toBe(true);
    expect(sheet.cautions.some((c) => /gloves/.test(c) && /thelureforum\.com/.test(c))).toBe(true);
    expect(sheet.cautions.some((c) => /respirator/.test(c))).toBe(true);
    expect(sheet.cautions.some((c) => /never used for food|never for food/.test(c))).toBe(true);
    expect(sheet.cautions.filter((c) => c.includes('(common practice)'))).toHaveLength(4);
    expect(SAFETY_CAUTIONS.some((c) => /safety data sheet/.test(c))).toBe(true);
  });

  it('refuses a batch of no plastisol', () => {
    expect(() => buildBatchSheet({ ...base, cups: 0 })).toThrow(RangeError);
  });
});
