import { fromCups, VOLUME_LABEL, type VolumeUnit } from '@/lib/recipes/units';

// Doses as a pourer reads them: whole drops where the number is whole, up to
// two decimals otherwise; teaspoons also as the nearest eighth when it is
// within 0.01 tsp of one (measuring spoons come in eighths and quarters).
const EIGHTHS = ['', '⅛', '¼', '⅜', '½', '⅝', '¾', '⅞'];

export function amount(v: number): string {
  return Number(v.toFixed(2)).toString();
}

export function spoonFraction(tsp: number): string | null {
  const eighths = Math.round(tsp * 8);
  if (eighths === 0 || Math.abs(tsp - eighths / 8) > 0.01) return null;
  const whole = Math.floor(eighths / 8);
  const part = EIGHTHS[eighths % 8]!;
  if (!part) return null;
  return `${whole ? `${whole} ` : ''}${part} tsp`;
}

const UNIT: Record<string, string> = { drops: 'drops', tsp: 'tsp', g: 'g', ml: 'mL' };
export const unitLabel = (u: string) => UNIT[u] ?? u;

export function dose(v: number, unit: string): string {
  const frac = unit === 'tsp' ? spoonFraction(v) : null;
  const main = `${amount(v)} ${unitLabel(unit)}`;
  return frac ? `${main} (${frac})` : main;
}

// A batch volume in the shop's batch size unit (team setting), from cups.
export function volume(cups: number, unit: VolumeUnit = 'cups'): string {
  const v = fromCups(cups, unit);
  const shown = unit === 'ml' ? v.toFixed(0) : amount(v);
  return `${shown} ${unit === 'cups' && shown === '1' ? 'cup' : VOLUME_LABEL[unit]}`;
}
