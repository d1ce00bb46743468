import { solveDoses } from './solveDoses';
import type { AdviceCandidate } from './adviseZone';
import type { ColorantModel, Lab } from './types';

export interface StartingRecipe {
  lines: { key: string; amount: number }[];
  predicted: Lab;
  dE00: number;
}

/** A colorant more must buy at least this much ΔE00 to enter a starting recipe. */
const EXTRA_COLORANT_GAIN = 0.5;

// A first-pour recipe from the target alone: every set of one to `maxColorants` of the
// characterised colorants is solved for the doses nearest the target under the shop's model
// (solveDoses, no move limit, each dose up to four times its usual amount), and the best kept —
// a smaller set unless a larger one is better by EXTRA_COLORANT_GAIN, as makers prefer few
// colorants (common practice). Exhaustive over sets: a handful of colorants makes it cheap.
export function startingRecipe(model: ColorantModel, target: Lab, candidates: AdviceCandidate[], maxColorants = 3): StartingRecipe | null {
  let best: StartingRecipe | null = null;
  let bestSize = 0;
  const sets: AdviceCandidate[][] = [];
  const grow = (from: number, set: AdviceCandidate[]) => {
    if (set.length) sets.push(set);
    if (set.length === maxColorants) return;
    for (let i = from; i < candidates.length; i++) grow(i + 1, [...set, candidates[i]!]);
  };
  grow(0, []);
  sets.sort((x, y) => x.length - y.length);
  for (const set of sets) {
    const vars = set.map((c) => ({ key: c.key, amount: Math.round(c.typical / 2 / c.step) * c.step, step: c.step, lower: 0, upper: Math.max(40 * c.step, Math.ceil((4 * c.typical) / c.step) * c.step) }));
    const s = solveDoses(model, target, vars, {}, undefined, Infinity);
    const better = !best || (set.length > bestSize ? s.dE00 < best.dE00 - EXTRA_COLORANT_GAIN : s.dE00 < best.dE00);
    if (better) {
      best = { lines: set.map((c, i) => ({ key: c.key, amount: s.amounts[i]! })).filter((l) => l.amount > 0), predicted: s.predicted, dE00: s.dE00 };
      bestSize = set.length;
    }
  }
  return best;
}
