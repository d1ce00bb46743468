// The inverse of the Kubelka–Munk remission function (Kubelka & Munk 1931): the reflectance of
// an opaque layer of absorption-to-scattering ratio x = K/S, R∞ = 1 + x − √(x² + 2x).
export function kubelkaMunkReflectance(ratio: number): number {
  const x = Math.max(0, ratio);
  return 1 + x - Math.sqrt(x * x + 2 * x);
}
