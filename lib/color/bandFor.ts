import type { Band } from './types';

// Verdict bands for a CIEDE2000 difference. These limits are common rules of thumb in
// colour-matching practice, not a standard: ≤ 1.0 indistinguishable, ≤ 2.0 close,
// ≤ 3.5 noticeable, above that off.
export function bandFor(dE00: number): Band {
  if (dE00 <= 1.0) return 'indistinguishable';
  if (dE00 <= 2.0) return 'close';
  if (dE00 <= 3.5) return 'noticeable';
  return 'off';
}
