import type { DoseUnit } from '@/db/schema';
import { ML_PER_TSP } from './units';

export type RecipeLineInput = { zone: string; colorantId: string; name?: string; amount: number; unit: DoseUnit };
export type ScaledLine = RecipeLineInput & { perCup: number; total: number; approxMl: number | null };

// Recipes are stored per cup of plastisol and scaled linearly to the batch.
// approxMl converts doses to millilitres where the unit allows: drops through
// the team's dropper setting (about 20 drops per mL is common practice),
// teaspoons by the exact 1/48 cup; grams have no volume without a density.
export function scaleRecipe(lines: RecipeLineInput[], batchCups: number, dropsPerMl: number): ScaledLine[] {
  if (!(batchCups > 0)) throw new RangeError('batch size must be more than 0 cups');
  if (!(dropsPerMl > 0)) throw new RangeError('drops per mL must be more than 0');
  return lines.map((line) => {
    const total = line.amount * batchCups;
    let approxMl: number | null = null;
    if (line.unit === 'ml') approxMl = total;
    else if (line.unit === 'drops') approxMl = total / dropsPerMl;
    else if (line.unit === 'tsp') approxMl = total * ML_PER_TSP;
    return { ...line, perCup: line.amount, total, approxMl };
  });
}
