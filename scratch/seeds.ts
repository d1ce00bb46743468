import { runPure, summarise } from '../tests/color/sim/runPure';
import { simHistory, simTargets, SWATCHES } from '../tests/color/sim/shop';
for (const ts of [8, 9, 10]) for (const noise of [0.3, 0.6]) {
  const targets = simTargets(30, ts);
  const a = summarise(runPure(targets, SWATCHES, { seed: ts, noise, maxPours: 8, tolerance: 2 }), 8);
  const b = summarise(runPure(targets, [...SWATCHES, ...simHistory(200, ts)], { seed: ts, noise, maxPours: 8, tolerance: 2 }), 8);
  console.log(ts, noise, [a, b].map((r) => `med ${r.median} w6 ${r.within6}/${r.matches} worse ${r.worse}/${r.suggestions} stuck ${r.stuck} [${r.pours.map((p) => p ?? 'x').join('')}]`).join(' | '));
}
