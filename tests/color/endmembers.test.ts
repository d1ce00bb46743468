// Flake endmembers and unmixing on constructed pixels (linear XYZ), where the truth is known by
// construction: the linear mixing model (Keshava & Mustard, IEEE Signal Processing Magazine 19(1), 2002).
import { describe, expect, it } from 'vitest';
import { areaByLuma, flakeEndmembers, labInto, unmixCoverage, type Vec3 } from '@/lib/color';
import { rng } from './synth';

const lab = (x: Vec3) => {
  const o = new Float64Array(3);
  labInto(x[0], x[1], x[2], o, 0);
  return { l: o[0], a: o[1], b: o[2] };
};

describe('flakeEndmembers with sparkle', () => {
  it("finds silver's mean colour, not its brightest specks, when specks vary ±15 % in brightness", () => {
    const rand = rng(7);
    const base: Vec3 = [0.08, 0.085, 0.2]; // a dark blue
    const silver: Vec3 = [0.77, 0.81, 0.88]; // a bright neutral
    const px: Vec3[] = [];
    for (let i = 0; i < 4000; i++) {
      // Half the flake pixels pure, half blended into the base; every speck its own brightness.
      const gain = 0.85 + 0.3 * rand();
      const f = i % 2 ? 1 : rand();
      // Sensor noise, σ = 0.005 (linear).
      px.push([0, 1, 2].map((c) => f * gain * silver[c] + (1 - f) * base[c] + 0.005 * (rand() + rand() + rand() - 1.5) * 2) as Vec3);
    }
    const xyz = new Float32Array(px.flat());
    const fl = new Float64Array(px.flatMap((p) => Object.values(lab(p))));
    const idx = Int32Array.from(px.keys());
    const mean = px.reduce((s, p) => s.map((v, c) => v + p[c] / px.length) as Vec3, [0, 0, 0] as Vec3);
    const [end] = flakeEndmembers([lab(mean)], fl, idx, xyz, base);
    // The brightest 5 % would sit at gain ≈ 1.13; the pure pixels' mean is at gain 1.
    for (let c = 0; c < 3; c++) expect(Math.abs(end.xyz[c] / silver[c] - 1)).toBeLessThan(0.03);
  });
});

describe('unmixCoverage', () => {
  const base: Vec3 = [0.2, 0.2, 0.2];
  it('recovers two flake areas from their summed deviation exactly', () => {
    const black: Vec3 = [0.01, 0.01, 0.01], gold: Vec3 = [0.5, 0.4, 0.1];
    const sum = [0, 1, 2].map((c) => 120 * (black[c] - base[c]) + 80 * (gold[c] - base[c])) as Vec3;
    const [a, b] = unmixCoverage(sum, base, [black, gold]);
    expect(Math.abs(a - 120)).toBeLessThan(1e-9);
    expect(Math.abs(b - 80)).toBeLessThan(1e-9);
  });

  it('does not let a colour nearly opposite a flake cancel it into a large false area', () => {
    // Deviations from the base as one q75 JPEG of 20 % blue specks on a dark blue base showed them:
    // the blue flake, and the chroma overshoot a JPEG rings around it, pointing nearly the other way.
    const b: Vec3 = [0.088, 0.086, 0.217];
    const d0: Vec3 = [0.02457, 0.00472, 0.23396];
    const d1: Vec3 = [-0.00722, -0.01051, -0.09396];
    const dot = (x: number[], y: number[]) => x[0] * y[0] + x[1] * y[1] + x[2] * y[2];
    const unit = (x: number[]) => x.map((v) => v / Math.sqrt(dot(x, x)));
    const u = unit(d1.map((v, c) => v - (dot(d1, d0) / dot(d0, d0)) * d0[c]));
    const w = unit([d0[1] * d1[2] - d0[2] * d1[1], d0[2] * d1[0] - d0[0] * d1[2], d0[0] * d1[1] - d0[1] * d1[0]]);
    // 1540 px of flake, and a misfit that the overshoot explains only a tenth of.
    const sum = d0.map((v, c) => 1540 * v + Math.sqrt(179) * u[c] + Math.sqrt(2047) * w[c]) as Vec3;
    const areas = unmixCoverage(sum, b, [0, 1, 2].map((k) => [b[0] + [d0, d1][k % 2][0], b[1] + [d0, d1][k % 2][1], b[2] + [d0, d1][k % 2][2]]).slice(0, 2) as Vec3[]);
    expect(Math.abs(areas[0] - 1540)).toBeLessThan(1);
    expect(areas[1]).toBe(0);
  });
});

describe('areaByLuma', () => {
  it('recovers the area of partial pixels from luminance alone, whatever their chroma reads', () => {
    const rand = rng(11);
    const by = 0.2, fy = 0.01; // a mid base, black flake
    let dy = 0, area = 0;
    for (let i = 0; i < 5000; i++) {
      const a = rand() < 0.15 ? rand() : 0; // part-flake pixels
      area += a;
      dy += a * (fy - by) + (rand() - 0.5) * 0.004; // linear mixing in Y plus a little noise
    }
    const got = areaByLuma(dy, 5000, by, fy);
    expect(got).not.toBeNull();
    expect(Math.abs((got as number) - area) / 5000).toBeLessThan(0.002);
  });

  it('declines when flake and base have about the same lightness, or the answer is no mixture', () => {
    expect(areaByLuma(1, 1000, 0.2, 0.205)).toBeNull();
    expect(areaByLuma(50, 1000, 0.2, 0.01)).toBeNull(); // brighter overall than the base, yet black flake
  });
});
