import type { DoseUnit } from '@/db/schema';
import { fromCups, VOLUME_LABEL, type VolumeUnit } from '@/lib/recipes/units';

// How Pourproof writes a figure, everywhere it shows one (server pages, client
// components, e-mail): no locale, so the server and the browser agree.
// Decimals: Lab to one decimal; ΔE00 to one decimal in lists and two in
// detail; doses on the bench's steps (½ drop, 1/32 tsp, 0.1 g, 0.1 mL) with
// teaspoons also as the spoon fraction; plastisol volumes to 0.1 mL.

/** A number with at most `digits` decimals and no trailing zeros: 0.125 → "0.125", 2.50 → "2.5". */
export const trimmed = (n: number, digits = 3) => String(Number(n.toFixed(digits)) + 0);

const DIGITS: Record<DoseUnit, number> = { drops: 2, tsp: 3, g: 2, ml: 2 };
const ONE: Record<DoseUnit, string> = { drops: 'drop', tsp: 'tsp', g: 'g', ml: 'mL' };
const MANY: Record<DoseUnit, string> = { drops: 'drops', tsp: 'tsp', g: 'g', ml: 'mL' };

/** The unit's word for this amount as shown: "1 drop", but "2 drops" and "0.5 drops". */
export function unitWord(amount: number, unit: DoseUnit): string {
  return doseAmount(amount, unit) === '1' ? ONE[unit] : MANY[unit];
}
export const unitLabel = (unit: string) => MANY[unit as DoseUnit] ?? unit;

/** The amount alone, on the unit's usual decimals. */
export const doseAmount = (v: number, unit: DoseUnit) => trimmed(v, DIGITS[unit] ?? 3);

// Measuring spoons come in eighths down to 1/32 tsp (common practice): a
// teaspoon dose within 1 % of a 32nd (and at least 0.001 tsp) reads as one.
const GLYPH: Record<number, string> = { 4: '⅛', 8: '¼', 12: '⅜', 16: '½', 20: '⅝', 24: '¾', 28: '⅞' };
function gcd(a: number, b: number): number {
  return b ? gcd(b, a % b) : a;
}
export function spoonFraction(tsp: number): string | null {
  const n32 = Math.round(tsp * 32);
  if (n32 <= 0 || Math.abs(tsp - n32 / 32) > Math.max(0.01 * tsp, 0.001)) return null;
  const whole = Math.floor(n32 / 32);
  const rest = n32 % 32;
  if (!rest) return null;
  const g = gcd(rest, 32);
  const part = GLYPH[rest] ?? `${rest / g}/${32 / g}`;
  return `${whole ? `${whole} ` : ''}${part} tsp`;
}

/** "6 drops", "1 drop", "0.25 tsp (¼ tsp)", "1.5 g", "2.5 mL". */
export function formatDose(v: number, unit: DoseUnit): string {
  const main = `${doseAmount(v, unit)} ${unitWord(v, unit)}`;
  const frac = unit === 'tsp' ? spoonFraction(v) : null;
  return frac ? `${main} (${frac})` : main;
}

/** Plastisol volumes and other millilitres: one decimal, "236.6 mL". */
export const formatMl = (ml: number) => `${trimmed(ml, 1)} mL`;
/** Batch sizes in cups: up to three decimals, "1.5 cups", "1 cup". */
export const formatCups = (cups: number) => `${trimmed(cups, 3)} ${trimmed(cups, 3) === '1' ? 'cup' : 'cups'}`;

/** A batch volume given in cups, written in the shop's batch size unit (team setting). */
export function formatVolume(cups: number, unit: VolumeUnit = 'cups'): string {
  if (unit === 'cups') return formatCups(cups);
  const v = fromCups(cups, unit);
  return unit === 'ml' ? formatMl(v) : `${trimmed(v, 3)} ${VOLUME_LABEL[unit]}`;
}

/** ΔE00: one decimal in lists, two in a detail readout. */
export const formatDeltaE = (v: number, place: 'list' | 'detail' = 'list') => v.toFixed(place === 'detail' ? 2 : 1);

type Lab = { l: number; a: number; b: number };
/** CIELAB (D65) to one decimal: "L* 38.0 a* 10.0 b* 22.0". */
export const formatLab = (c: Lab) => `L* ${c.l.toFixed(1)} a* ${c.a.toFixed(1)} b* ${c.b.toFixed(1)}`;

/** °F with °C beside it: "340 °F (171 °C)". */
export const formatTemp = (f: number) => `${trimmed(f, 0)} °F (${(((f - 32) * 5) / 9).toFixed(0)} °C)`;

/** A share of an area (flake, glare) as a percentage, with its ± when it has one: "12.0 % ± 3.0 %". */
export const formatShare = (v: number, u?: number | null) => `${(v * 100).toFixed(1)} %${u !== undefined && u !== null && Number.isFinite(u) ? ` ± ${(u * 100).toFixed(1)} %` : ''}`;

/** A signed difference with its ± when it has one: "−1.20 ± 0.40" (U+2212 minus). */
export const formatSigned = (v: number, u?: number | null) => `${v >= 0 ? '+' : '−'}${Math.abs(v).toFixed(2)}${u !== undefined && u !== null && Number.isFinite(u) ? ` ± ${u.toFixed(2)}` : ''}`;
