import { differenceCiede2000 } from 'culori';
import type { Lab } from './types';

// CIEDE2000 colour difference, ISO/CIE 11664-6:2014 (CIE 142-2001), with the parametric factors
// kL = kC = kH = 1, computed by culori's differenceCiede2000. Checked against Sharma, Wu and
// Dalal (2005) Table 1 in tests/color/deltaE.test.ts.
const ciede2000 = differenceCiede2000(1, 1, 1);

export function deltaE2000(reference: Lab, sample: Lab): number {
  return ciede2000(
    { mode: 'lab65', l: reference.l, a: reference.a, b: reference.b },
    { mode: 'lab65', l: sample.l, a: sample.a, b: sample.b },
  );
}
