/** IEC 61966-2-1 encoding (the curve sRGB and Display P3 share) of a linear value, clipped to 0..1 as a camera does. */
export const encodeClipped = (v: number): number => (v <= 0 ? 0 : v >= 1 ? 1 : v <= 0.0031308 ? 12.92 * v : 1.055 * Math.pow(v, 1 / 2.4) - 0.055);
