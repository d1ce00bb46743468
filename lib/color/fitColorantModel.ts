import { boundedLeastSquares, type NormalEquations } from './boundedLeastSquares';
import { fitThicknessFactor } from './fitThicknessFactor';
import { deltaE2000 } from './deltaE2000';
import { kubelkaMunkRatio } from './kubelkaMunkRatio';
import { labToModelChannels } from './labToModelChannels';
import { predictMixture } from './predictMixture';
import type { ColorantModel, DoseObservation, Vec3 } from './types';

// Why two constants and not one: single-constant KM (K/S of the mix = Σ c_i (K/S)_i) cannot
// lighten, yet white and pearl colorants in a clear-ish plastisol do exactly that by adding
// scattering. Duncan's two-constant mixing with the base as its own term keeps the base's
// scattering as the unit, so k_i, s_i are per unit dose relative to the base, and reduces to the
// single-constant form when s_i = 0 — where the prior pulls every colorant unless the shop's
// colours show it scatters. Channels are fitted apart, on the linear sRGB of the corrected photo.
//
// The residual is in L*-like units, 116·(∛R_model − ∛R_logged), the CIE 1976 cube-root
// compression (CIE 15:2004 §8.2.1) applied per channel, so dark and light colours weigh alike.
const L_SCALE = 116;
/** Prior on scattering: s_i = 0.1 per unit dose costs as much as a 1-unit misfit of one colour. */
const S_PRIOR = 100;
/** Weak pull of k_i toward its first estimate, so a colorant seen only in mixtures stays finite. */
const K_PRIOR = 0.05;
const K_MAX = 200;
const S_MAX = 50;

interface Sparse {
  idx: number[];
  dose: number[];
  target: number;
}

function fitChannel(rows: Sparse[], n: number, start: number[], kInit: number[]): number[] {
  const p = 1 + 2 * n;
  const seen = new Array<number>(n).fill(0);
  for (const r of rows) for (const i of r.idx) seen[i]! += 1;
  const sPrior = seen.map((m) => S_PRIOR / Math.sqrt(Math.max(1, m)));
  const evaluate = (th: number[], withJ: boolean): NormalEquations => {
    let cost = 0;
    const jtj = withJ ? Array.from({ length: p }, () => new Array<number>(p).fill(0)) : undefined;
    const jtr = withJ ? new Array<number>(p).fill(0) : undefined;
    for (const row of rows) {
      let num = th[0]!;
      let den = 1;
      for (let t = 0; t < row.idx.length; t++) {
        num += row.dose[t]! * th[1 + row.idx[t]!]!;
        den += row.dose[t]! * th[1 + n + row.idx[t]!]!;
      }
      const ks = Math.max(1e-7, num / den);
      const root = Math.sqrt(ks * ks + 2 * ks);
      const r = 1 + ks - root;
      const res = L_SCALE * (Math.cbrt(r) - row.target);
      cost += 0.5 * res * res;
      if (!withJ) continue;
      const dres = ((L_SCALE / 3) * Math.pow(r, -2 / 3) * (1 - (ks + 1) / root)) / den;
      const cols = [0];
      const vals = [dres];
      for (let t = 0; t < row.idx.length; t++) {
        cols.push(1 + row.idx[t]!, 1 + n + row.idx[t]!);
        vals.push(dres * row.dose[t]!, -dres * row.dose[t]! * ks);
      }
      for (let u = 0; u < cols.length; u++) {
        jtr![cols[u]!]! += vals[u]! * res;
        for (let v = 0; v < cols.length; v++) jtj![cols[u]!]![cols[v]!]! += vals[u]! * vals[v]!;
      }
    }
    for (let i = 0; i < n; i++) {
      const rs = sPrior[i]! * th[1 + n + i]!;
      const rk = K_PRIOR * (th[1 + i]! - kInit[i]!);
      cost += 0.5 * (rs * rs + rk * rk);
      if (withJ) {
        jtr![1 + n + i]! += sPrior[i]! * rs;
        jtj![1 + n + i]![1 + n + i]! += sPrior[i]! * sPrior[i]!;
        jtr![1 + i]! += K_PRIOR * rk;
        jtj![1 + i]![1 + i]! += K_PRIOR * K_PRIOR;
      }
    }
    return { cost, jtj, jtr };
  };
  const lower = [1e-5, ...new Array<number>(2 * n).fill(0)];
  const upper = [K_MAX, ...new Array<number>(n).fill(K_MAX), ...new Array<number>(n).fill(S_MAX)];
  return boundedLeastSquares(evaluate, start, lower, upper).params;
}

// Fits the shop's colorant model to every logged colour with its doses per cup, by bounded,
// regularised nonlinear least squares (boundedLeastSquares). `previous` warm-starts the fit.
// A colorant appears in the model only once it was dosed in at least one logged colour; with no
// observation at all there is no model (null). Colours poured in thin or thick molds enter with
// their doses scaled by their class's factor (fitThicknessFactor), found by alternating: fit on
// all colours as they are, fit each class's factor against that, refit with the factors.
export function fitColorantModel(observations: DoseObservation[], previous?: ColorantModel | null): ColorantModel | null {
  const first = fitScaled(observations, previous);
  if (!first) return null;
  const classes = (['thin', 'thick'] as const).map((t) => ({ t, obs: observations.filter((o) => o.thickness === t) }));
  if (classes.every((c) => c.obs.length < 2)) return { ...first, thickness: thicknessOf(observations, { thin: 1, thick: 1 }) };
  const standard = observations.filter((o) => o.thickness !== 'thin' && o.thickness !== 'thick');
  const base = standard.length >= 2 ? fitScaled(standard, first) ?? first : first;
  const factors = { thin: 1, thick: 1 };
  for (const c of classes) if (c.obs.length >= 2) factors[c.t] = fitThicknessFactor(base, c.obs);
  const scaled = observations.map((o) => {
    const f = o.thickness === 'thin' ? factors.thin : o.thickness === 'thick' ? factors.thick : 1;
    return f === 1 ? o : { ...o, doses: Object.fromEntries(Object.entries(o.doses).map(([k, v]) => [k, v * f])) };
  });
  const model = fitScaled(scaled, base)!;
  return { ...model, thickness: thicknessOf(observations, factors) };
}

function thicknessOf(observations: DoseObservation[], f: { thin: number; thick: number }): NonNullable<ColorantModel['thickness']> {
  const n = (t: string) => observations.filter((o) => (o.thickness ?? 'standard') === t).length;
  return { thin: { factor: f.thin, observations: n('thin') }, standard: { factor: 1, observations: n('standard') }, thick: { factor: f.thick, observations: n('thick') } };
}

function fitScaled(observations: DoseObservation[], previous?: ColorantModel | null): ColorantModel | null {
  if (observations.length === 0) return null;
  const keys = [...new Set(observations.flatMap((o) => Object.keys(o.doses).filter((k) => o.doses[k]! > 0)))].sort();
  const at = new Map(keys.map((k, i) => [k, i]));
  const n = keys.length;
  const rgbs = observations.map((o) => labToModelChannels(o.lab));
  const base: Vec3 = [0, 0, 0];
  const colorants: ColorantModel['colorants'] = {};
  const ks: Vec3[] = keys.map(() => [0, 0, 0]);
  const ss: Vec3[] = keys.map(() => [0, 0, 0]);
  for (let c = 0; c < 3; c++) {
    const rows: Sparse[] = observations.map((o, j) => {
      const idx: number[] = [];
      const dose: number[] = [];
      for (const [k, d] of Object.entries(o.doses)) {
        if (!(d > 0)) continue;
        idx.push(at.get(k)!);
        dose.push(d);
      }
      return { idx, dose, target: Math.cbrt(Math.min(0.9999, Math.max(1e-4, rgbs[j]![c]!))) };
    });
    const ratio = rows.map((_, j) => kubelkaMunkRatio(rgbs[j]![c]!));
    const plain = rows.map((r, j) => (r.idx.length === 0 ? ratio[j]! : Infinity)).filter(Number.isFinite);
    const k0 = plain.length ? plain.reduce((s, v) => s + v, 0) / plain.length : Math.max(1e-4, Math.min(...ratio) * 0.5);
    const kInit = keys.map((_, i) => {
      const est = rows.flatMap((r, j) => r.idx.flatMap((ix, t) => (ix === i ? [Math.max(0, ratio[j]! - k0) / r.dose[t]! / r.idx.length] : [])));
      est.sort((x, y) => x - y);
      return est.length ? est[Math.floor(est.length / 2)]! : 0.1;
    });
    const prior = previous && keys.every((k) => previous.colorants[k]);
    const start = prior
      ? [previous.base[c]!, ...keys.map((k) => previous.colorants[k]!.k[c]!), ...keys.map((k) => previous.colorants[k]!.s[c]!)]
      : [k0, ...kInit, ...keys.map(() => 0)];
    const th = fitChannel(rows, n, start, kInit);
    base[c] = th[0]!;
    keys.forEach((_, i) => ((ks[i]![c] = th[1 + i]!), (ss[i]![c] = th[1 + n + i]!)));
  }
  keys.forEach((k, i) => (colorants[k] = { k: ks[i]!, s: ss[i]!, observations: 0, residual: 0 }));
  const model: ColorantModel = { base, colorants, observations: observations.length, residual: 0 };
  const errors = observations.map((o) => deltaE2000(o.lab, predictMixture(model, o.doses)));
  model.residual = median(errors);
  keys.forEach((k) => {
    const mine = errors.filter((_, j) => observations[j]!.doses[k]! > 0);
    colorants[k]!.observations = mine.length;
    colorants[k]!.residual = median(mine);
  });
  return model;
}

function median(v: number[]): number {
  if (v.length === 0) return 0;
  const s = [...v].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}
