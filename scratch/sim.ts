import { runPure, summarise } from '../tests/color/sim/runPure';
import { simHistory, simTargets, SWATCHES } from '../tests/color/sim/shop';
const targets = simTargets(24, 7);
const t0 = Date.now();
const a = summarise(runPure(targets, SWATCHES, { seed: 1, noise: 0.3, maxPours: 8, tolerance: 2 }), 8);
console.log('swatches only', JSON.stringify({ ...a, pours: a.pours.join(',') }), Date.now() - t0);
const b = summarise(runPure(targets, [...SWATCHES, ...simHistory(80, 3)], { seed: 1, noise: 0.3, maxPours: 8, tolerance: 2 }), 8);
console.log('long history', JSON.stringify({ ...b, pours: b.pours.join(',') }), Date.now() - t0);
