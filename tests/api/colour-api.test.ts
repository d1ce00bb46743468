import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';
import { api, baseUrl, expectErrorShape, signInAs } from '../support/http';
import { heicLike, hugeHeaderPng, labToRgb8, twoTonePng } from '../support/photos';

async function measure(cookie: string | null, parts: { image?: Buffer; type?: string; name?: string; regions?: unknown; neutral?: unknown }) {
  const form = new FormData();
  if (parts.image) form.set('image', new Blob([new Uint8Array(parts.image)], { type: parts.type ?? 'image/png' }), parts.name ?? 'photo.png');
  if (parts.regions !== undefined) form.set('regions', typeof parts.regions === 'string' ? parts.regions : JSON.stringify(parts.regions));
  if (parts.neutral !== undefined) form.set('neutral', JSON.stringify(parts.neutral));
  const res = await fetch(`${baseUrl()}/api/measure`, { method: 'POST', body: form, headers: { origin: baseUrl(), ...(cookie ? { cookie } : {}) } });
  return { status: res.status, body: await res.json() };
}

const BACK = { name: 'back', shape: { type: 'rect', x: 0.1, y: 0.1, w: 0.8, h: 0.3 } };

describe('POST /api/delta-e', () => {
  let cookie: string;
  beforeAll(async () => {
    cookie = await signInAs('viewer@demo.test', 'pourproof-demo', '10.70.0.1');
  });

  it('answers CIEDE2000 with its components, band and verdict', async () => {
    // Sharma, Wu & Dalal (2005), Table 1, pair 1: ΔE00 = 2.0425.
    const res = await api('/api/delta-e', { cookie, body: { reference: { l: 50, a: 2.6772, b: -79.7751 }, sample: { l: 50, a: 0, b: -82.7485 }, tolerance: 2 } });
    expect(res.status).toBe(200);
    expect(res.body.dE00).toBeCloseTo(2.0425, 4);
    expect(res.body.band).toBe('noticeable');
    expect(res.body.withinTolerance).toBe(false);
    expect(Object.keys(res.body).sort()).toEqual(['band', 'dC', 'dE00', 'dH', 'dL', 'withinTolerance']);
  });

  it('refuses bad Lab values with 400 naming the field, and strangers with 401', async () => {
    for (const [body, field] of [
      [{ reference: { l: 50, a: 0 }, sample: { l: 50, a: 0, b: 0 } }, /reference\.b/],
      [{ reference: { l: 150, a: 0, b: 0 }, sample: { l: 50, a: 0, b: 0 } }, /reference\.l/],
      [{ reference: { l: 50, a: 0, b: 0 }, sample: 'red' }, /sample/],
      [{ reference: { l: 50, a: 0, b: 0 }, sample: { l: 50, a: 0, b: 0 }, tolerance: -1 }, /tolerance/],
    ] as const) {
      const res = await api('/api/delta-e', { cookie, body });
      expect(res.status).toBe(400);
      expect(res.body.error.message).toMatch(field);
    }
    expect((await api('/api/delta-e', { body: { reference: { l: 1, a: 0, b: 0 }, sample: { l: 1, a: 0, b: 0 } } })).status).toBe(401);
  });
});

describe('POST /api/measure', () => {
  let cookie: string;
  beforeAll(async () => {
    cookie = await signInAs('maker@demo.test', 'pourproof-demo', '10.70.0.2');
  });

  it('measures named regions of a photo in the API shape', async () => {
    const back = labToRgb8({ l: 40, a: 10, b: 20 });
    const res = await measure(cookie, { image: await twoTonePng(back, [200, 180, 150]), regions: [BACK] });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ width: 200, height: 120, whiteBalance: { applied: false } });
    const r = res.body.regions[0];
    expect(r.name).toBe('back');
    expect(r.lab.l).toBeCloseTo(40, 0);
    expect(r.hex).toMatch(/^#[0-9a-f]{6}$/);
    expect(r.pixels).toBeGreaterThan(0);
    expect(r.flake).toMatchObject({ coverage: expect.any(Number), coverageUncertainty: expect.any(Number), groups: expect.any(Array) });
    // The coverage's ± (about 95 %, a fraction of the area): finite, not negative, and on a flat
    // colour small enough to say "no flake" (coverage 0 within it).
    expect(Number.isFinite(r.flake.coverageUncertainty)).toBe(true);
    expect(r.flake.coverageUncertainty).toBeGreaterThanOrEqual(0);
    expect(r.flake.coverageUncertainty).toBeLessThan(0.05);
    expect(r.flake.coverage).toBeLessThanOrEqual(r.flake.coverageUncertainty);
    // API.md's ± and the new figures: an evenly lit, single-colour region with no card.
    expect(r.uncertainty).toBeGreaterThan(0);
    expect(r.uncertainty).toBeLessThan(1);
    expect(r).toMatchObject({ shading: 0, other: null });
    expect(res.body.whiteBalance).toMatchObject({ cast: 0, warning: null });
  });

  it('answers each kind of bad input with its status and a clear message, and keeps serving', async () => {
    const png = await twoTonePng([90, 60, 40], [200, 180, 150]);
    const jpeg = await sharp(png).jpeg({ quality: 90 }).toBuffer();
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><rect width="10" height="10" fill="red"/></svg>');
    const many = Array.from({ length: 17 }, (_, i) => ({ name: `r${i}`, shape: BACK.shape }));
    const cases: [string, Parameters<typeof measure>[1], number, RegExp][] = [
      ['text named .jpg', { image: Buffer.from('hello, not a photo\n'.repeat(20)), name: 'a.jpg', type: 'image/jpeg', regions: [BACK] }, 415, /JPEG, PNG or WebP/],
      ['truncated JPEG', { image: jpeg.subarray(0, Math.floor(jpeg.length / 3)), name: 'a.jpg', type: 'image/jpeg', regions: [BACK] }, 415, /./],
      ['zero bytes', { image: Buffer.alloc(0), regions: [BACK] }, 400, /empty/],
      ['SVG', { image: svg, name: 'a.svg', type: 'image/svg+xml', regions: [BACK] }, 415, /JPEG, PNG or WebP/],
      ['HEIC', { image: heicLike(), name: 'a.heic', type: 'image/heic', regions: [BACK] }, 415, /HEIC/],
      ['30 000 × 30 000 PNG', { image: await hugeHeaderPng(), regions: [BACK] }, 413, /megapixels/],
      ['shape out of range', { image: png, regions: [{ name: 'back', shape: { type: 'rect', x: 0.5, y: 0.1, w: 0.8, h: 0.2 } }] }, 400, /regions\[0\]\.shape/],
      ['degenerate ellipse', { image: png, regions: [{ name: 'back', shape: { type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0, ry: 0.1 } }] }, 400, /regions\[0\]\.shape\.rx/],
      ['17 regions', { image: png, regions: many }, 400, /at most 16/],
      ['regions not JSON', { image: png, regions: '[{' }, 400, /regions/],
      ['no regions', { image: png }, 400, /regions/],
      ['region with no pixels', { image: png, regions: [{ name: 'speck', shape: { type: 'rect', x: 0.5, y: 0.5, w: 0.0001, h: 0.0001 } }] }, 422, /speck/],
    ];
    for (const [label, parts, status, message] of cases) {
      const res = await measure(cookie, parts);
      expect(res.status, label).toBe(status);
      expectErrorShape(res.body);
      expect(res.body.error.message, label).toMatch(message);
    }
    expect((await api('/api/health')).status).toBe(200);
    expect((await measure(null, { image: png, regions: [BACK] })).status).toBe(401);
  });
});
