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

// Keyboard drawing: a region placed, moved and resized in steps of the photo.
export function defaultShape(tool: 'rect' | 'ellipse' | 'polygon' | 'pan'): Shape {
  if (tool === 'ellipse') return { type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0.15, ry: 0.1 };
  return { type: 'rect', x: 0.35, y: 0.4, w: 0.3, h: 0.2 };
}

const fit = (pos: number, size: number) => Math.min(1 - size, Math.max(0, pos));

export function moveShape(shape: Shape, dx: number, dy: number): Shape {
  if (shape.type === 'rect') return { ...shape, x: fit(shape.x + dx, shape.w), y: fit(shape.y + dy, shape.h) };
  if (shape.type === 'ellipse') {
    return { ...shape, cx: fit(shape.cx - shape.rx + dx, 2 * shape.rx) + shape.rx, cy: fit(shape.cy - shape.ry + dy, 2 * shape.ry) + shape.ry };
  }
  const xs = shape.points.map((p) => p[0]);
  const ys = shape.points.map((p) => p[1]);
  const mx = Math.min(Math.max(dx, -Math.min(...xs)), 1 - Math.max(...xs));
  const my = Math.min(Math.max(dy, -Math.min(...ys)), 1 - Math.max(...ys));
  return { type: 'polygon', points: shape.points.map(([x, y]) => [x + mx, y + my]) };
}

const MIN_SIZE = 0.01;
export function resizeShape(shape: Shape, dw: number, dh: number): Shape {
  if (shape.type === 'rect') {
    const w = Math.min(1 - shape.x, Math.max(MIN_SIZE, shape.w + dw));
    const h = Math.min(1 - shape.y, Math.max(MIN_SIZE, shape.h + dh));
    return { ...shape, w, h };
  }
  if (shape.type === 'ellipse') {
    const rx = Math.min(shape.cx, 1 - shape.cx, Math.max(MIN_SIZE / 2, shape.rx + dw / 2));
    const ry = Math.min(shape.cy, 1 - shape.cy, Math.max(MIN_SIZE / 2, shape.ry + dh / 2));
    return { ...shape, rx, ry };
  }
  const cx = shape.points.reduce((s, p) => s + p[0], 0) / shape.points.length;
  const cy = shape.points.reduce((s, p) => s + p[1], 0) / shape.points.length;
  const span = (i: 0 | 1) => Math.max(...shape.points.map((p) => p[i])) - Math.min(...shape.points.map((p) => p[i])) || MIN_SIZE;
  const sx = Math.max(MIN_SIZE, span(0) + dw) / span(0);
  const sy = Math.max(MIN_SIZE, span(1) + dh) / span(1);
  return { type: 'polygon', points: shape.points.map(([x, y]) => [clamp01(cx + (x - cx) * sx), clamp01(cy + (y - cy) * sy)]) };
}

/** Where a region sits, in words for a screen reader: "left 35 %, top 40 %, 30 % wide, 20 % high". */
export function describeShape(shape: Shape): string {
  const pct = (v: number) => `${Math.round(v * 100)} %`;
  let box: { x: number; y: number; w: number; h: number };
  if (shape.type === 'rect') box = shape;
  else if (shape.type === 'ellipse') box = { x: shape.cx - shape.rx, y: shape.cy - shape.ry, w: 2 * shape.rx, h: 2 * shape.ry };
  else {
    const xs = shape.points.map((p) => p[0]);
    const ys = shape.points.map((p) => p[1]);
    box = { x: Math.min(...xs), y: Math.min(...ys), w: Math.max(...xs) - Math.min(...xs), h: Math.max(...ys) - Math.min(...ys) };
  }
  return `left ${pct(box.x)}, top ${pct(box.y)}, ${pct(box.w)} wide, ${pct(box.h)} high`;
}
