// Truth by construction: every photo here is written by the test, so the colour of each pixel
// is known; the reference conversion is culori's lab65 (srgbToLab), itself checked against the
// IEC 61966-2-1 / CIE 15:2004 formulas and colorjs.io in lab.test.ts.
import { describe, expect, it } from 'vitest';
import { deltaE2000, type Lab, srgbToLab } from '@/lib/color';
import { ImageError, measurePhoto } from '@/lib/image';
import { encode, gauss, rawImage, rng, type Rgb } from './synth';

const whole = { type: 'rect' as const, x: 0.05, y: 0.05, w: 0.9, h: 0.9 };

describe('measurePhoto: flat patches', () => {
  const colours: Rgb[] = [
    [86, 140, 92], // watermelon-ish green
    [200, 110, 40], // pumpkin
    [190, 230, 40], // chartreuse, high chroma
    [35, 30, 45], // dark
    [240, 236, 228], // pearl white
  ];
  it.each(colours)('PNG of (%i, %i, %i) measures its own Lab within ΔE00 0.5', async (r, g, b) => {
    const png = await encode(rawImage(120, 90, () => [r, g, b]), 120, 90, 'png');
    const out = await measurePhoto(png, [{ name: 'back', shape: whole }]);
    const m = out.regions[0];
    expect(deltaE2000(m.lab, srgbToLab(r, g, b))).toBeLessThanOrEqual(0.5);
    expect(m.pixels).toBe(108 * 81);
    expect(m.kept).toBe(m.pixels);
    expect(m.glare).toBe(0);
    expect(m.flake.coverage).toBe(0);
    expect(m.spread).toBeLessThan(1e-5); // per-pixel colours are held in 32-bit floats
  });

  it.each(colours)('JPEG q90 of (%i, %i, %i) measures its own Lab within ΔE00 1.0', async (r, g, b) => {
    const jpg = await encode(rawImage(120, 90, () => [r, g, b]), 120, 90, 'jpeg', 90);
    const out = await measurePhoto(jpg, [{ name: 'back', shape: { type: 'ellipse', cx: 0.5, cy: 0.5, rx: 0.4, ry: 0.4 } }]);
    expect(deltaE2000(out.regions[0].lab, srgbToLab(r, g, b))).toBeLessThanOrEqual(1.0);
  });
});

// A noisy base with square specks of two flake colours and a clipped glare streak; the truth is
// known pixel by pixel.
function flakedPatch(seed: number, base: Rgb, flakes: Rgb[], target: number, speck: [number, number] = [2, 4], W = 240, H = 180) {
  const rand = rng(seed);
  const noise = gauss(rand);
  const label = new Uint8Array(W * H); // 0 base, 1.. flake colour, 9 glare
  let flaked = 0;
  while (flaked < target * W * H) {
    const size = speck[0] + Math.floor(rand() * (speck[1] - speck[0] + 1));
    const x0 = Math.floor(rand() * (W - size));
    const y0 = Math.floor(rand() * (H - size));
    const colour = 1 + Math.floor(rand() * flakes.length);
    for (let y = y0; y < y0 + size; y++)
      for (let x = x0; x < x0 + size; x++) {
        if (label[y * W + x] === 0) flaked++;
        label[y * W + x] = colour;
      }
  }
  // Glare: a diagonal streak 5 px wide, blown out to white.
  for (let y = 0; y < H; y++) for (let x = 0; x < W; x++) if (Math.abs(x - 0.9 * y - 50) < 2.5) label[y * W + x] = 9;
  const raw = rawImage(W, H, (x, y) => {
    const l = label[y * W + x];
    if (l === 9) return [255, 255, 253];
    const c = l === 0 ? base : flakes[l - 1];
    return [c[0] + 2 * noise(), c[1] + 2 * noise(), c[2] + 2 * noise()];
  });
  const truth = (r: { x: number; y: number; w: number; h: number }) => {
    let n = 0, glare = 0;
    const perFlake = flakes.map(() => 0);
    const x0 = Math.ceil(r.x * W - 0.5), x1 = Math.ceil((r.x + r.w) * W - 0.5);
    const y0 = Math.ceil(r.y * H - 0.5), y1 = Math.ceil((r.y + r.h) * H - 0.5);
    for (let y = y0; y < y1; y++)
      for (let x = x0; x < x1; x++) {
        n++;
        const l = label[y * W + x];
        if (l === 9) glare++;
        else if (l > 0) perFlake[l - 1]++;
      }
    const flakeTotal = perFlake.reduce((s, v) => s + v, 0);
    return { n, glare: glare / n, coverage: flakeTotal / n, shares: perFlake.map((v) => v / flakeTotal) };
  };
  return { raw, W, H, truth };
}

describe('measurePhoto: flake and glare', () => {
  const base: Rgb = [70, 125, 80];
  const gold: Rgb = [215, 170, 45];
  const black: Rgb = [22, 20, 24];

  it.each([0.05, 0.1, 0.15])('PNG with %f flake: base within ΔE00 1.5, coverage within ±0.03, both flake colours found', async (target) => {
    const { raw, W, H, truth } = flakedPatch(Math.round(target * 1000), base, [gold, black], target);
    const png = await encode(raw, W, H, 'png');
    const out = await measurePhoto(png, [{ name: 'back', shape: whole }]);
    const m = out.regions[0];
    const t = truth(whole);
    expect(m.pixels).toBe(t.n);
    expect(deltaE2000(m.lab, srgbToLab(...base))).toBeLessThanOrEqual(1.5);
    expect(Math.abs(m.flake.coverage - t.coverage)).toBeLessThanOrEqual(0.03);
    expect(Math.abs(m.glare - t.glare)).toBeLessThanOrEqual(0.01);
    expect(m.flake.groups).toHaveLength(2);
    const goldGroup = m.flake.groups.find((g) => deltaE2000(g.lab, srgbToLab(...gold)) < 3);
    const blackGroup = m.flake.groups.find((g) => deltaE2000(g.lab, srgbToLab(...black)) < 3);
    expect(goldGroup).toBeDefined();
    expect(blackGroup).toBeDefined();
    expect(Math.abs(goldGroup!.share - t.shares[0])).toBeLessThanOrEqual(0.05);
    expect(m.spread).toBeLessThan(2);
  });

  it('JPEG q90 with 10 % flake in 4–8 px specks: base within ΔE00 1.5, coverage within ±0.03, two groups', async () => {
    const { raw, W, H, truth } = flakedPatch(42, base, [gold, black], 0.1, [4, 8], 480, 360);
    const jpg = await encode(raw, W, H, 'jpeg', 90);
    const m = (await measurePhoto(jpg, [{ name: 'back', shape: whole }])).regions[0];
    expect(deltaE2000(m.lab, srgbToLab(...base))).toBeLessThanOrEqual(1.5);
    expect(Math.abs(m.flake.coverage - truth(whole).coverage)).toBeLessThanOrEqual(0.03);
    // JPEG's 4:2:0 chroma blocks tint small dark specks with the base's green, so the black
    // flake group is only checked for lightness here.
    expect(m.flake.groups).toHaveLength(2);
    expect(m.flake.groups.some((g) => deltaE2000(g.lab, srgbToLab(...gold)) < 8)).toBe(true);
    expect(m.flake.groups.some((g) => g.lab.l < 15)).toBe(true);
  });
});

describe('measurePhoto: regions', () => {
  it('throws empty_region for a shape that covers no pixel centre', async () => {
    const png = await encode(rawImage(10, 10, () => [90, 90, 90]), 10, 10, 'png');
    const err = await measurePhoto(png, [{ name: 'tail', shape: { type: 'rect', x: 0.01, y: 0.01, w: 0.02, h: 0.02 } }]).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(ImageError);
    expect((err as ImageError).kind).toBe('empty_region');
    expect((err as ImageError).message).toMatch(/tail/);
  });

  it('a pale bait with a glare streak keeps its base; glare is not mistaken for the colour', async () => {
    const noise = gauss(rng(5));
    const pearl: Rgb = [232, 228, 218];
    const raw = rawImage(160, 120, (x, y) => (Math.abs(x - y - 20) < 4 ? [255, 255, 255] : pearl.map((v) => v + 1.5 * noise()) as Rgb));
    const m = (await measurePhoto(await encode(raw, 160, 120, 'png'), [{ name: 'belly', shape: whole }])).regions[0];
    expect(deltaE2000(m.lab, srgbToLab(...pearl))).toBeLessThanOrEqual(1.0);
    expect(m.glare).toBeGreaterThan(0.03);
  });

  it('a plain mean would be wrong: flake pulls it off, the robust base does not', async () => {
    const raw = rawImage(100, 100, (x, y) => ((x * 7 + y * 13) % 10 < 2 ? [20, 20, 20] : [180, 60, 60]));
    const m = (await measurePhoto(await encode(raw, 100, 100, 'png'), [{ name: 'back', shape: { type: 'rect', x: 0, y: 0, w: 1, h: 1 } }])).regions[0];
    const base: Lab = srgbToLab(180, 60, 60);
    expect(deltaE2000(m.lab, base)).toBeLessThan(0.01);
    expect(m.flake.coverage).toBeCloseTo(0.2, 2);
  });
});
