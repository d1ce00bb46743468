import { solveLinear } from './solveLinear';

/** What a least-squares problem answers at a point: ½‖r‖² and, when asked, JᵀJ and Jᵀr. */
export interface NormalEquations {
  cost: number;
  jtj?: number[][];
  jtr?: number[];
}

/** Stop once a step lowers the cost by less than this share of it. */
const RELATIVE_GAIN = 1e-6;

export interface BoundedLeastSquaresResult {
  params: number[];
  cost: number;
  iterations: number;
}

// Levenberg–Marquardt (Levenberg 1944; Marquardt 1963, with Marquardt's diagonal scaling
// μ·diag(JᵀJ)), kept inside box bounds by projection with an active set (as in Kanzow, Yamashita
// & Fukushima 2004, "Levenberg–Marquardt methods with strong local convergence properties for
// solving nonlinear equations with convex constraints"): a parameter on a bound whose gradient
// points out of the box is held there for that step. The problem supplies the normal
// equations itself, so millions of residuals need no Jacobian in memory.
export function boundedLeastSquares(
  evaluate: (params: number[], withJacobian: boolean) => NormalEquations,
  start: number[],
  lower: number[],
  upper: number[],
  maxIterations = 60,
): BoundedLeastSquaresResult {
  const clamp = (p: number[]) => p.map((v, i) => Math.min(upper[i]!, Math.max(lower[i]!, v)));
  let params = clamp(start);
  let here = evaluate(params, true);
  let mu = 1e-3;
  let iterations = 0;
  for (; iterations < maxIterations; iterations++) {
    const g = here.jtr!;
    const h = here.jtj!;
    const free = params.map((p, i) => !((p <= lower[i]! && g[i]! > 0) || (p >= upper[i]! && g[i]! < 0))).map((f, i) => (f ? i : -1)).filter((i) => i >= 0);
    if (free.length === 0) break;
    let improved = false;
    for (let tries = 0; tries < 12; tries++) {
      const a = free.map((i) => free.map((j) => h[i]![j]! + (i === j ? mu * Math.max(h[i]![i]!, 1e-12) : 0)));
      const step = solveLinear(a, free.map((i) => -g[i]!));
      if (!step) {
        mu *= 10;
        continue;
      }
      const next = [...params];
      free.forEach((i, k) => (next[i] = next[i]! + step[k]!));
      const trial = clamp(next);
      const there = evaluate(trial, false);
      if (Number.isFinite(there.cost) && there.cost < here.cost) {
        const gain = here.cost - there.cost;
        params = trial;
        here = evaluate(params, true);
        mu = Math.max(mu / 3, 1e-9);
        improved = true;
        if (gain <= RELATIVE_GAIN * Math.max(1e-9, here.cost)) return { params, cost: here.cost, iterations: iterations + 1 };
        break;
      }
      mu *= 4;
    }
    if (!improved) break;
  }
  return { params, cost: here.cost, iterations };
}
