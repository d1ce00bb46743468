// sRGB transfer function, decoding direction: IEC 61966-2-1:1999, §5.2 (equations 5 and 6).
// `v` is an sRGB component in 0..1; the result is linear-light in 0..1.
export function srgbToLinear(v: number): number {
  return v <= 0.04045 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4);
}

/** srgbToLinear for every 8-bit code value: index 0..255 → linear 0..1. */
export const SRGB8_TO_LINEAR: Float64Array = (() => {
  const table = new Float64Array(256);
  for (let i = 0; i < 256; i++) table[i] = srgbToLinear(i / 255);
  return table;
})();
