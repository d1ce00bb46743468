// Words for a verdict against the shop's tolerance that respect the measurement's ±: when the ±
// reaches across the tolerance the photo cannot decide it.
export function verdictWords(dE00: number, tolerance: number, uncertainty: number | null | undefined): { kind: 'within' | 'over' | 'unsure'; text: string } {
  if (uncertainty && Math.abs(dE00 - tolerance) < uncertainty) return { kind: 'unsure', text: 'too close to call: reshoot with the card' };
  return dE00 <= tolerance ? { kind: 'within', text: 'within tolerance' } : { kind: 'over', text: 'over tolerance' };
}

/** "2.14 ± 0.35" with two decimals, or the figure alone when there is no ±. */
export const withPlusMinus = (v: number, u: number | null | undefined) => (u ? `${v.toFixed(2)} ± ${u.toFixed(2)}` : v.toFixed(2));
