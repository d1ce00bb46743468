// The pieces that read fine flake through JPEG's subsampled chroma (lib/color/baseBehindSmear,
// areaByLumaCode, isOneSmearedFlake, lumaChroma, patchSample), each on a grid built by hand where
// the answer is known exactly. The photo-level checks are in fineFlake.test.ts and samples.test.ts.
import { describe, expect, it } from 'vitest';
import { areaByLumaCode, baseBehindSmear, chromaOf, isOneSmearedFlake, lumaChroma, lumaOf, patchSample, SRGB_TO_XYZ, srgbToLinear, type Vec3, yccToLinear } from '@/lib/color';
import { gauss, rng } from './synth';

describe('lumaChroma (JFIF 1.02 §7)', () => {
  it("gives JFIF's Y'CbCr of the encoded channels and back", () => {
    // Pure sRGB red, (255, 0, 0): Y' = 0.299, Cb = −0.1687, Cr = 0.5 (JFIF 1.02's equations, 0..1 scale).
    const red: Vec3 = [1, 0, 0];
    expect(lumaOf(red)).toBeCloseTo(0.299, 6);
    const [cb, cr] = chromaOf(red);
    expect(cb).toBeCloseTo(-0.168736, 6);
    expect(cr).toBeCloseTo(0.5, 6);
    const back = yccToLinear(0.299, cb, cr);
    expect(back[0]).toBeCloseTo(1, 4);
    expect(back[1]).toBeCloseTo(0, 4);
    expect(back[2]).toBeCloseTo(0, 4);
    // Per pixel from XYZ, and NaN where a pixel does not take part.
    const xyz = new Float32Array([0.4124, 0.2126, 0.0193, 0.9505, 1, 1.089]);
    const out = lumaChroma(xyz, new Uint8Array([1, 0]), SRGB_TO_XYZ);
    expect(out.y[0]).toBeCloseTo(0.299, 3);
    expect(Number.isNaN(out.y[1])).toBe(true);
  });
});

// A grid of base with 1–3 px square specks of one flake, mixed in linear light, then JPEG-like
// chroma: Cb and Cr blurred (Gaussian σ = 1.5 px) while Y' stays each pixel's own.
function smearedGrid(seed: number, coverage: number, base: Vec3, flake: Vec3, sigma = 1.5) {
  const W = 120, H = 90, n = W * H;
  const rand = rng(seed);
  const share = new Float64Array(n);
  let placed = 0;
  while (placed < coverage * n) {
    const s = 1 + Math.floor(rand() * 3), x0 = Math.floor(rand() * (W - s)), y0 = Math.floor(rand() * (H - s));
    for (let y = y0; y < y0 + s; y++) for (let x = x0; x < x0 + s; x++) if (!share[y * W + x]) { share[y * W + x] = 1; placed++; }
  }
  const normal = gauss(rng(seed + 1));
  const y = new Float64Array(n), cb = new Float64Array(n), cr = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const rgb = [0, 1, 2].map((c) => base[c] + share[i] * (flake[c] - base[c])) as Vec3;
    y[i] = lumaOf(rgb) + 0.003 * normal();
    [cb[i], cr[i]] = chromaOf(rgb);
  }
  const blur = (src: Float64Array) => {
    const r = Math.ceil(3 * sigma), k = Array.from({ length: 2 * r + 1 }, (_, j) => Math.exp(-0.5 * ((j - r) / sigma) ** 2));
    const tmp = new Float64Array(n), out = new Float64Array(n);
    for (const [dx, dy, a, b] of [[1, 0, src, tmp], [0, 1, tmp, out]] as const)
      for (let yy = 0; yy < H; yy++)
        for (let xx = 0; xx < W; xx++) {
          let s = 0, w = 0;
          for (let j = -r; j <= r; j++) {
            const x2 = xx + j * dx, y2 = yy + j * dy;
            if (x2 < 0 || y2 < 0 || x2 >= W || y2 >= H) continue;
            s += k[j + r] * a[y2 * W + x2];
            w += k[j + r];
          }
          b[yy * W + xx] = s / w;
        }
    return out;
  };
  const scb = blur(cb), scr = blur(cr);
  for (let i = 0; i < n; i++) { scb[i] += 0.002 * normal(); scr[i] += 0.002 * normal(); }
  // The truly base pixels: no speck within 2 px (what trulyBase would keep).
  const truly = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const x = i % W, yy = (i - x) / W;
    let clear = true;
    for (let dy = -2; dy <= 2 && clear; dy++) for (let dx = -2; dx <= 2; dx++) {
      const x2 = x + dx, y2 = yy + dy;
      if (x2 >= 0 && y2 >= 0 && x2 < W && y2 < H && share[y2 * W + x2]) { clear = false; break; }
    }
    truly[i] = clear ? 1 : 0;
  }
  const cell = Int32Array.from({ length: n }, (_, i) => i);
  return { ycc: { y, cb: scb, cr: scr }, cell, gridW: W, gridH: H, truly, share };
}

describe('baseBehindSmear', () => {
  const base: Vec3 = [0.1, 0.25, 0.1].map(srgbToLinear) as Vec3; // a dark green, linear
  const flake: Vec3 = [0.02, 0.1, 0.6]; // a vivid blue, linear
  it('finds the base chroma that the smear has tinted every near pixel with', () => {
    const g = smearedGrid(3, 0.2, base, flake, 1.5);
    const [bcb, bcr] = chromaOf(base);
    // The naive mean of the truly base pixels is pulled toward the flake by the smear…
    let ncb = 0, k = 0;
    for (let i = 0; i < g.truly.length; i++) if (g.truly[i]) { ncb += g.ycc.cb[i]; k++; }
    expect(Math.abs(ncb / k - bcb)).toBeGreaterThan(0.004);
    // …the fit is not (half a code is 0.002 on this scale).
    const s = baseBehindSmear({ ycc: g.ycc, cell: g.cell, gridW: g.gridW, gridH: g.gridH, base: g.truly })!;
    expect(s).not.toBeNull();
    expect(Math.abs(s.cb - bcb)).toBeLessThan(0.002);
    expect(Math.abs(s.cr - bcr)).toBeLessThan(0.002);
    expect(s.y).toBeCloseTo(lumaOf(base), 3);
    // The smear's width is found too (refined between the candidates).
    expect(Math.abs(s.smear - 1.5)).toBeLessThan(0.1);
  });
  it('gives up on too few pixels', () => {
    const g = smearedGrid(4, 0.1, base, flake);
    const few = new Float64Array(g.ycc.y.length).fill(NaN);
    for (let i = 0; i < 100; i++) few[i] = g.ycc.y[i];
    expect(baseBehindSmear({ ycc: { ...g.ycc, y: few }, cell: g.cell, gridW: g.gridW, gridH: g.gridH, base: g.truly })).toBeNull();
  });
});

describe('areaByLumaCode', () => {
  it("counts the flake's area from Y' where L* cannot tell, and gives up without contrast", () => {
    const base: Vec3 = [0.05, 0.08, 0.2], flake: Vec3 = [0, 0.08, 0.45]; // Y' differs by ≈ 0.04
    const g = smearedGrid(5, 0.15, base, flake);
    const truth = g.share.reduce((s, v) => s + v, 0);
    const mark = Uint8Array.from(g.share, (v) => (v > 0 ? 1 : 0));
    const area = areaByLumaCode({ y: g.ycc.y, flake: mark, base: lumaOf(base), noise: 0.003, cell: g.cell, gridW: g.gridW, gridH: g.gridH })!;
    expect(Math.abs(area - truth) / g.share.length).toBeLessThan(0.01);
    expect(areaByLumaCode({ y: g.ycc.y, flake: mark, base: lumaOf(base), noise: 0.02, cell: g.cell, gridW: g.gridW, gridH: g.gridH })).toBeNull();
  });
});

describe('isOneSmearedFlake', () => {
  const base: Vec3 = [0.85, 0.3, 0.35]; // bubblegum, linear
  const s = { y: lumaOf(base), cb: chromaOf(base)[0], cr: chromaOf(base)[1], rgb: base, se: 0, noise: 0.003, smear: 1.3 };
  const ycc = (y: number, cb: number, cr: number) => yccToLinear(y, cb, cr);
  const blue = chromaOf([0.02, 0.1, 0.6]);
  it("takes a dark core of faded chroma and a light rim of the flake's hue as one flake", () => {
    const core = ycc(s.y - 0.4, s.cb + 0.4 * (blue[0] - s.cb), s.cr + 0.4 * (blue[1] - s.cr));
    const rim = ycc(s.y - 0.05, s.cb + 0.6 * (blue[0] - s.cb), s.cr + 0.6 * (blue[1] - s.cr));
    expect(isOneSmearedFlake(s, [core, rim])).toBe(true);
  });
  it('keeps two hues, or two sides of the base lightness, apart', () => {
    const core = ycc(s.y - 0.4, s.cb + 0.4 * (blue[0] - s.cb), s.cr + 0.4 * (blue[1] - s.cr));
    const gold = chromaOf([0.6, 0.4, 0.02]);
    expect(isOneSmearedFlake(s, [core, ycc(s.y - 0.2, gold[0], gold[1])])).toBe(false);
    expect(isOneSmearedFlake(s, [core, ycc(s.y + 0.15, s.cb, s.cr)])).toBe(false);
  });
});

describe('patchSample', () => {
  it("copies whole patches of the region's pixels side by side, about as many as asked", () => {
    const W = 400, H = 300;
    const data = Uint8Array.from({ length: W * H * 3 }, (_, k) => ((k / 3) | 0) % 251);
    const window = { data, left: 0, top: 0, width: W, height: H };
    const spans: number[] = [];
    for (let y = 10; y < 290; y++) spans.push(y, 20, 380);
    const p = patchSample(window, Int32Array.from(spans), 20_000)!;
    let count = 0;
    for (let s = 0; s < p.spans.length; s += 3) {
      const y = p.spans[s], a = p.spans[s + 1], b = p.spans[s + 2];
      count += b - a;
      // Each row of a patch is a run of consecutive pixels of one source row.
      const first = p.window.data[(y * p.window.width + a) * 3];
      for (let x = a; x < b; x++) expect(p.window.data[(y * p.window.width + x) * 3]).toBe((first + (x - a)) % 251);
    }
    expect(count).toBeGreaterThan(15_000);
    expect(count).toBeLessThan(30_000);
    expect(patchSample(window, Int32Array.from(spans), 1e6)).toBeNull();
  });
});
