// Reflectances are kept inside (R_MIN, R_MAX): at R → 0 the ratio diverges, and a channel of a
// measured colour can sit a little outside 0..1 when the colour lies outside the sRGB gamut.
export const R_MIN = 1e-4;
export const R_MAX = 0.9999;

// Kubelka & Munk (1931), the remission function of an opaque layer: K/S = (1 − R∞)² / (2 R∞)
// (Judd & Wyszecki, Color in Business, Science and Industry, 3rd ed., 1975, ch. 3).
export function kubelkaMunkRatio(reflectance: number): number {
  const r = Math.min(R_MAX, Math.max(R_MIN, reflectance));
  return ((1 - r) * (1 - r)) / (2 * r);
}
