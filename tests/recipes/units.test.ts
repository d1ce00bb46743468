import { describe, expect, it } from 'vitest';
import { ML_PER_CUP, ML_PER_GALLON, ML_PER_TSP, fromCups, moldYield, scaleRecipe, toCups } from '../../lib/recipes';

describe('recipe arithmetic against the exact US customary definitions', () => {
  // NIST Handbook 44 (2024), Appendix C: 1 gal = 231 in³ = 3.785411784 L;
  // 1 in = 2.54 cm exactly; 1 gal = 16 cups; 1 cup = 8 fl oz = 48 tsp.
  it('derives the gallon from 231 cubic inches', () => {
    expect(ML_PER_GALLON).toBeCloseTo(3785.411784, 9);
  });
  it('has 236.5882365 mL in a cup and 4.92892159375 mL in a teaspoon', () => {
    expect(ML_PER_CUP).toBeCloseTo(236.5882365, 9);
    expect(ML_PER_TSP).toBeCloseTo(4.92892159375, 9);
  });
  it('converts between cups, fluid ounces, gallons and millilitres', () => {
    expect(toCups(1, 'gal')).toBe(16);
    expect(toCups(8, 'floz')).toBeCloseTo(1, 12);
    expect(toCups(ML_PER_CUP, 'ml')).toBeCloseTo(1, 12);
    expect(fromCups(2, 'ml')).toBeCloseTo(473.176473, 6);
    expect(fromCups(toCups(3.7, 'gal'), 'gal')).toBeCloseTo(3.7, 12);
  });

  it('scales per-cup doses linearly to the batch', () => {
    const lines = scaleRecipe(
      [
        { zone: 'back', colorantId: 'p', amount: 6, unit: 'drops' },
        { zone: 'back', colorantId: 'f', amount: 0.25, unit: 'tsp' },
        { zone: 'belly', colorantId: 'g', amount: 1.5, unit: 'g' },
      ],
      2.5,
      20,
    );
    expect(lines[0]!.total).toBeCloseTo(15, 12);
    // 15 drops at 20 drops/mL (common practice; a team setting) = 0.75 mL
    expect(lines[0]!.approxMl).toBeCloseTo(0.75, 12);
    expect(lines[1]!.total).toBeCloseTo(0.625, 12);
    expect(lines[1]!.approxMl).toBeCloseTo(0.625 * 4.92892159375, 9);
    expect(lines[2]!.approxMl).toBeNull();
    expect(() => scaleRecipe([], 0, 20)).toThrow(RangeError);
  });

  it('computes yield per mold: batch volume ÷ (per cavity × cavities + sprue)', () => {
    // 2 cups = 473.176473 mL; shot = 9.5 × 4 + 4 = 42 mL → 11 shots, 44 baits.
    const y = moldYield(2, { cavities: 4, mlPerCavity: 9.5 }, 4);
    expect(y.batchMl).toBeCloseTo(473.176473, 6);
    expect(y.mlPerShot).toBe(42);
    expect(y.shots).toBe(11);
    expect(y.baits).toBe(44);
    expect(y.leftoverMl).toBeCloseTo(473.176473 - 462, 6);
    expect(() => moldYield(1, { cavities: 0, mlPerCavity: 5 })).toThrow(RangeError);
  });
});

describe('batch volumes in the shop’s batch size unit (team setting)', () => {
  // NIST Handbook 44 (2024), Appendix C: 1 cup = 8 fl oz; 16 cups = 1 gal; 1 cup = 236.5882365 mL.
  it('shows cups as fluid ounces, gallons or millilitres', async () => {
    const { formatVolume } = await import('../../lib/format');
    expect(formatVolume(2, 'cups')).toBe('2 cups');
    expect(formatVolume(1, 'cups')).toBe('1 cup');
    expect(formatVolume(2, 'floz')).toBe('16 fl oz');
    expect(formatVolume(8, 'gal')).toBe('0.5 gal');
    expect(formatVolume(2, 'ml')).toBe('473.2 mL');
  });
});
