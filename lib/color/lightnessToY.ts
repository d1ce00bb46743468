// Inverse of CIE 15:2004 §8.2.1 for the lightness alone: relative luminance Y/Yn from L*.
export function lightnessToY(l: number): number {
  const fy = (l + 16) / 116;
  return l > 8 ? fy * fy * fy : l / (24389 / 27);
}
