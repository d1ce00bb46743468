import type { Shape } from './types';

/**
 * Rasterises a normalised shape over a width × height image as row spans: a flat Int32Array of
 * (y, x0, x1) triples, each covering pixels x0 ≤ x < x1 of row y, rows ascending, clipped to the
 * image. A pixel belongs to the shape when its centre ((x + 0.5) / width, (y + 0.5) / height)
 * does:
 * - rect: x ≤ u < x + w and y ≤ v < y + h (half-open, so abutting rectangles share no pixel);
 * - ellipse: ((u − cx) / rx)² + ((v − cy) / ry)² ≤ 1;
 * - polygon: even-odd rule (a point is inside when a ray from it crosses the outline an odd
 *   number of times; SVG 1.1 §11.3 'fill-rule'); an edge counts for rows with y0 ≤ v < y1, so
 *   shared vertices count once.
 */
export function shapeSpans(shape: Shape, width: number, height: number): Int32Array {
  const out: number[] = [];
  const push = (y: number, x0: number, x1: number) => {
    const a = Math.max(0, x0);
    const b = Math.min(width, x1);
    if (b > a) out.push(y, a, b);
  };
  // First pixel index whose centre is ≥ p (p in pixels).
  const firstAtOrAfter = (p: number) => Math.ceil(p - 0.5);

  if (shape.type === 'rect') {
    const x0 = firstAtOrAfter(shape.x * width);
    const x1 = firstAtOrAfter((shape.x + shape.w) * width);
    const y0 = Math.max(0, firstAtOrAfter(shape.y * height));
    const y1 = Math.min(height, firstAtOrAfter((shape.y + shape.h) * height));
    for (let y = y0; y < y1; y++) push(y, x0, x1);
  } else if (shape.type === 'ellipse') {
    const { cx, cy, rx, ry } = shape;
    const y0 = Math.max(0, firstAtOrAfter((cy - ry) * height));
    const y1 = Math.min(height, Math.floor((cy + ry) * height - 0.5) + 1);
    for (let y = y0; y < y1; y++) {
      const dv = ((y + 0.5) / height - cy) / ry;
      if (dv * dv > 1) continue;
      const half = rx * Math.sqrt(1 - dv * dv);
      push(y, firstAtOrAfter((cx - half) * width), Math.floor((cx + half) * width - 0.5) + 1);
    }
  } else {
    const xs = shape.points.map((p) => p[0] * width);
    const ys = shape.points.map((p) => p[1] * height);
    const n = xs.length;
    const y0 = Math.max(0, firstAtOrAfter(Math.min(...ys)));
    const y1 = Math.min(height, firstAtOrAfter(Math.max(...ys)));
    const cross: number[] = [];
    for (let y = y0; y < y1; y++) {
      const v = y + 0.5;
      cross.length = 0;
      for (let i = 0, j = n - 1; i < n; j = i++) {
        const ya = ys[j];
        const yb = ys[i];
        if ((ya <= v && v < yb) || (yb <= v && v < ya)) cross.push(xs[j] + ((v - ya) / (yb - ya)) * (xs[i] - xs[j]));
      }
      cross.sort((p, q) => p - q);
      for (let k = 0; k + 1 < cross.length; k += 2) push(y, firstAtOrAfter(cross[k]), firstAtOrAfter(cross[k + 1]));
    }
  }
  return Int32Array.from(out);
}
