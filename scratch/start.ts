import { startingFigures } from '../tests/color/sim/runPure';
import { COLORANTS, simHistory, simTargets, SWATCHES } from '../tests/color/sim/shop';
const targets = simTargets(24, 7);
const ladder = [COLORANTS.map(() => 0), ...COLORANTS.flatMap((_, i) => [1.5, 5].map((d) => COLORANTS.map((__, j) => (i === j ? d : 0))))];
for (const [n, h] of [['sw', SWATCHES], ['ladder', ladder], ['long', [...SWATCHES, ...simHistory(120, 3)]], ['long+ladder', [...ladder, ...simHistory(120, 3)]]] as const)
  console.log(n, JSON.stringify(startingFigures(targets, [...h], { seed: 5, noise: 0.3 })));
