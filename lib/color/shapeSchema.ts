import { z } from 'zod';
import type { Shape } from './types';

// Region shapes in coordinates normalised to the displayed image (0..1). A shape must lie
// inside the image; sizes must be positive; a polygon has 3..200 points and some area.
const EPS = 1e-9;
const unit = (name: string) =>
  z
    .number({ error: `${name} must be a number` })
    .min(0, `${name} must be between 0 and 1`)
    .max(1, `${name} must be between 0 and 1`);
const size = (name: string) => z.number({ error: `${name} must be a number` }).gt(0, `${name} must be > 0`);

export const MAX_POLYGON_POINTS = 200;

const rect = z
  .object({ type: z.literal('rect'), x: unit('x'), y: unit('y'), w: size('w'), h: size('h') })
  .refine((s) => s.x + s.w <= 1 + EPS, { message: 'x + w must be ≤ 1', path: ['w'] })
  .refine((s) => s.y + s.h <= 1 + EPS, { message: 'y + h must be ≤ 1', path: ['h'] });

const ellipse = z
  .object({ type: z.literal('ellipse'), cx: unit('cx'), cy: unit('cy'), rx: size('rx'), ry: size('ry') })
  .refine((s) => s.cx - s.rx >= -EPS && s.cx + s.rx <= 1 + EPS, {
    message: 'cx ± rx must stay within 0..1',
    path: ['rx'],
  })
  .refine((s) => s.cy - s.ry >= -EPS && s.cy + s.ry <= 1 + EPS, {
    message: 'cy ± ry must stay within 0..1',
    path: ['ry'],
  });

// A polygon has area unless all its points lie on one line: take the point farthest from the
// first, then look for any point off the line through those two (cross product).
const hasArea = (pts: [number, number][]) => {
  const [x0, y0] = pts[0];
  let far = pts[0];
  for (const p of pts) if (Math.hypot(p[0] - x0, p[1] - y0) > Math.hypot(far[0] - x0, far[1] - y0)) far = p;
  const dx = far[0] - x0;
  const dy = far[1] - y0;
  if (Math.hypot(dx, dy) < EPS) return false;
  return pts.some(([x, y]) => Math.abs(dx * (y - y0) - dy * (x - x0)) > EPS);
};

const polygon = z
  .object({
    type: z.literal('polygon'),
    points: z
      .array(z.tuple([unit('x'), unit('y')]), { error: 'points must be a list of [x, y] pairs' })
      .min(3, 'a polygon needs at least 3 points')
      .max(MAX_POLYGON_POINTS, `a polygon may have at most ${MAX_POLYGON_POINTS} points`),
  })
  .refine((s) => hasArea(s.points), { message: 'polygon has no area (its points lie on one line)', path: ['points'] });

export const shapeSchema: z.ZodType<Shape> = z.discriminatedUnion('type', [rect, ellipse, polygon], {
  error: 'type must be rect, ellipse or polygon',
});
