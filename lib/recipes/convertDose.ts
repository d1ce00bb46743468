import type { DoseUnit } from '@/db/schema';
import { ML_PER_TSP } from './units';

// A dose in one unit expressed in another, where the conversion is exact:
// teaspoons and millilitres by the US teaspoon (1/48 cup, NIST Handbook 44
// Appendix C), drops through the team's dropper setting (drops per mL; about
// 20 is common practice). Grams have no volume without a density, so a dose
// in grams converts to nothing but grams: null means "refuse it".
export function convertDose(amount: number, from: DoseUnit, to: DoseUnit, dropsPerMl: number): number | null {
  if (from === to) return amount;
  if (from === 'g' || to === 'g') return null;
  if (!(dropsPerMl > 0)) throw new RangeError('drops per mL must be more than 0');
  const ML_PER: Record<Exclude<DoseUnit, 'g'>, number> = { ml: 1, tsp: ML_PER_TSP, drops: 1 / dropsPerMl };
  return (amount * ML_PER[from]) / ML_PER[to];
}
