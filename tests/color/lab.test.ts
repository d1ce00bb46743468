import Color from 'colorjs.io';
import { converter } from 'culori';
import { describe, expect, it } from 'vitest';
import { D65, regionPixels, shapeSpans, SRGB_TO_XYZ, srgbToLab, srgbToLinear, xyzToLab } from '@/lib/color';

const toLab65 = converter('lab65');

// IEC 61966-2-1:1999 §5.2, written out here independently of lib/color: the decoding curve,
// the 4-decimal matrix as printed (eq. 7), and the primaries' chromaticities (Table 1).
const iecDecode = (v: number) => (v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4);
const IEC_MATRIX = [
  [0.4124, 0.3576, 0.1805],
  [0.2126, 0.7152, 0.0722],
  [0.0193, 0.1192, 0.9505],
];
// CIE 15:2004 §8.2.1 CIELAB, with the D65 white from x = 0.3127, y = 0.3290.
const Xn = 0.3127 / 0.329;
const Zn = (1 - 0.3127 - 0.329) / 0.329;
const f = (t: number) => (t > (6 / 29) ** 3 ? Math.cbrt(t) : t / (3 * (6 / 29) ** 2) + 4 / 29);
const cieLab = ([X, Y, Z]: number[]) => ({ l: 116 * f(Y) - 16, a: 500 * (f(X / Xn) - f(Y)), b: 200 * (f(Y) - f(Z / Zn)) });
// XYZ of each primary at full drive = its chromaticity (x, y, 1−x−y) scaled so the three add up
// to the white: solve M·s = W with M's columns (x/y, 1, z/y) — SMPTE RP 177-1993 §3.3.
function primariesXyz() {
  const P = [
    [0.64, 0.33],
    [0.3, 0.6],
    [0.15, 0.06],
  ].map(([x, y]) => [x / y, 1, (1 - x - y) / y]);
  // Cramer's rule for s.
  const det = (m: number[][]) =>
    m[0][0] * (m[1][1] * m[2][2] - m[1][2] * m[2][1]) -
    m[0][1] * (m[1][0] * m[2][2] - m[1][2] * m[2][0]) +
    m[0][2] * (m[1][0] * m[2][1] - m[1][1] * m[2][0]);
  const M = [0, 1, 2].map((r) => [P[0][r], P[1][r], P[2][r]]);
  const W = [Xn, 1, Zn];
  const d = det(M);
  const s = [0, 1, 2].map((c) => det(M.map((row, r) => row.map((v, k) => (k === c ? W[r] : v)))) / d);
  return P.map((col, i) => col.map((v) => v * s[i]));
}

const near = (a: { l: number; a: number; b: number }, b: { l: number; a: number; b: number }, tol: number) => {
  expect(Math.abs(a.l - b.l)).toBeLessThan(tol);
  expect(Math.abs(a.a - b.a)).toBeLessThan(tol);
  expect(Math.abs(a.b - b.b)).toBeLessThan(tol);
};

describe('sRGB → CIELAB D65', () => {
  it('white is L* 100, a* = b* = 0; black is L* 0', () => {
    near(srgbToLab(255, 255, 255), { l: 100, a: 0, b: 0 }, 1e-9);
    near(srgbToLab(0, 0, 0), { l: 0, a: 0, b: 0 }, 1e-9);
  });

  it('our matrix rounds to the 4-decimal matrix printed in IEC 61966-2-1 §5.2', () => {
    for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) expect(Math.abs(SRGB_TO_XYZ[r][c] - IEC_MATRIX[r][c])).toBeLessThanOrEqual(5e-5 + 1e-12);
  });

  it('primaries match IEC 61966-2-1 primaries + CIE 15:2004 Lab computed in the test (1e-9)', () => {
    const xyz = primariesXyz();
    near(srgbToLab(255, 0, 0), cieLab(xyz[0]), 1e-9);
    near(srgbToLab(0, 255, 0), cieLab(xyz[1]), 1e-9);
    near(srgbToLab(0, 0, 255), cieLab(xyz[2]), 1e-9);
    // With the printed 4-decimal matrix instead, the rounding of the matrix moves Lab by < 0.05.
    const printed = (rgb: number[]) => cieLab(IEC_MATRIX.map((row) => row[0] * rgb[0] + row[1] * rgb[1] + row[2] * rgb[2]));
    near(srgbToLab(255, 0, 0), printed([1, 0, 0]), 0.05);
  });

  it('mid-tones follow the IEC 61966-2-1 decoding curve', () => {
    for (const v of [0, 5, 10, 11, 50, 118, 128, 200, 254, 255]) {
      expect(Math.abs(srgbToLinear(v / 255) - iecDecode(v / 255))).toBeLessThan(1e-15);
      const Y = iecDecode(v / 255);
      expect(Math.abs(srgbToLab(v, v, v).l - (116 * f(Y) - 16))).toBeLessThan(1e-9);
    }
  });

  it('agrees with colorjs.io lab-d65 (an independent library) within 1e-6', () => {
    for (const [r, g, b] of [
      [255, 0, 0],
      [0, 255, 0],
      [0, 0, 255],
      [86, 140, 92],
      [200, 110, 40],
      [12, 34, 56],
      [250, 250, 240],
    ]) {
      const [l, a, bb] = new Color('srgb', [r / 255, g / 255, b / 255]).to('lab-d65').coords as number[];
      near(srgbToLab(r, g, b), { l, a, b: bb }, 1e-6);
    }
  });

  it('the typed-array fast path agrees with culori lab65 within 1e-9 over a 17³ grid', () => {
    const steps = 17;
    const rgb = new Uint8Array(steps ** 3 * 3);
    let n = 0;
    for (let r = 0; r < steps; r++)
      for (let g = 0; g < steps; g++)
        for (let b = 0; b < steps; b++) rgb.set([Math.min(255, r * 16), Math.min(255, g * 16), Math.min(255, b * 16)], 3 * n++);
    // One row of pixels, read the way a region is (regionPixels: distinct colours, one conversion each).
    const { samples } = regionPixels({ data: rgb, left: 0, top: 0, width: n, height: 1 }, shapeSpans({ type: 'rect', x: 0, y: 0, w: 1, h: 1 }, n, 1));
    expect(samples.size).toBe(n);
    const lab = samples.lab;
    let worst = 0;
    for (let i = 0; i < samples.size; i++) {
      const c = toLab65({ mode: 'rgb', r: samples.rgb[3 * i] / 255, g: samples.rgb[3 * i + 1] / 255, b: samples.rgb[3 * i + 2] / 255 });
      worst = Math.max(worst, Math.abs(lab[3 * i] - c.l), Math.abs(lab[3 * i + 1] - c.a), Math.abs(lab[3 * i + 2] - c.b));
    }
    expect(worst).toBeLessThan(1e-9);
  });

  it('xyzToLab of the D65 white is (100, 0, 0)', () => {
    near(xyzToLab(D65), { l: 100, a: 0, b: 0 }, 1e-12);
  });
});
