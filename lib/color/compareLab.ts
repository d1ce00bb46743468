import type { Lab, LabComparison } from './types';
import { bandFor } from './bandFor';
import { deltaE2000 } from './deltaE2000';
import { labDifference } from './labDifference';

/** Team default for photo-based work (PRODUCT.md, "Verdict"). */
export const DEFAULT_TOLERANCE = 2.0;

// Trial (sample) against target (reference): CIEDE2000 (deltaE2000.ts), the ASTM D2244
// components (labDifference.ts) and the rule-of-thumb band (bandFor.ts).
export function compareLab(reference: Lab, sample: Lab, tolerance: number = DEFAULT_TOLERANCE): LabComparison {
  const dE00 = deltaE2000(reference, sample);
  const { dL, dC, dH } = labDifference(reference, sample);
  return { dE00, dL, dC, dH, band: bandFor(dE00), withinTolerance: dE00 <= tolerance };
}
