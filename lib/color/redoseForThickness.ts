// A dose per cup carried from a mold of one thickness class to another: the same colour needs the
// same effective dose, d·f_from = d'·f_to (fitThicknessFactor's first-order Kubelka–Munk form),
// so d' = d·f_from/f_to, rounded to the bench's step and never below one step.
export function redoseForThickness(amount: number, step: number, fromFactor: number, toFactor: number): number {
  const d = (amount * fromFactor) / toFactor;
  return Number(Math.max(step, Math.round(d / step) * step).toFixed(6));
}
