import { flakeDoseForCoverage } from './flakeDoseForCoverage';

export interface FlakeAdvice {
  key: string;
  from: number;
  to: number;
  note: string;
}

/** Coverages closer than this (fraction of the area) need no change. */
export const FLAKE_TOLERANCE = 0.02;

const pct = (v: number) => `${Math.round(v * 100)} %`;

// The flake dose that brings a zone's measured flake coverage to the target's, by the Poisson
// coverage model (fitFlakeRate): k from this pour itself when it shows flake (k = −ln(1 − c)/d:
// same mold, same light), else the shop's k for that flake colorant. One flake colorant per zone
// only (a mix of flake colours needs the coverage per colour group). The step is bounded like the
// colour's: at most double the dose (or four bench steps) in one pour.
export function adviseFlake(line: { key: string; amount: number; step: number }, now: number, target: number, shopRate: number | null): FlakeAdvice | null {
  if (Math.abs(now - target) <= FLAKE_TOLERANCE) return null;
  const local = now > 0.005 && line.amount > 0 ? -Math.log(1 - Math.min(0.99, now)) / line.amount : null;
  const k = local ?? shopRate;
  if (!k) return null;
  const wanted = target < 0.005 ? 0 : flakeDoseForCoverage(k, target);
  const cap = Math.max(2 * line.amount, line.amount + 4 * line.step);
  const to = Math.min(Math.floor(cap / line.step) * line.step, Math.max(target < 0.005 ? 0 : line.step, Math.round(wanted / line.step) * line.step));
  if (Math.abs(to - line.amount) < 1e-9) return null;
  const source = local ? 'its rate from this pour' : "the shop's rate for this flake";
  return { key: line.key, from: line.amount, to: Number(to.toFixed(6)), note: `Flake covers ${pct(now)} of the zone against ${pct(target)} on the target; by the Poisson coverage model with ${source}.` };
}
