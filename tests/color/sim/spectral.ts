// A simulated colorant system for the next-pour tests: spectral Kubelka–Munk physics, seen
// under D65 by the CIE 1931 2° observer. Everything here is the test's ground truth; the app's
// model never sees it, only the colours it produces.
import type { Lab } from '@/lib/color';

export const WAVELENGTHS = Array.from({ length: 31 }, (_, i) => 400 + 10 * i);

// CIE 1931 2° colour-matching functions by the multi-lobe piecewise-Gaussian fit of Wyman, Sloan
// & Shirley (2013), "Simple analytic approximations to the CIE XYZ color matching functions",
// JCGT 2(2), eq. 2 and Table 1.
const g = (x: number, mu: number, s1: number, s2: number) => Math.exp(-0.5 * ((x - mu) / (x < mu ? s1 : s2)) ** 2);
export function cmf(l: number): [number, number, number] {
  return [
    1.056 * g(l, 599.8, 37.9, 31.0) + 0.362 * g(l, 442.0, 16.0, 26.7) - 0.065 * g(l, 501.1, 20.4, 26.2),
    0.821 * g(l, 568.8, 46.9, 40.5) + 0.286 * g(l, 530.9, 16.3, 31.1),
    1.217 * g(l, 437.0, 11.8, 36.0) + 0.681 * g(l, 459.0, 26.0, 13.8),
  ];
}

// CIE standard illuminant D65, relative spectral power at 10 nm from 400 to 700 nm (CIE 15:2004
// Table T.1; values from memory, rounded to 0.1). Small slips here only tint the simulated light;
// colours are computed relative to the perfect reflector under this same table.
export const D65_SPD = [
  82.8, 91.5, 93.4, 86.7, 104.9, 117.0, 117.8, 114.9, 115.9, 108.8, 109.4, 107.8, 104.8, 107.7, 104.4, 104.0,
  100.0, 96.3, 95.8, 88.7, 90.0, 89.6, 87.7, 83.3, 83.7, 80.0, 80.2, 82.3, 78.3, 69.7, 71.6,
];

function xyz(r: number[]): [number, number, number] {
  const out: [number, number, number] = [0, 0, 0];
  WAVELENGTHS.forEach((l, i) => {
    const c = cmf(l);
    for (let k = 0; k < 3; k++) out[k] += r[i]! * D65_SPD[i]! * c[k]!;
  });
  return out;
}

const WHITE = xyz(WAVELENGTHS.map(() => 1));

// CIELAB of a reflectance spectrum (CIE 15:2004 §7.1 tristimulus sums, §8.2.1 CIELAB), relative
// to the perfect reflector under the same light.
export function spectrumToLab(r: number[]): Lab {
  const t = xyz(r);
  const f = (v: number) => (v > 216 / 24389 ? Math.cbrt(v) : ((24389 / 27) * v + 16) / 116);
  const [fx, fy, fz] = t.map((v, k) => f(v / WHITE[k]!)) as [number, number, number];
  return { l: 116 * fy - 16, a: 500 * (fx - fy), b: 200 * (fy - fz) };
}

export interface SimColorant {
  name: string;
  kind: 'base' | 'pigment' | 'pearl';
  unit: 'drops' | 'tsp';
  /** Absorption and scattering per unit dose per cup, at each of WAVELENGTHS. */
  k: number[];
  s: number[];
}

/** A bell-shaped absorption band (invented curves, the simulation's truth). */
export const band = (centre: number, width: number, height: number) => (l: number) => height * Math.exp(-0.5 * ((l - centre) / width) ** 2);
export const curve = (...parts: ((l: number) => number)[]) => WAVELENGTHS.map((l) => parts.reduce((s, p) => s + p(l), 0));

// Duncan (1940) mixing of K and S, the base a component of unit amount, then the reflectance
// of an opaque layer (Kubelka & Munk 1931): R∞ = 1 + K/S − √((K/S)² + 2 K/S).
export function mixSpectrum(base: SimColorant, colorants: SimColorant[], doses: number[]): number[] {
  return WAVELENGTHS.map((_, i) => {
    let k = base.k[i]!;
    let s = base.s[i]!;
    colorants.forEach((c, j) => {
      k += doses[j]! * c.k[i]!;
      s += doses[j]! * c.s[i]!;
    });
    const x = k / s;
    return 1 + x - Math.sqrt(x * x + 2 * x);
  });
}
