import type { Shape } from './types';
import { shapeSpans } from './shapeSpans';

/** A width × height mask (1 = inside, row-major) of a shape, by the rules of shapeSpans. */
export function shapeMask(shape: Shape, width: number, height: number): Uint8Array {
  const mask = new Uint8Array(width * height);
  const spans = shapeSpans(shape, width, height);
  for (let s = 0; s < spans.length; s += 3) mask.fill(1, spans[s] * width + spans[s + 1], spans[s] * width + spans[s + 2]);
  return mask;
}
