import { deltaE2000 } from './deltaE2000';
import { localCorrection } from './localCorrection';
import { predictMixture } from './predictMixture';
import { solveDoses, type DoseVariable } from './solveDoses';
import { trustRatio } from './trustRatio';
import type { ColorantModel, DoseObservation, Lab } from './types';

export interface AdviceLine {
  key: string;
  amount: number;
  /** The bench's smallest step for this line's unit. */
  step: number;
}

export interface AdviceCandidate {
  key: string;
  step: number;
  /** A usual dose per cup of this colorant in the shop (sets the first step's size). */
  typical: number;
}

export interface ZoneAdviceInput {
  model: ColorantModel | null;
  target: Lab;
  /** This match's pours of this zone, oldest first; the last is the pour being advised. */
  pours: DoseObservation[];
  /** The zone's modelled recipe lines on the last pour. Unmodelled lines (flake…) stay as they are. */
  lines: AdviceLine[];
  /** Characterised colorants the zone does not have yet, which the advice may add. */
  candidates: AdviceCandidate[];
  tolerance: number;
}

export type ZoneAdviceResult =
  | { status: 'within_tolerance'; dE00: number }
  | { status: 'no_history'; dE00: number; reason: string; unknown: string[] }
  | { status: 'suggested'; dE00: number; changes: { key: string; from: number; to: number }[]; predicted: { lab: Lab; dE00: number }; note: string | null; trust: number };

/** A colorant needs this many logged colours before the model moves it. */
export const MIN_OBSERVATIONS = 2;
/** A colorant is taken out of a zone only once the model has predicted this match well (trustRatio). */
const REMOVE_TRUST = 1.5;
/** Colorants the zone lacks that are tried in full, after screening. */
const ADD_TRIES = 3;
/** An added colorant must beat the best without it by this much (ΔE00). */
const ADD_GAIN = 0.75;

const onGrid = (v: number, step: number, up: boolean) => (up ? Math.floor(v / step + 1e-9) : Math.ceil(v / step - 1e-9)) * step;

// The next pour for one zone: the shop's model, corrected by this match's pours, solved for the
// doses nearest the target within the trust region (trustRatio): each dose within
// [d·(1 − ρ), d·(1 + 2ρ) + ρ·step·4] on the bench's grid and the predicted colour move at most
// max(3, 1.5·ρ·ΔE00 now), so one noisy pour never doubles a dose or empties a recipe. The line
// with the most dose keeps at least one step; no line is taken out before the model has
// predicted one of this match's pours well (ρ ≥ REMOVE_TRUST).
export function adviseZone(input: ZoneAdviceInput): ZoneAdviceResult {
  const last = input.pours[input.pours.length - 1]!;
  const dE00 = deltaE2000(input.target, last.lab);
  if (dE00 <= input.tolerance) return { status: 'within_tolerance', dE00 };
  const model = input.model;
  const unknown = input.lines.filter((l) => (model?.colorants[l.key]?.observations ?? 0) < MIN_OBSERVATIONS).map((l) => l.key);
  if (!model || input.lines.length === 0 || unknown.length) {
    const reason = input.lines.length === 0
      ? 'No colorant of this zone is one the model can dose: add a pigment to the recipe, or ask for a starting recipe.'
      : 'Not enough history for some colorants of this zone yet: calibrate them with a swatch, or log a pour that changes them.';
    return { status: 'no_history', dE00, reason, unknown };
  }
  const correction = localCorrection(model, input.pours);
  const rho = trustRatio(model, input.pours);
  const moveLimit = Math.max(3, 1.5 * rho * dE00);
  const modelled = new Set(input.lines.map((l) => l.key));
  const fixed = Object.fromEntries(Object.entries(last.doses).filter(([k]) => !modelled.has(k)));
  const biggest = input.lines.reduce((a, b) => (b.amount / b.step > a.amount / a.step ? b : a));
  const vars: DoseVariable[] = input.lines.map((l) => ({
    key: l.key,
    amount: l.amount,
    step: l.step,
    lower: Math.max(l === biggest || rho < REMOVE_TRUST ? l.step : 0, rho >= 1 ? 0 : onGrid(l.amount * (1 - rho), l.step, false)),
    upper: Math.max(l.amount + l.step, onGrid(l.amount * (1 + 2 * rho) + rho * l.step * 4, l.step, true)),
  }));
  let best = solveDoses(model, input.target, vars, fixed, correction, moveLimit);
  let used = vars;
  if (best.dE00 > input.tolerance) {
    // Screen the candidates by one prediction each (a small dose added to the best recipe so
    // far), and solve only for the most promising few.
    const bestDoses = { ...fixed, ...Object.fromEntries(vars.map((v, i) => [v.key, best.amounts[i]!])) };
    const screened = input.candidates
      .filter((c) => !modelled.has(c.key) && (model.colorants[c.key]?.observations ?? 0) >= MIN_OBSERVATIONS)
      .map((c) => ({ c, score: deltaE2000(input.target, predictMixture(model, { ...bestDoses, [c.key]: Math.max(c.step, c.typical / 2) }, correction)) }))
      .sort((a, b) => a.score - b.score)
      .slice(0, ADD_TRIES)
      .map((x) => x.c);
    for (const c of screened) {
      const more = [...vars, { key: c.key, amount: 0, step: c.step, lower: 0, upper: Math.max(c.step, onGrid(c.typical * Math.min(1.5, rho), c.step, true)) }];
      const s = solveDoses(model, input.target, more, fixed, correction, moveLimit);
      if (s.dE00 < best.dE00 - ADD_GAIN) {
        best = s;
        used = more;
      }
    }
  }
  const changes = used
    .map((v, i) => ({ key: v.key, from: v.amount, to: best.amounts[i]! }))
    .filter((c) => Math.abs(c.to - c.from) > 1e-9);
  const now = predictMixture(model, last.doses, correction);
  if (changes.length === 0 || deltaE2000(input.target, now) - best.dE00 < 0.2) {
    return { status: 'no_history', dE00, reason: `No change on the bench's steps is predicted to bring this zone closer (the nearest these colorants reach is about ${best.dE00.toFixed(1)} ΔE00). Try another colorant.`, unknown: [] };
  }
  const note = best.dE00 > input.tolerance + 1
    ? `The target looks outside what these colorants reach within this step: this is the closest, about ${best.dE00.toFixed(1)} ΔE00.`
    : null;
  return { status: 'suggested', dE00, changes, predicted: { lab: best.predicted, dE00: best.dE00 }, note, trust: rho };
}
