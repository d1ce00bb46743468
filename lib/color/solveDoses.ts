import { deltaE2000 } from './deltaE2000';
import { predictMixture } from './predictMixture';
import { solveLinear } from './solveLinear';
import type { ColorantModel, Lab, LocalCorrection, Vec3 } from './types';

/** One dose the solve may move: per cup, in the line's unit, on the bench's step. */
export interface DoseVariable {
  key: string;
  amount: number;
  step: number;
  lower: number;
  upper: number;
}

export interface DoseSolution {
  amounts: number[];
  predicted: Lab;
  dE00: number;
}

// CIEDE2000 lightness and chroma weights S_L, S_C at the target (CIE 142-2001 eq. 9–10), used
// to scale the Gauss–Newton residual so its squared norm follows ΔE00 to first order.
function weights(t: Lab): Vec3 {
  const c = Math.hypot(t.a, t.b);
  const sl = 1 + (0.015 * (t.l - 50) ** 2) / Math.sqrt(20 + (t.l - 50) ** 2);
  return [1 / sl, 1 / (1 + 0.045 * c), 1 / (1 + 0.045 * c)];
}

// The doses within [lower, upper] that bring the predicted colour nearest the target: projected
// Gauss–Newton with Levenberg damping on the weighted Lab residual (Nocedal & Wright, Numerical
// Optimization, 2nd ed., §10.3), then a coordinate search on the bench's grid scored by the true
// ΔE00 (rounding a continuous optimum alone can lose a step's worth). `fixed` are doses the solve
// keeps as they are; `moveLimit` caps the predicted colour move from the current recipe (ΔE00).
export function solveDoses(model: ColorantModel, target: Lab, vars: DoseVariable[], fixed: Record<string, number>, correction: LocalCorrection | undefined, moveLimit: number): DoseSolution {
  const w = weights(target);
  const dosesOf = (x: number[]) => {
    const d = { ...fixed };
    vars.forEach((v, i) => (d[v.key] = (d[v.key] ?? 0) + x[i]!));
    return d;
  };
  const start = predictMixture(model, dosesOf(vars.map((v) => v.amount)), correction);
  const score = (x: number[]) => {
    const lab = predictMixture(model, dosesOf(x), correction);
    const over = Math.max(0, deltaE2000(start, lab) - moveLimit);
    return { lab, value: deltaE2000(target, lab) + 4 * over };
  };
  const residual = (x: number[]) => {
    const lab = predictMixture(model, dosesOf(x), correction);
    return [(lab.l - target.l) * w[0], (lab.a - target.a) * w[1], (lab.b - target.b) * w[2]];
  };
  const clamp = (x: number[]) => x.map((v, i) => Math.min(vars[i]!.upper, Math.max(vars[i]!.lower, v)));
  let x = clamp(vars.map((v) => v.amount));
  let best = score(x).value;
  let mu = 1e-2;
  for (let it = 0; it < 30 && vars.length; it++) {
    const r = residual(x);
    const jac = vars.map((v, i) => {
      const h = Math.max(v.step * 0.05, 1e-4);
      const xp = [...x];
      xp[i] = xp[i]! + h;
      return residual(xp).map((rv, k) => (rv - r[k]!) / h);
    });
    const jtj = jac.map((a) => jac.map((b) => a.reduce((s, v, k) => s + v * b[k]!, 0)));
    const jtr = jac.map((a) => a.reduce((s, v, k) => s + v * r[k]!, 0));
    let moved = false;
    for (let tries = 0; tries < 8; tries++) {
      const step = solveLinear(jtj.map((row, i) => row.map((v, j) => v + (i === j ? mu * (jtj[i]![i]! + 1e-6) : 0))), jtr.map((v) => -v));
      if (!step) break;
      const trial = clamp(x.map((v, i) => v + step[i]!));
      const s = score(trial).value;
      if (s < best - 1e-6) {
        x = trial;
        best = s;
        mu = Math.max(mu / 3, 1e-6);
        moved = true;
        break;
      }
      mu *= 5;
    }
    if (!moved) break;
  }
  let grid = x.map((v, i) => Math.min(vars[i]!.upper, Math.max(vars[i]!.lower, Math.round(v / vars[i]!.step) * vars[i]!.step)));
  let gridBest = score(grid).value;
  for (let pass = 0; pass < 40; pass++) {
    let improved = false;
    for (let i = 0; i < vars.length; i++) {
      for (const dir of [-1, 1]) {
        const trial = [...grid];
        trial[i] = trial[i]! + dir * vars[i]!.step;
        if (trial[i]! < vars[i]!.lower - 1e-9 || trial[i]! > vars[i]!.upper + 1e-9) continue;
        const s = score(trial).value;
        if (s < gridBest - 1e-6) {
          grid = trial;
          gridBest = s;
          improved = true;
        }
      }
    }
    if (!improved) break;
  }
  grid = grid.map((v) => Number(v.toFixed(6)));
  const lab = predictMixture(model, dosesOf(grid), correction);
  return { amounts: grid, predicted: lab, dE00: deltaE2000(target, lab) };
}
