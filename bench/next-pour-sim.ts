// The next-pour figures on the simulated colorant system (tests/color/sim), without a server.
import { runPure, startingFigures, summarise } from '../tests/color/sim/runPure';
import { simHistory, simTargets, SWATCHES } from '../tests/color/sim/shop';

export function printNextPourSim() {
  const targets = simTargets(30, 8);
  const opts = { seed: 8, noise: 0.3, maxPours: 8, tolerance: 2 };
  for (const [name, history] of [['calibration swatches only', SWATCHES], ['plus 200 earlier pours', [...SWATCHES, ...simHistory(200, 8)]]] as const) {
    const r = summarise(runPure(targets, [...history], opts), opts.maxPours);
    const s = startingFigures(targets, [...history], { seed: 8, noise: 0.3 });
    console.log(`  ${name}: median pours to ΔE00 ≤ 2.0 in every zone ${r.median} (target ≤ 3); within 6 pours ${r.within6}/${r.matches} (target ≥ 90 %)`);
    console.log(`    suggestions ${r.suggestions}; next pour worse by > 1.0 ΔE00 ${r.worse} (${(100 * r.worseShare).toFixed(1)} %, target < 10 %); zones emptied ${r.emptied}; no advice ${r.stuck}`);
    console.log(`    starting recipe: median ΔE00 predicted vs measured ${s.predVsMeasured.toFixed(2)}, to target ${s.toTarget.toFixed(2)} (aim ≤ 4)`);
  }
}
