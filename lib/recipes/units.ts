// Exact US customary volume definitions:
// 1 US gallon = 231 in³ (US Code 15 §205, NIST Handbook 44 Appendix C),
// 1 inch = 25.4 mm exactly (international yard and pound agreement, 1959),
// so 1 gal = 231 × 16.387064 cm³ = 3785.411784 mL; 16 cups per gallon,
// 8 fluid ounces per cup, 48 teaspoons per cup (NIST Handbook 44 Appendix C).
export const ML_PER_CUBIC_INCH = 25.4 ** 3 / 1000; // 16.387064
export const ML_PER_GALLON = 231 * ML_PER_CUBIC_INCH; // 3785.411784
export const CUPS_PER_GALLON = 16;
export const ML_PER_CUP = ML_PER_GALLON / CUPS_PER_GALLON; // 236.5882365
export const FLOZ_PER_CUP = 8;
export const TSP_PER_CUP = 48;
export const ML_PER_TSP = ML_PER_CUP / TSP_PER_CUP;

export const VOLUME_UNITS = ['cups', 'floz', 'gal', 'ml'] as const;
export type VolumeUnit = (typeof VOLUME_UNITS)[number];

const CUPS_PER: Record<VolumeUnit, number> = {
  cups: 1,
  floz: 1 / FLOZ_PER_CUP,
  gal: CUPS_PER_GALLON,
  ml: 1 / ML_PER_CUP,
};

export function toCups(amount: number, unit: VolumeUnit): number {
  return amount * CUPS_PER[unit];
}

export function fromCups(cups: number, unit: VolumeUnit): number {
  return cups / CUPS_PER[unit];
}

export const VOLUME_LABEL: Record<VolumeUnit, string> = { cups: 'cups', floz: 'fl oz', gal: 'gal', ml: 'mL' };
