import { kubelkaMunkRatio } from './kubelkaMunkRatio';
import { labToModelChannels } from './labToModelChannels';
import { mixtureRatio } from './mixtureRatio';
import type { ColorantModel, DoseObservation } from './types';

/** Prior: log-normal around 1 with this σ; spread of log(K/S) per colour, as in localCorrection. */
const PRIOR_SIGMA = 0.3;
const LOG_KS_SIGMA = 0.05;
/** The factors tried, log-spaced from ¼ to 2. */
const FACTORS = Array.from({ length: 61 }, (_, i) => Math.pow(2, -2 + i / 20));

// How much of its dose a colour poured in a mold of another thickness class shows, as one factor
// on every dose: a thin body lets more light through and reads lighter for the same recipe
// (common practice), as if it held less colorant. In Kubelka–Munk terms the colour of a layer
// depends on the colorant per unit area, K·X for thickness X (Kubelka & Munk 1931), so a factor
// on the dose is the first-order form. Fitted by least squares on log(K/S) per channel over the
// class's logged colours, by a search over FACTORS, with a log-normal prior around 1.
export function fitThicknessFactor(model: ColorantModel, observations: DoseObservation[]): number {
  if (observations.length === 0) return 1;
  const logObs = observations.map((o) => labToModelChannels(o.lab).map((v) => Math.log(kubelkaMunkRatio(v))));
  let best = { factor: 1, cost: Infinity };
  for (const f of FACTORS) {
    let cost = (Math.log(f) / PRIOR_SIGMA) ** 2;
    observations.forEach((o, j) => {
      const ks = mixtureRatio(model, Object.fromEntries(Object.entries(o.doses).map(([k, v]) => [k, v * f])));
      ks.forEach((x, c) => (cost += ((logObs[j]![c]! - Math.log(Math.max(1e-7, x))) / LOG_KS_SIGMA) ** 2));
    });
    if (cost < best.cost) best = { factor: f, cost };
  }
  return best.factor;
}
