// The next-pour simulation without a server: the same lib/color functions the route uses, the
// simulated colorant system as the bench, the maker following every suggestion exactly.
import { adviseZone, deltaE2000, fitColorantModel, startingRecipe, type ColorantModel, type DoseObservation, type Lab } from '@/lib/color';
import { gauss, rng } from '../synth';
import { COLORANTS, STEP, trueLab, type SimTarget } from './shop';

export interface SimResult {
  /** Pours to bring every zone within tolerance (pour 1 = first guess); null = not within maxPours. */
  pours: (number | null)[];
  suggestions: number;
  worse: number;
  emptied: number;
  stuck: number;
}

const key = (i: number) => `c${i}:drops`;
const toDoses = (v: number[]) => Object.fromEntries(v.flatMap((d, i) => (d > 0 ? [[key(i), d]] : [])));

export function runPure(targets: SimTarget[], history: number[][], opts: { seed: number; noise: number; maxPours: number; tolerance: number }): SimResult {
  const normal = gauss(rng(opts.seed));
  const measure = (doses: number[]): Lab => {
    const t = trueLab(doses);
    return { l: t.l + opts.noise * normal(), a: t.a + opts.noise * normal(), b: t.b + opts.noise * normal() };
  };
  const shop: DoseObservation[] = history.map((d) => ({ doses: toDoses(d), lab: measure(d) }));
  let model: ColorantModel | null = null;
  const out: SimResult = { pours: [], suggestions: 0, worse: 0, emptied: 0, stuck: 0 };
  for (const target of targets) {
    const goal = target.zones.map((z) => trueLab(z.doses));
    let recipe = target.firstGuess.map((g) => [...g]);
    const matchPours: DoseObservation[][] = target.zones.map(() => []);
    let reached: number | null = null;
    let prevDe: number[] | null = null;
    let suggested: boolean[] = [];
    for (let n = 1; n <= opts.maxPours; n++) {
      const labs = recipe.map((r) => measure(r));
      const de = labs.map((l, z) => deltaE2000(goal[z]!, l));
      if (prevDe) de.forEach((d, z) => suggested[z] && d > prevDe![z]! + 1 && out.worse++);
      recipe.forEach((r, z) => {
        const o = { doses: toDoses(r), lab: labs[z]! };
        shop.push(o);
        matchPours[z]!.push(o);
      });
      if (de.every((d) => d <= opts.tolerance)) {
        reached = n;
        break;
      }
      model = fitColorantModel(shop, model);
      suggested = [];
      recipe = recipe.map((r, z) => {
        const advice = adviseZone({
          model,
          target: goal[z]!,
          pours: matchPours[z]!,
          lines: r.flatMap((d, i) => (d > 0 ? [{ key: key(i), amount: d, step: STEP.drops }] : [])),
          candidates: COLORANTS.flatMap((_, i) => (r[i]! > 0 ? [] : [{ key: key(i), step: STEP.drops, typical: 3 }])),
          tolerance: opts.tolerance,
        });
        if (advice.status !== 'suggested') {
          if (advice.status === 'no_history') out.stuck++;
          suggested[z] = false;
          return r;
        }
        out.suggestions++;
        suggested[z] = true;
        const next = [...r];
        for (const c of advice.changes) next[Number(c.key.slice(1, c.key.indexOf(':')))] = c.to;
        if (next.every((d) => d <= 0)) out.emptied++;
        return next;
      });
      prevDe = de;
    }
    out.pours.push(reached);
  }
  return out;
}

export function summarise(r: SimResult, maxPours: number) {
  const counts = r.pours.map((p) => p ?? maxPours + 1).sort((a, b) => a - b);
  const median = counts.length % 2 ? counts[(counts.length - 1) / 2]! : (counts[counts.length / 2 - 1]! + counts[counts.length / 2]!) / 2;
  const within6 = r.pours.filter((p) => p !== null && p <= 6).length;
  return { median, within6, matches: r.pours.length, worseShare: r.suggestions ? r.worse / r.suggestions : 0, ...r };
}

/** Starting recipes for every target zone from a model fitted on `history`: predicted vs measured, and measured vs target. */
export function startingFigures(targets: SimTarget[], history: number[][], opts: { seed: number; noise: number }) {
  const normal = gauss(rng(opts.seed));
  const measure = (doses: number[]): Lab => {
    const t = trueLab(doses);
    return { l: t.l + opts.noise * normal(), a: t.a + opts.noise * normal(), b: t.b + opts.noise * normal() };
  };
  const model = fitColorantModel(history.map((d) => ({ doses: toDoses(d), lab: measure(d) })))!;
  const candidates = COLORANTS.map((_, i) => ({ key: key(i), step: STEP.drops, typical: 3 }));
  const predVsMeasured: number[] = [];
  const toTarget: number[] = [];
  for (const t of targets) {
    for (const z of t.zones) {
      const goal = trueLab(z.doses);
      const r = startingRecipe(model, goal, candidates)!;
      const doses = COLORANTS.map((_, i) => r.lines.find((l) => l.key === key(i))?.amount ?? 0);
      const got = measure(doses);
      predVsMeasured.push(deltaE2000(r.predicted, got));
      toTarget.push(deltaE2000(goal, got));
    }
  }
  const med = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)]!;
  return { predVsMeasured: med(predVsMeasured), toTarget: med(toTarget), zones: toTarget.length };
}
