// The simulated shop: invented colorants (absorption and scattering curves per unit dose),
// seeded targets, and the maker's first guess at each. All numbers are invented; they are the
// ground truth the tests hold the app's advice against.
import { gauss, rng } from '../synth';
import { band, curve, mixSpectrum, spectrumToLab, type SimColorant } from './spectral';

const flat = (v: number) => () => v;

export const BASE: SimColorant = { name: 'Sim base', kind: 'base', unit: 'drops', k: curve(band(400, 45, 0.05), flat(0.008)), s: curve(flat(1)) };

export const COLORANTS: SimColorant[] = [
  { name: 'Sim red', kind: 'pigment', unit: 'drops', k: curve(band(510, 45, 0.9), band(430, 30, 0.35), flat(0.015)), s: curve(flat(0.01)) },
  { name: 'Sim yellow', kind: 'pigment', unit: 'drops', k: curve(band(445, 35, 0.75), flat(0.01)), s: curve(flat(0.015)) },
  { name: 'Sim blue', kind: 'pigment', unit: 'drops', k: curve(band(615, 50, 0.8), band(545, 35, 0.25), flat(0.02)), s: curve(flat(0.01)) },
  { name: 'Sim green', kind: 'pigment', unit: 'drops', k: curve(band(450, 30, 0.55), band(640, 45, 0.65), flat(0.02)), s: curve(flat(0.01)) },
  { name: 'Sim black', kind: 'pigment', unit: 'drops', k: curve(flat(0.45), band(600, 80, 0.05)), s: curve(flat(0.02)) },
  { name: 'Sim white', kind: 'pigment', unit: 'drops', k: curve(flat(0.004)), s: curve(flat(0.35), band(420, 60, 0.05)) },
];

export const STEP = { drops: 0.5, tsp: 1 / 32 } as const;

/** The true colour of a recipe (doses per cup in COLORANTS order). */
export const trueLab = (doses: number[]) => spectrumToLab(mixSpectrum(BASE, COLORANTS, doses));

export interface SimTarget {
  zones: { name: string; doses: number[] }[];
  firstGuess: number[][];
}

const round = (v: number, step: number) => Math.max(0, Math.round(v / step) * step);

// Each target zone mixes 2–3 colorants (sometimes white), 0.5–6 drops each; the maker's first
// guess is every dose off by a log-normal factor (σ = 0.35), and one time in five a minor
// colorant left out.
export function simTargets(count: number, seed: number): SimTarget[] {
  const rand = rng(seed);
  const normal = gauss(rand);
  const out: SimTarget[] = [];
  for (let t = 0; t < count; t++) {
    const zones = ['back', 'belly'].map((name) => {
      const doses = COLORANTS.map(() => 0);
      const pick = [0, 1, 2, 3, 4].sort(() => rand() - 0.5).slice(0, 2 + Math.floor(rand() * 2));
      for (const i of pick) doses[i] = i === 4 ? round(0.5 + rand() * 2, 0.5) : round(0.5 + rand() * 5.5, 0.5);
      if (rand() < 0.4) doses[5] = round(1 + rand() * 6, 0.5);
      return { name, doses };
    });
    const firstGuess = zones.map((z) => {
      const guess = z.doses.map((d) => (d > 0 ? Math.max(0.5, round(d * Math.exp(0.35 * normal()), 0.5)) : 0));
      if (rand() < 0.2) {
        const present = guess.map((g, i) => (g > 0 ? i : -1)).filter((i) => i >= 0);
        const minor = present.reduce((a, b) => (z.doses[b]! < z.doses[a]! ? b : a));
        if (present.length > 1) guess[minor] = 0;
      }
      return guess;
    });
    out.push({ zones, firstGuess });
  }
  return out;
}

/** Random recipes of 1–4 colorants: the shop's earlier work, for the "longer history" runs. */
export function simHistory(count: number, seed: number): number[][] {
  const rand = rng(seed);
  return Array.from({ length: count }, () => {
    const doses = COLORANTS.map(() => 0);
    const n = 1 + Math.floor(rand() * 4);
    for (let j = 0; j < n; j++) doses[Math.floor(rand() * COLORANTS.length)] = round(0.5 + rand() * 7, 0.5);
    return doses;
  });
}

/** Calibration swatches: the base alone, then each colorant alone at 3 drops per cup. */
export const SWATCHES: number[][] = [COLORANTS.map(() => 0), ...COLORANTS.map((_, i) => COLORANTS.map((__, j) => (i === j ? 3 : 0)))];
