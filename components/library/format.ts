import type { ColorantKind, DoseUnit } from '@/db/schema';

// Figures as the library shows them: every number with its unit, formatted
// the same on the server and in the browser (no locale, so no hydration drift).
import { formatDose, formatLab, formatMl, trimmed } from '@/lib/format';

export { trimmed };

const UNIT_ONE: Record<DoseUnit, string> = { drops: 'drop', tsp: 'tsp', g: 'g', ml: 'mL' };

export const UNIT_LABEL: Record<DoseUnit, string> = { drops: 'drops', tsp: 'teaspoons (tsp)', g: 'grams (g)', ml: 'millilitres (mL)' };

export const KIND_LABEL: Record<ColorantKind, string> = {
  base: 'plastisol base',
  pigment: 'liquid pigment',
  pearl: 'pearl / powder',
  flake: 'flake',
  glow: 'glow / UV',
  additive: 'additive',
};

export const KIND_OPTION: Record<ColorantKind, string> = {
  base: 'Plastisol base',
  pigment: 'Liquid pigment',
  pearl: 'Pearl or mica powder',
  flake: 'Flake (glitter)',
  glow: 'Glow or UV powder',
  additive: 'Additive (softener, hardener, salt, scent)',
};

// The unit a shop usually doses each kind in; the form proposes it until the
// unit is chosen by hand.
export const USUAL_UNIT: Record<ColorantKind, DoseUnit> = { base: 'ml', pigment: 'drops', pearl: 'tsp', flake: 'tsp', glow: 'tsp', additive: 'ml' };

export const perUnit = (unit: DoseUnit) => UNIT_ONE[unit];
export const amountOf = (n: number, unit: DoseUnit) => formatDose(n, unit);
// Money reads with at least two decimals (0.30), more only where a small
// per-drop price needs them (0.009).
export function money(n: number): string {
  const s = trimmed(n, 4);
  return (s.split('.')[1] ?? '').length < 2 ? n.toFixed(2) : s;
}
export const costPer = (n: number, unit: DoseUnit) => `${money(n)} per ${UNIT_ONE[unit]}`;
export const inches = (n: number) => `${trimmed(n)} in`;
export const millilitres = formatMl;
export const lab = formatLab;

// Blank number inputs are "not given" (null); anything else goes to zod as a
// number, where NaN is answered "… must be a number".
export function numberOrNull(v: unknown): number | null {
  if (v === '' || v === null || v === undefined) return null;
  return typeof v === 'number' ? v : Number(v);
}
