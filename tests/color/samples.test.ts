import { describe, expect, it } from 'vitest';
import { deltaE2000, kthSmallest, measureRegion, regionPixels, shapeSpans, srgbToLab, weightedMedian } from '@/lib/color';
import { DEFAULT_MAX_SAMPLES, measurePhoto } from '@/lib/image';
import { makePhoto } from '../support/photoGen';
import { encode, gauss, rawImage, rng, type Rgb } from './synth';

describe('weightedMedian', () => {
  it('equals a brute-force weighted median (smallest value reaching half the weight)', () => {
    const rand = rng(3);
    for (let trial = 0; trial < 50; trial++) {
      const n = 1 + Math.floor(rand() * 300);
      const values = Float64Array.from({ length: n }, () => (rand() - 0.3) * 40);
      const weights = Uint32Array.from({ length: n }, () => 1 + Math.floor(rand() * 20));
      const include = Uint8Array.from({ length: n }, () => (rand() < 0.8 ? 1 : 0));
      include[0] = 1;
      const pairs = Array.from(values, (v, i) => [v, weights[i], include[i]]).filter((p) => p[2]).sort((p, q) => p[0] - q[0]);
      const half = pairs.reduce((s, p) => s + p[1], 0) / 2;
      let acc = 0;
      const brute = pairs.find((p) => (acc += p[1]) >= half)![0];
      expect(weightedMedian(values, weights, { range: [-50, 50], step: 0.37, include })).toBe(brute);
    }
    expect(Number.isNaN(weightedMedian(new Float64Array(2), new Uint32Array([1, 1]), { range: [0, 1], step: 0.1, include: new Uint8Array(2) }))).toBe(true);
  });
});

describe('regionPixels', () => {
  const W = 30, H = 20;
  const rand = rng(9);
  const data = Uint8Array.from({ length: W * H * 3 }, () => Math.floor(rand() * 4) * 60);
  const window = { data, left: 0, top: 0, width: W, height: H };

  it('counts every pixel once and keeps the colours exact', () => {
    const spans = shapeSpans({ type: 'rect', x: 0, y: 0, w: 1, h: 1 }, W, H);
    const rp = regionPixels(window, spans);
    const s = rp.samples;
    expect(s.total).toBe(W * H);
    expect(s.pixels).toBe(W * H);
    expect(s.counts.reduce((a, b) => a + b, 0)).toBe(W * H);
    // Each distinct colour's count equals a brute-force count.
    for (let i = 0; i < s.size; i++) {
      let n = 0;
      for (let j = 0; j < data.length; j += 3) if (data[j] === s.rgb[i * 3] && data[j + 1] === s.rgb[i * 3 + 1] && data[j + 2] === s.rgb[i * 3 + 2]) n++;
      expect(s.counts[i]).toBe(n);
    }
    for (let i = 0; i < s.size; i++) {
      const lab = srgbToLab(s.rgb[i * 3], s.rgb[i * 3 + 1], s.rgb[i * 3 + 2]);
      expect(Math.hypot(lab.l - s.lab[i * 3], lab.a - s.lab[i * 3 + 1], lab.b - s.lab[i * 3 + 2])).toBeLessThan(1e-9);
    }
    // Every pixel sits in its own cell and points at its colour.
    for (let i = 0; i < rp.cell.length; i++) {
      const x = rp.cell[i] % rp.gridW, y = (rp.cell[i] - x) / rp.gridW, j = (y * W + x) * 3;
      expect([data[j], data[j + 1], data[j + 2]]).toEqual(Array.from(s.rgb.subarray(rp.sample[i] * 3, rp.sample[i] * 3 + 3)));
    }
  });

  it('on a lattice, samples every step-th pixel of every step-th row (image coordinates)', () => {
    const spans = shapeSpans({ type: 'rect', x: 0.1, y: 0.1, w: 0.8, h: 0.8 }, W, H); // x 3..26, y 2..17
    const { samples: s } = regionPixels({ ...window }, spans, undefined, 3);
    expect(s.pixels).toBe(24 * 16);
    // Rows 3, 6, 9, 12, 15 and columns 3, 6, …, 24: 5 × 8.
    expect(s.total).toBe(5 * 8);
  });
});

describe('lattice sampling in measurePhoto', () => {
  it('a small sample budget measures the same as every pixel', async () => {
    const noise = gauss(rng(11));
    const base: Rgb = [160, 70, 50];
    const raw = rawImage(400, 300, (x, y) => ((x * 31 + y * 17) % 23 < 3 ? [230, 200, 60] : base.map((v) => v + 2.5 * noise()) as Rgb));
    const png = await encode(raw, 400, 300, 'png');
    const region = [{ name: 'back', shape: { type: 'ellipse' as const, cx: 0.5, cy: 0.5, rx: 0.45, ry: 0.45 } }];
    const full = (await measurePhoto(png, region, undefined, { maxSamples: Infinity })).regions[0];
    const lattice = (await measurePhoto(png, region, undefined, { maxSamples: 5_000 })).regions[0]; // a lattice of every 3rd pixel
    expect(lattice.pixels).toBe(full.pixels);
    expect(deltaE2000(lattice.lab, full.lab)).toBeLessThan(0.2);
    expect(deltaE2000(full.lab, srgbToLab(...base))).toBeLessThan(0.5);
    expect(Math.abs(lattice.flake.coverage - full.flake.coverage)).toBeLessThan(0.01);
    expect(Math.abs(lattice.kept / full.kept - 1)).toBeLessThan(0.02);
    expect(Math.abs(lattice.spread - full.spread)).toBeLessThan(0.1);
  });
});

describe('the default lattice on a realistic large photo (tests/support/photoGen.ts)', () => {
  it.each([
    ['blue flake 1–3 px, 10 %, shaded, JPEG q90', { l: 55, a: -30, b: 25 }, { l: 35, a: 15, b: -60 }, 0.1, 0],
    ['silver flake 1–3 px, 5 %, sparkle, JPEG q90', { l: 35, a: 5, b: -25 }, { l: 92, a: 0, b: 0 }, 0.05, 0.15],
  ])('%s: within ΔE00 0.5 of the truth and 0.3 of every pixel, coverage ±0.01 of every pixel, the ± honest', async (_n, base, colour, coverage, sparkle) => {
    const t = await makePhoto(
      { seed: 77, width: 1600, height: 1200, base, flake: { colours: [colour], coverage, sizes: [1, 3], sparkle }, shading: 0.15, blur: 0.6, format: 'jpeg90' },
      { x0: 100, y0: 100, x1: 1400, y1: 1100 },
    );
    const region = [{ name: 'z', shape: t.region }];
    const full = (await measurePhoto(t.file, region, undefined, { maxSamples: Infinity })).regions[0];
    const lattice = (await measurePhoto(t.file, region)).regions[0];
    expect(full.pixels).toBeGreaterThan(40 * DEFAULT_MAX_SAMPLES); // so the lattice is sparse
    // A lattice point does not see its neighbours in the grid; regionPixels' `rough` lets it know
    // when it sits beside a speck, so the base is still taken from truly base pixels.
    expect(deltaE2000(lattice.lab, t.lab)).toBeLessThan(0.5);
    expect(deltaE2000(lattice.lab, full.lab)).toBeLessThan(0.3);
    expect(Math.abs(lattice.flake.coverage - full.flake.coverage)).toBeLessThan(0.01);
    expect(Math.abs(lattice.shading - full.shading)).toBeLessThan(1);
    expect(deltaE2000(lattice.lab, t.lab)).toBeLessThanOrEqual(lattice.uncertainty);
  }, 120_000);
});

// A lattice sees one pixel in every few and cannot tell a sampled pixel tinted by a speck's
// smeared chroma (JPEG 4:2:0) from base: with flake in a JPEG q75 photo, or dense flake at q90,
// the base and flake are read again on patches of every pixel (patchSample). Seeds and sizes not
// used elsewhere.
describe('fine flake in a large JPEG photo, read on patches', () => {
  it.each([
    { name: 'blue flake on the dark blue base (one L*)', base: { l: 35, a: 5, b: -25 }, colour: { l: 35, a: 15, b: -60 }, format: 'jpeg75' },
    { name: 'blue flake on green', base: { l: 55, a: -30, b: 25 }, colour: { l: 35, a: 15, b: -60 }, format: 'jpeg75' },
    { name: 'black flake on pumpkin', base: { l: 62, a: 30, b: 55 }, colour: { l: 8, a: 0, b: 0 }, format: 'jpeg75' },
  ] as const)('$name, 20 %, 800 × 600, $format: base within ΔE00 1.0, coverage within ±0.04, the ± holding', async ({ base, colour, format }) => {
    const t = await makePhoto({ seed: 91, width: 800, height: 600, base, flake: { colours: [colour], coverage: 0.2, sizes: [1, 3] }, blur: 0.6, format });
    const m = (await measurePhoto(t.file, [{ name: 'z', shape: t.region }])).regions[0];
    expect(m.pixels).toBeGreaterThan(20 * DEFAULT_MAX_SAMPLES); // so the lattice is sparse
    expect(deltaE2000(m.lab, t.lab)).toBeLessThan(1);
    expect(Math.abs(m.flake.coverage - t.coverage)).toBeLessThanOrEqual(0.04);
    expect(deltaE2000(m.lab, t.lab)).toBeLessThanOrEqual(m.uncertainty);
    expect(m.glare).toBeLessThanOrEqual(0.02);
  }, 60_000);

  // At q90 the chroma is smeared less and only dense flake is read again on patches: there the
  // base is taken from truly base pixels seen at full resolution (the lattice alone reads this one
  // about 1.3 off). Its area by unmixing reads ≈ 0.045 low: at q90 JPEG's luma is not used for it.
  it('dense blue flake on the dark blue base (one L*), 20 %, 800 × 600, JPEG q90: base within ΔE00 1.0, the ± holding', async () => {
    const t = await makePhoto({ seed: 91, width: 800, height: 600, base: { l: 35, a: 5, b: -25 }, flake: { colours: [{ l: 35, a: 15, b: -60 }], coverage: 0.2, sizes: [1, 3] }, blur: 0.6, format: 'jpeg90' });
    const m = (await measurePhoto(t.file, [{ name: 'z', shape: t.region }])).regions[0];
    expect(deltaE2000(m.lab, t.lab)).toBeLessThan(1);
    expect(deltaE2000(m.lab, t.lab)).toBeLessThanOrEqual(m.uncertainty);
    expect(Math.abs(m.flake.coverage - t.coverage)).toBeLessThanOrEqual(0.06);
  }, 60_000);
});

describe('measureRegion on a hand-made window', () => {
  it('keeps the base, calls the dark specks flake by area and the clipped streak glare', () => {
    // 40 × 25 px: base everywhere, a 20 × 3 px clipped streak on rows 0–2, twenty 2 × 2 dark specks.
    const W = 40, H = 25;
    const base: Rgb = [100, 150, 60];
    const data = new Uint8Array(W * H * 3);
    for (let i = 0; i < W * H; i++) data.set(base, i * 3);
    for (let y = 0; y < 3; y++) for (let x = 0; x < 20; x++) data.set([255, 255, 255], (y * W + x) * 3);
    let specks = 0;
    for (let y = 6; y < H - 2; y += 5)
      for (let x = 2; x < W - 2 && specks < 20; x += 6, specks++)
        for (const [dx, dy] of [[0, 0], [1, 0], [0, 1], [1, 1]]) data.set([20, 20, 30], ((y + dy) * W + x + dx) * 3);
    expect(specks).toBe(20);
    const spans = shapeSpans({ type: 'rect', x: 0, y: 0, w: 1, h: 1 }, W, H);
    const rp = regionPixels({ data, left: 0, top: 0, width: W, height: H }, spans);
    expect(rp.samples.size).toBe(3);
    const m = measureRegion(rp);
    // Glare: the streak alone (its neighbours are no lighter than the base, so no fringe).
    expect(m.glare).toBeCloseTo(60 / 1000, 12);
    expect(m.flake.coverage).toBeCloseTo(80 / 1000, 9);
    expect(m.kept).toBe(1000 - 60 - 80);
    expect(m.flake.groups).toHaveLength(1);
    // Per-pixel colours are held in 32-bit floats: agreement to about 1e-5.
    expect(deltaE2000(m.flake.groups[0].lab, srgbToLab(20, 20, 30))).toBeLessThan(1e-5);
    expect(deltaE2000(m.lab, srgbToLab(...base))).toBeLessThan(1e-5);
    expect(m.shading).toBe(0);
    expect(m.other).toBeNull();
  });
});

describe('kthSmallest', () => {
  it('equals the sorted array at every k, ties and all, and leaves the input alone', () => {
    const rand = rng(5);
    for (let trial = 0; trial < 30; trial++) {
      const n = 1 + Math.floor(rand() * 200);
      const v = Float64Array.from({ length: n }, () => Math.round(rand() * 20) / 4);
      const before = v.slice();
      const sorted = v.slice().sort();
      for (let k = 0; k < n; k++) expect(kthSmallest(v, k)).toBe(sorted[k]);
      expect(Array.from(v)).toEqual(Array.from(before));
    }
  });
});
