import type { DoseUnit } from '@/db/schema';
import { ML_PER_TSP } from './units';

// Converts an amount between dose units where the units allow: drops through
// the shop's dropper (drops per mL: about 20 is common practice, a team
// setting), teaspoons by the exact 1/48 cup (NIST Handbook 44, Appendix C).
// Grams are a weight: without a density they convert only to grams (null).
export function convertDose(amount: number, from: DoseUnit, to: DoseUnit, dropsPerMl: number): number | null {
  if (from === to) return amount;
  if (from === 'g' || to === 'g') return null;
  if (!(dropsPerMl > 0)) throw new RangeError('drops per mL must be more than 0');
  const ml = from === 'ml' ? amount : from === 'drops' ? amount / dropsPerMl : amount * ML_PER_TSP;
  return to === 'ml' ? ml : to === 'drops' ? ml * dropsPerMl : ml / ML_PER_TSP;
}
