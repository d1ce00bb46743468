/** One logged zone with a single flake colorant: its dose per cup and the measured flake coverage. */
export interface FlakeObservation {
  dose: number;
  coverage: number;
}

export interface FlakeRate {
  /** Coverage rate per unit dose per cup: coverage = 1 − exp(−k·dose). */
  k: number;
  observations: number;
  /** Root-mean-square coverage misfit (fraction of the area). */
  rms: number;
}

const coverageAt = (k: number, d: number) => 1 - Math.exp(-k * d);

// Specks dropped at random cover the surface as a Boolean (Poisson) model: the uncovered share
// is exp(−n·a) for n specks per unit area of mean area a (Matheron, Random Sets and Integral
// Geometry, 1975; Serra, Image Analysis and Mathematical Morphology, 1982, ch. XIII), and n grows
// in proportion to the dose, so coverage = 1 − exp(−k·dose). k is fitted by least squares on the
// coverages themselves (a bounded 1-D search by golden section, Kiefer 1953), which weighs high
// coverages fairly where a fit of −ln(1 − c) would blow up their noise.
export function fitFlakeRate(observations: FlakeObservation[]): FlakeRate | null {
  const obs = observations.filter((o) => o.dose > 0 && o.coverage >= 0 && o.coverage < 1);
  if (obs.length === 0) return null;
  const cost = (lk: number) => obs.reduce((s, o) => s + (o.coverage - coverageAt(Math.exp(lk), o.dose)) ** 2, 0);
  // Search log k over a range wide enough for any unit (k from 1e-4 to 1e4 per unit dose).
  let a = Math.log(1e-4);
  let b = Math.log(1e4);
  const phi = (Math.sqrt(5) - 1) / 2;
  let c = b - phi * (b - a);
  let d = a + phi * (b - a);
  for (let i = 0; i < 100; i++) {
    if (cost(c) < cost(d)) b = d;
    else a = c;
    c = b - phi * (b - a);
    d = a + phi * (b - a);
  }
  const k = Math.exp((a + b) / 2);
  return { k, observations: obs.length, rms: Math.sqrt(cost(Math.log(k)) / obs.length) };
}
