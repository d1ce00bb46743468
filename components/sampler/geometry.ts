import type { Shape } from '@/lib/color/types';

const clamp01 = (v: number) => Math.min(1, Math.max(0, v));

// Pointer position → coordinates normalised to the displayed photo (0..1).
// getBoundingClientRect already includes the zoom and pan transforms.
export function toNormalised(el: Element, clientX: number, clientY: number): [number, number] {
  const r = el.getBoundingClientRect();
  return [clamp01((clientX - r.left) / r.width), clamp01((clientY - r.top) / r.height)];
}

// A drag from a to b as a rectangle or an ellipse inscribed in it; null when
// too small to be meant.
export function shapeFromDrag(kind: 'rect' | 'ellipse', a: [number, number], b: [number, number]): Shape | null {
  const x = Math.min(a[0], b[0]);
  const y = Math.min(a[1], b[1]);
  const w = Math.abs(a[0] - b[0]);
  const h = Math.abs(a[1] - b[1]);
  if (w < 0.004 || h < 0.004) return null;
  if (kind === 'rect') return { type: 'rect', x, y, w, h };
  return { type: 'ellipse', cx: x + w / 2, cy: y + h / 2, rx: w / 2, ry: h / 2 };
}

export function polygonFromDraft(points: [number, number][]): Shape | null {
  return points.length >= 3 ? { type: 'polygon', points } : null;
}

// SVG path of a shape in the 0..1 viewBox, for drawing it over the photo.
export function shapePath(shape: Shape): string {
  if (shape.type === 'rect') return `M${shape.x} ${shape.y}h${shape.w}v${shape.h}h${-shape.w}Z`;
  if (shape.type === 'ellipse') {
    const { cx, cy, rx, ry } = shape;
    return `M${cx - rx} ${cy}a${rx} ${ry} 0 1 0 ${2 * rx} 0a${rx} ${ry} 0 1 0 ${-2 * rx} 0Z`;
  }
  return `M${shape.points.map((p) => p.join(' ')).join('L')}Z`;
}

export function shapeLabelPoint(shape: Shape): [number, number] {
  if (shape.type === 'rect') return [shape.x, shape.y];
  if (shape.type === 'ellipse') return [shape.cx - shape.rx, shape.cy - shape.ry];
  return shape.points[0]!;
}
