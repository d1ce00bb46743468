import 'server-only';
import type { Shape } from '@/lib/color';
import { ImageError } from './imageError';

/**
 * The most rasterising work one measurement may ask for: for each shape, the
 * image rows it spans times its outline's edges (shapeSpans tests every edge on
 * every row; a rectangle or ellipse costs one step a row). Decoding is bounded by
 * the pixel limit and the colour statistics by the lattice sample
 * (DEFAULT_MAX_SAMPLES), so the outlines are what is left to bound: a 12 MP photo
 * with 16 zones of 60-point outlines is about 3 × 10⁶ steps; a 6300-row photo
 * with 16 full-height 200-point zig-zags, 2 × 10⁷, over the limit.
 */
export const MAX_MEASURE_WORK = 12_000_000;

function shapeWork(shape: Shape, height: number): number {
  if (shape.type === 'rect') return shape.h * height;
  if (shape.type === 'ellipse') return 2 * shape.ry * height;
  const ys = shape.points.map((p) => p[1]);
  return (Math.max(...ys) - Math.min(...ys)) * height * shape.points.length;
}

/** Throws ImageError('too_much_work', 413) when the shapes ask for more than the budget. */
export function assertWorkBudget(shapes: Shape[], width: number, height: number, budget = MAX_MEASURE_WORK): number {
  const work = shapes.reduce((sum, s) => sum + shapeWork(s, height), 0);
  if (work > budget) {
    throw new ImageError(
      'too_much_work',
      `These regions ask for too much work on a ${width} × ${height} photo (${(work / 1e6).toFixed(1)} million outline steps, limit ${budget / 1e6} million): use fewer or simpler outlines, or a smaller photo.`,
    );
  }
  return work;
}
