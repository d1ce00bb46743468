import { describe, expect, it } from 'vitest';
import { runPure, startingFigures, summarise } from './sim/runPure';
import { simHistory, simTargets, SWATCHES } from './sim/shop';

// The next-pour advice on the simulated colorant system (tests/color/sim: spectral Kubelka–Munk
// after Kubelka & Munk 1931 and Duncan 1940, D65, CIE 1931 2° observer by the fit of Wyman, Sloan
// & Shirley 2013), without a server: the maker follows every suggestion exactly, measurement
// noise 0.3 per Lab coordinate. The same run through the HTTP API with rendered photos is
// tests/api/next-pour-sim.test.ts. Thresholds are the issue's, asserted loosely for a stable suite.
const OPTS = { seed: 11, noise: 0.3, maxPours: 8, tolerance: 2 };

describe('next pour on the simulated colorant system (no server)', () => {
  const targets = simTargets(24, 7);
  const short = summarise(runPure(targets, SWATCHES, OPTS), OPTS.maxPours);
  const long = summarise(runPure(targets, [...SWATCHES, ...simHistory(120, 3)], OPTS), OPTS.maxPours);

  it('reaches ΔE00 ≤ 2.0 in every zone by the third pour on the median match', () => {
    for (const [name, r] of [['calibration swatches only', short], ['plus 120 earlier pours', long]] as const) {
      console.log(
        `[next-pour sim, ${name}] median pours ${r.median}; within 6 pours ${r.within6}/${r.matches}; ` +
          `suggestions ${r.suggestions}, worse by > 1.0 ΔE00 ${r.worse} (${(100 * r.worseShare).toFixed(1)} %), emptied ${r.emptied}, no advice ${r.stuck}; pours ${r.pours.map((p) => p ?? '>8').join(' ')}`,
      );
      expect(r.median).toBeLessThanOrEqual(3);
      expect(r.within6 / r.matches).toBeGreaterThanOrEqual(0.9);
      expect(r.emptied).toBe(0);
      expect(r.worseShare).toBeLessThan(0.1);
    }
  });

  it('does no worse with a longer shop history', () => {
    expect(long.median).toBeLessThanOrEqual(short.median);
    expect(long.within6).toBeGreaterThanOrEqual(short.within6 - 1);
  });
});

describe('starting recipe on the simulated colorant system (no server)', () => {
  it('predicts its own colour and lands near the target', () => {
    const targets = simTargets(24, 7);
    for (const [name, history] of [['calibration swatches only', SWATCHES], ['plus 120 earlier pours', [...SWATCHES, ...simHistory(120, 3)]]] as const) {
      const f = startingFigures(targets, [...history], { seed: 5, noise: 0.3 });
      console.log(`[starting recipe sim, ${name}] ${f.zones} zones: median ΔE00 predicted vs measured ${f.predVsMeasured.toFixed(2)}, median ΔE00 to target ${f.toTarget.toFixed(2)}`);
      expect(f.toTarget).toBeLessThanOrEqual(4);
      expect(f.predVsMeasured).toBeLessThanOrEqual(4);
    }
  });
});
