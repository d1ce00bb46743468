import { solveLinear } from './solveLinear';
import type { Lab } from './types';

/** One earlier step of the shop: how the doses changed from a pour to the next, and how its colour moved. */
export interface DoseStep {
  /** Dose change per colorant key (colorant and unit), per cup of plastisol. */
  doses: Record<string, number>;
  /** Lab of the later pour minus Lab of the earlier one, same zone. */
  moved: Lab;
}

/** Estimated Lab change per unit of dose (per cup), for each colorant seen changing. */
export type ColorantEffects = Record<string, { effect: Lab; steps: number }>;

// Ridge weight, relative to each colorant's own Σ(Δdose)² (Marquardt's scaling,
// so drops and teaspoon fractions are damped alike): keeps the estimate finite
// when two colorants always changed together, and biases it by about 0.1 %.
const RIDGE = 1e-3;

// A linear model of the shop's own history: Δlab ≈ Σ_k effect_k · Δdose_k over
// consecutive pours, fitted by ridge least squares (Hoerl & Kennard 1970):
// E = (XᵀX + λ·diag(XᵀX))⁻¹ XᵀY, X the dose changes (steps × colorants), Y the Lab moves.
// Small dose changes act close to linearly on colour; large ones do not, so
// this is a guide for the next step, not a colour model.
export function estimateColorantEffects(steps: DoseStep[]): ColorantEffects {
  const keys = [...new Set(steps.flatMap((s) => Object.keys(s.doses).filter((k) => s.doses[k] !== 0)))];
  if (keys.length === 0) return {};
  const xtx = keys.map(() => keys.map(() => 0));
  const xty = keys.map(() => [0, 0, 0]);
  for (const s of steps) {
    const x = keys.map((k) => s.doses[k] ?? 0);
    const y = [s.moved.l, s.moved.a, s.moved.b];
    for (let i = 0; i < keys.length; i++) {
      for (let j = 0; j < keys.length; j++) xtx[i]![j]! += x[i]! * x[j]!;
      for (let c = 0; c < 3; c++) xty[i]![c]! += x[i]! * y[c]!;
    }
  }
  keys.forEach((_, i) => (xtx[i]![i]! *= 1 + RIDGE));
  const cols = [0, 1, 2].map((c) => solveLinear(xtx, xty.map((r) => r[c]!)));
  if (cols.some((c) => c === null)) return {};
  const out: ColorantEffects = {};
  keys.forEach((k, i) => {
    out[k] = { effect: { l: cols[0]![i]!, a: cols[1]![i]!, b: cols[2]![i]! }, steps: steps.filter((s) => (s.doses[k] ?? 0) !== 0).length };
  });
  return out;
}
