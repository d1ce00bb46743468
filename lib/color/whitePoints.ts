import type { Vec3 } from './types';

// Reference whites as XYZ with Y = 1.

// D65 from its chromaticity x = 0.3127, y = 0.3290 as IEC 61966-2-1 (sRGB) specifies it; the
// same definition culori's lab65 mode uses, so the fast pipeline agrees with culori.
export const D65: Vec3 = [0.3127 / 0.329, 1, (1 - 0.3127 - 0.329) / 0.329];

// D50 from its chromaticity x = 0.3457, y = 0.3585 (ICC.1:2010 PCS illuminant, rounded).
export const D50: Vec3 = [0.3457 / 0.3585, 1, (1 - 0.3457 - 0.3585) / 0.3585];

// CIE 15:2004, Table T.3 (tristimulus values of CIE illuminants, 2° observer), divided by 100.
export const D65_CIE15: Vec3 = [0.95047, 1, 1.08883];
export const D50_CIE15: Vec3 = [0.96422, 1, 0.82521];
export const ILLUMINANT_A: Vec3 = [1.0985, 1, 0.35585];
