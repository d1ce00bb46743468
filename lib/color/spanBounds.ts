import type { PixelBox } from './types';

/** The smallest pixel box holding every span of one or more span lists; null when all are empty. */
export function spanBounds(...lists: Int32Array[]): PixelBox | null {
  let top = Infinity, bottom = -Infinity, left = Infinity, right = -Infinity;
  for (const spans of lists) {
    for (let s = 0; s < spans.length; s += 3) {
      if (spans[s] < top) top = spans[s];
      if (spans[s] > bottom) bottom = spans[s];
      if (spans[s + 1] < left) left = spans[s + 1];
      if (spans[s + 2] > right) right = spans[s + 2];
    }
  }
  if (top === Infinity) return null;
  return { left, top, width: right - left, height: bottom - top + 1 };
}
