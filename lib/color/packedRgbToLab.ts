import type { Mat3 } from './types';
import { SRGB8_TO_LINEAR } from './srgbToLinear';
import { SRGB_TO_XYZ } from './rgbToXyzMatrix';
import { D65 } from './whitePoints';

// CIE 15:2004 §8.2.1 constants (see xyzToLab.ts).
const EPSILON = 216 / 24389;
const KAPPA = 24389 / 27;

/**
 * The fast path from 8-bit sRGB to CIELAB D65 for many colours at once, on typed arrays:
 * a 256-entry table for the IEC 61966-2-1 decoding, one 3×3 matrix from linear RGB to XYZ
 * (SRGB_TO_XYZ, or that matrix with a white-balance correction folded in), then CIE 15:2004
 * Lab. With the default matrix it agrees with culori's lab65 (tests/color/lab.test.ts).
 *
 * `rgb` holds `count` colours as r,g,b bytes; the Lab values go to `out` as l,a,b.
 */
export function packedRgbToLab(
  rgb: Uint8Array,
  count: number,
  toXyz: Mat3 = SRGB_TO_XYZ,
  out: Float64Array = new Float64Array(count * 3),
): Float64Array {
  const lin = SRGB8_TO_LINEAR;
  // Fold the division by the white into the matrix rows.
  const [m0, m1, m2] = toXyz;
  const x0 = m0[0] / D65[0], x1 = m0[1] / D65[0], x2 = m0[2] / D65[0];
  const y0 = m1[0] / D65[1], y1 = m1[1] / D65[1], y2 = m1[2] / D65[1];
  const z0 = m2[0] / D65[2], z1 = m2[1] / D65[2], z2 = m2[2] / D65[2];
  for (let i = 0, j = 0; i < count; i++, j += 3) {
    const r = lin[rgb[j]], g = lin[rgb[j + 1]], b = lin[rgb[j + 2]];
    const x = x0 * r + x1 * g + x2 * b;
    const y = y0 * r + y1 * g + y2 * b;
    const z = z0 * r + z1 * g + z2 * b;
    const fx = x > EPSILON ? Math.cbrt(x) : (KAPPA * x + 16) / 116;
    const fy = y > EPSILON ? Math.cbrt(y) : (KAPPA * y + 16) / 116;
    const fz = z > EPSILON ? Math.cbrt(z) : (KAPPA * z + 16) / 116;
    out[j] = 116 * fy - 16;
    // Neutral input stays exactly neutral, as in culori (floating-point residue otherwise).
    if (r === g && g === b && toXyz === SRGB_TO_XYZ) {
      out[j + 1] = 0;
      out[j + 2] = 0;
    } else {
      out[j + 1] = 500 * (fx - fy);
      out[j + 2] = 200 * (fy - fz);
    }
  }
  return out;
}
