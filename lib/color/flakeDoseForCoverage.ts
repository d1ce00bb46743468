// The dose per cup that the Poisson coverage model (fitFlakeRate) says covers `coverage` of the
// surface: d = −ln(1 − coverage)/k. Coverage 1 is never reached; it is capped at 0.99.
export function flakeDoseForCoverage(k: number, coverage: number): number {
  const c = Math.min(0.99, Math.max(0, coverage));
  return c === 0 ? 0 : -Math.log(1 - c) / k;
}
