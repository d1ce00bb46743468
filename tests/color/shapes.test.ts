import { describe, expect, it } from 'vitest';
import { shapeMask, shapeSchema, shapeSpans, spanBounds, type Shape } from '@/lib/color';

const messages = (input: unknown) => {
  const r = shapeSchema.safeParse(input);
  return r.success ? [] : r.error.issues.map((i) => i.message);
};
const count = (shape: Shape, w: number, h: number) => shapeMask(shape, w, h).reduce((s, v) => s + v, 0);

describe('shapeSchema', () => {
  it('accepts the shapes of API.md', () => {
    expect(messages({ type: 'rect', x: 0.1, y: 0.2, w: 0.3, h: 0.1 })).toEqual([]);
    expect(messages({ type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0.1, ry: 0.05 })).toEqual([]);
    expect(messages({ type: 'polygon', points: [[0.1, 0.1], [0.4, 0.1], [0.3, 0.3]] })).toEqual([]);
    expect(messages({ type: 'rect', x: 0, y: 0, w: 1, h: 1 })).toEqual([]);
  });

  it('rejects out-of-range coordinates', () => {
    expect(messages({ type: 'rect', x: -0.1, y: 0, w: 0.5, h: 0.5 })).toContain('x must be between 0 and 1');
    expect(messages({ type: 'rect', x: 0.8, y: 0, w: 0.3, h: 0.5 })).toContain('x + w must be ≤ 1');
    expect(messages({ type: 'ellipse', cx: 1.2, cy: 0.5, rx: 0.1, ry: 0.1 })).toContain('cx must be between 0 and 1');
    expect(messages({ type: 'ellipse', cx: 0.95, cy: 0.5, rx: 0.1, ry: 0.1 })).toContain('cx ± rx must stay within 0..1');
    expect(messages({ type: 'polygon', points: [[0.1, 0.1], [1.4, 0.1], [0.3, 0.3]] })).toContain('x must be between 0 and 1');
    expect(messages({ type: 'rect', x: Number.NaN, y: 0, w: 0.5, h: 0.5 }).length).toBeGreaterThan(0);
    expect(messages({ type: 'rect', x: '0.1', y: 0, w: 0.5, h: 0.5 }).length).toBeGreaterThan(0);
  });

  it('rejects degenerate sizes with clear messages', () => {
    expect(messages({ type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0, ry: 0.1 })).toContain('rx must be > 0');
    expect(messages({ type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0.1, ry: -1 })).toContain('ry must be > 0');
    expect(messages({ type: 'rect', x: 0.1, y: 0.1, w: 0, h: 0.1 })).toContain('w must be > 0');
    expect(messages({ type: 'rect', x: 0.1, y: 0.1, w: 0.1, h: 0 })).toContain('h must be > 0');
  });

  it('rejects polygons with too few or too many points, or no area', () => {
    expect(messages({ type: 'polygon', points: [[0.1, 0.1], [0.4, 0.1]] })).toContain('a polygon needs at least 3 points');
    const many = Array.from({ length: 201 }, (_, i) => [0.5 + 0.4 * Math.cos(i / 32), 0.5 + 0.4 * Math.sin(i / 32)]);
    expect(messages({ type: 'polygon', points: many })).toContain('a polygon may have at most 200 points');
    expect(messages({ type: 'polygon', points: many.slice(0, 200) })).toEqual([]);
    expect(messages({ type: 'polygon', points: [[0.1, 0.1], [0.2, 0.2], [0.3, 0.3]] })).toContain('polygon has no area (its points lie on one line)');
    expect(messages({ type: 'polygon', points: [[0.1, 0.1], [0.1, 0.1], [0.1, 0.1]] })).toContain('polygon has no area (its points lie on one line)');
  });

  it('rejects unknown types', () => {
    expect(messages({ type: 'circle', cx: 0.5, cy: 0.5, r: 0.1 })).toEqual(['type must be rect, ellipse or polygon']);
  });
});

describe('shape masks (pixel-centre inclusion)', () => {
  it('rect: exact pixel counts, half-open edges', () => {
    expect(count({ type: 'rect', x: 0, y: 0, w: 1, h: 1 }, 10, 8)).toBe(80);
    expect(count({ type: 'rect', x: 0.1, y: 0.2, w: 0.3, h: 0.5 }, 10, 10)).toBe(15);
    // Two abutting halves share no pixel and miss none.
    const left = shapeMask({ type: 'rect', x: 0, y: 0, w: 0.5, h: 1 }, 7, 3);
    const right = shapeMask({ type: 'rect', x: 0.5, y: 0, w: 0.5, h: 1 }, 7, 3);
    for (let i = 0; i < 21; i++) expect(left[i] + right[i]).toBe(1);
    // Too thin to hold any pixel centre.
    expect(count({ type: 'rect', x: 0.01, y: 0.01, w: 0.02, h: 0.5 }, 10, 10)).toBe(0);
  });

  it('ellipse: a centred circle of radius 2.5 px on 10 × 10 covers the 16 centres within it', () => {
    // Centre offsets are ±0.5, ±1.5, ±2.5 px; 0.5² + 2.5² = 6.5 > 2.5², 1.5² + 1.5² = 4.5 ≤ 6.25:
    // exactly the 4 × 4 block of offsets in {±0.5, ±1.5} is inside.
    expect(count({ type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0.25, ry: 0.25 }, 10, 10)).toBe(16);
    // On 20 × 20 (radius 5 px) compare with a brute-force count over pixel centres.
    let expected = 0;
    for (let j = 0; j < 20; j++) for (let i = 0; i < 20; i++) if ((i + 0.5 - 10) ** 2 + (j + 0.5 - 10) ** 2 <= 25) expected++;
    expect(count({ type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0.25, ry: 0.25 }, 20, 20)).toBe(expected);
  });

  it('ellipse: area converges to π·rx·ry (relative error < 0.5 % at 400 × 300)', () => {
    const n = count({ type: 'ellipse', cx: 0.4, cy: 0.55, rx: 0.3, ry: 0.2 }, 400, 300);
    expect(Math.abs(n / (Math.PI * 0.3 * 400 * 0.2 * 300) - 1)).toBeLessThan(0.005);
  });

  it('polygon: a right triangle and a concave L-shape', () => {
    // Triangle (0,0)-(1,0)-(0,1) on 10 × 10: pixel centres with x + y < 1 → 45 of 100.
    expect(count({ type: 'polygon', points: [[0, 0], [1, 0], [0, 1]] }, 10, 10)).toBe(45);
    // L-shape: the unit square minus its top-right quarter → 75 of 100.
    const L: Shape = { type: 'polygon', points: [[0, 0], [0.5, 0], [0.5, 0.5], [1, 0.5], [1, 1], [0, 1]] };
    expect(count(L, 10, 10)).toBe(75);
    // Polygon equal to a rect gives the same pixels as the rect.
    const asRect = shapeMask({ type: 'rect', x: 0.2, y: 0.3, w: 0.5, h: 0.4 }, 20, 20);
    const asPoly = shapeMask({ type: 'polygon', points: [[0.2, 0.3], [0.7, 0.3], [0.7, 0.7], [0.2, 0.7]] }, 20, 20);
    expect(Array.from(asPoly)).toEqual(Array.from(asRect));
  });

  it('polygon: even-odd rule leaves the middle of a self-overlapping pentagram empty', () => {
    const star = Array.from({ length: 5 }, (_, k) => {
      const t = -Math.PI / 2 + (k * 4 * Math.PI) / 5;
      return [0.5 + 0.45 * Math.cos(t), 0.5 + 0.45 * Math.sin(t)] as [number, number];
    });
    const mask = shapeMask({ type: 'polygon', points: star }, 100, 100);
    expect(mask[50 * 100 + 50]).toBe(0); // centre: inside the inner pentagon, crossed twice
    expect(mask[10 * 100 + 50]).toBe(1); // in the top point
  });

  it('spans and their bounds agree with the mask', () => {
    const shape: Shape = { type: 'ellipse', cx: 0.3, cy: 0.6, rx: 0.2, ry: 0.3 };
    const spans = shapeSpans(shape, 50, 40);
    let n = 0;
    for (let s = 0; s < spans.length; s += 3) n += spans[s + 2] - spans[s + 1];
    expect(n).toBe(count(shape, 50, 40));
    const box = spanBounds(spans)!;
    const mask = shapeMask(shape, 50, 40);
    for (let y = 0; y < 40; y++)
      for (let x = 0; x < 50; x++)
        if (mask[y * 50 + x]) {
          expect(x >= box.left && x < box.left + box.width).toBe(true);
          expect(y >= box.top && y < box.top + box.height).toBe(true);
        }
    expect(spanBounds(new Int32Array(0))).toBeNull();
  });
});
