import { deltaE2000 } from './deltaE2000';
import type { ColorantEffects } from './estimateColorantEffects';
import { solveLinear } from './solveLinear';
import type { Lab } from './types';

export interface DoseLine {
  key: string;
  amount: number;
  /** Smallest step the maker doses in: 0.5 drop, 1/32 tsp, 0.1 g or mL. */
  step: number;
}

export interface Adjustment {
  changes: { key: string; from: number; to: number }[];
  predicted: Lab;
  predictedDE00: number;
}

// Damping on the size of the change (in dose units²): prefers small moves, and
// keeps the answer sensible when the history barely pins an effect down.
const DAMPING = 0.05;

// The dose changes x that best move the pour's colour onto the target under the
// estimated effects: min ‖E·x − (target − pour)‖² + μ‖x‖² in CIELAB, solved by
// the normal equations; no dose goes below zero; each change is rounded to the
// maker's dosing step. Only colorants already in the recipe with a known effect
// are moved.
export function suggestAdjustment(pour: Lab, target: Lab, lines: DoseLine[], effects: ColorantEffects): Adjustment | null {
  const usable = lines.filter((l) => effects[l.key]);
  if (usable.length === 0) return null;
  const e = usable.map((l) => effects[l.key]!.effect);
  const d = [target.l - pour.l, target.a - pour.a, target.b - pour.b];
  const vec = (lab: Lab) => [lab.l, lab.a, lab.b];
  const ata = e.map((ei, i) => e.map((ej, j) => vec(ei).reduce((s, v, c) => s + v * vec(ej)[c]!, 0) + (i === j ? DAMPING : 0)));
  const atd = e.map((ei) => vec(ei).reduce((s, v, c) => s + v * d[c]!, 0));
  const x = solveLinear(ata, atd);
  if (!x) return null;
  const changes = usable.map((l, i) => {
    const raw = Math.max(-l.amount, x[i]!);
    const to = Math.max(0, Math.round((l.amount + raw) / l.step) * l.step);
    return { key: l.key, from: l.amount, to: Number(to.toFixed(4)) };
  });
  const predicted = { ...pour };
  changes.forEach((c, i) => {
    const dx = c.to - c.from;
    predicted.l += e[i]!.l * dx;
    predicted.a += e[i]!.a * dx;
    predicted.b += e[i]!.b * dx;
  });
  return { changes: changes.filter((c) => c.to !== c.from), predicted, predictedDE00: deltaE2000(target, predicted) };
}
