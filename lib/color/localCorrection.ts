import { kubelkaMunkRatio } from './kubelkaMunkRatio';
import { labToModelChannels } from './labToModelChannels';
import { mixtureRatio } from './mixtureRatio';
import type { ColorantModel, DoseObservation, LocalCorrection, Vec3 } from './types';

/** Weight of a pour relative to the one after it: the latest pour counts most. */
const DECAY = 0.5;
/** No local offset larger than a factor e^±1.5 on K/S. */
const LIMIT = 1.5;
/** Prior on the dose scale: log-normal around 1 with this σ. */
const SCALE_SIGMA = 0.3;
/** The spread of log(K/S) a pour's measurement carries (about 0.3 ΔE00 of photo noise; from the simulation). */
const LOG_KS_SIGMA = 0.05;
/** The dose scales tried, log-spaced from ½ to 2. */
const SCALES = Array.from({ length: 41 }, (_, i) => Math.pow(2, -1 + i / 20));

// The match's own pours correct the shop-wide model where this match is — a secant correction in
// the spirit of Broyden (1965): the model is made to pass through the match's latest pours
// instead of re-learning every slope from two or three of them. Two terms, fitted by weighted
// least squares on log(K/S) per channel (latest pour weighted most, DECAY per pour back):
//  - an offset per channel, so the model passes through the latest pour;
//  - once the match's pours differ in dose, one factor on every dose (log-normal prior around 1,
//    σ = SCALE_SIGMA): this match's colorants act that much stronger or weaker than the shop's
//    (another plastisol lot, another mold, another light), which fixes the slope where the
//    offset alone cannot. The factor is found by a search over SCALES; the offsets are then exact.
export function localCorrection(model: ColorantModel, pours: DoseObservation[]): LocalCorrection {
  if (pours.length === 0) return { offset: [0, 0, 0], scale: 1 };
  const weights = pours.map((_, i) => Math.pow(DECAY, pours.length - 1 - i));
  const total = weights.reduce((s, w) => s + w, 0);
  const logObs = pours.map((p) => labToModelChannels(p.lab).map((v) => Math.log(kubelkaMunkRatio(v))));
  const fit = (scale: number) => {
    const resid = pours.map((p, j) => {
      const ks = mixtureRatio(model, Object.fromEntries(Object.entries(p.doses).map(([k, v]) => [k, v * scale])));
      return ks.map((x, c) => logObs[j]![c]! - Math.log(Math.max(1e-7, x)));
    });
    const offset = [0, 1, 2].map((c) => resid.reduce((s, r, j) => s + weights[j]! * r[c]!, 0) / total) as Vec3;
    let cost = (Math.log(scale) / SCALE_SIGMA) ** 2;
    resid.forEach((r, j) => r.forEach((v, c) => (cost += (weights[j]! * (v - offset[c]!) ** 2) / LOG_KS_SIGMA ** 2)));
    return { offset, cost };
  };
  const distinct = new Set(pours.map((p) => JSON.stringify(p.doses))).size > 1;
  let best = { scale: 1, ...fit(1) };
  if (distinct) {
    for (const s of SCALES) {
      const f = fit(s);
      if (f.cost < best.cost) best = { scale: s, ...f };
    }
  }
  return { offset: best.offset.map((v) => Math.max(-LIMIT, Math.min(LIMIT, v))) as Vec3, scale: best.scale };
}
