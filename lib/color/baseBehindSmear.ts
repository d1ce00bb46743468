import type { Vec3 } from './types';
import type { LumaChroma } from './lumaChroma';
import { yccToLinear } from './yccToLinear';

/** Candidate widths (Gaussian σ, px) of the smear JPEG leaves on chroma (the best fit is taken). */
const SMEARS = [0.9, 1.3, 1.8, 2.5];
/** Luma offsets within this many noise σ of the base's count as none (ours). */
const SHRINK = 1.5;
/** Kernel bandwidth of the local fit, as a share of the flake's luma contrast (99th percentile of |x|; ours). */
const LOCAL = 0.3;

export interface SmearInput {
  /** Every pixel's Y'CbCr (lumaChroma; NaN where not usable: glare and the second colour). */
  ycc: LumaChroma;
  /** Grid cell of each pixel (row-major, gridW wide): every pixel, no lattice. */
  cell: Int32Array;
  gridW: number;
  gridH: number;
  /** 1 for the truly base pixels (trulyBase): their luma is the base's luma. */
  base: Uint8Array;
}

export interface SmearBase {
  /** The base as JPEG stores it: luma and chroma (lumaChroma's scale). */
  y: number;
  cb: number;
  cr: number;
  /** The base in the photo's linear RGB. */
  rgb: Vec3;
  /** The intercepts' standard error (Cb and Cr, each; lumaChroma's scale). */
  se: number;
  /** The luma noise σ of the truly base pixels. */
  noise: number;
  /** The smear width that fitted best (σ, px). */
  smear: number;
}

/**
 * The base colour of a flaked region whose chroma was subsampled and smeared (JPEG 4:2:0, ITU-T
 * T.81: chroma averaged over 2×2 blocks, then quantised in 8×8 blocks of those), using the luma,
 * which JPEG keeps at full resolution. Each pixel's luma less the base's, x, follows its flake
 * share; its chroma before the smear was the base's plus a smooth function of x, k1·x + k2·x²
 * (the mixture's path, curved by the encoding); the smear is modelled as a Gaussian blur h of
 * width σ, so chroma = base + k1·(h∗x) + k2·(h∗x²): linear in the unknowns, fitted by weighted
 * least squares for each σ in SMEARS (normalised convolution over the usable pixels, H. Knutsson
 * & C.-F. Westin, CVPR 1993), keeping the σ with the least residual. Offsets within SHRINK noise
 * σ of the base count as none (soft threshold, D. L. Donoho, IEEE Trans. Inf. Theory 41(3),
 * 1995), so the base's own noise, which moves luma and chroma together, does not tilt the fit;
 * pixels weigh by a Gaussian of their smeared offset (bandwidth LOCAL of the flake's contrast),
 * a local fit (W. S. Cleveland, JASA 74, 1979), so the path's far bends (a channel clipping in a
 * speck's core) do not pull the intercept. The intercept is the base's chroma where no flake
 * reaches, free of the tint the smear leaves on pixels near a speck; its luma is read from the
 * truly base pixels. Null when fewer than 200 pixels take part or every fit is singular.
 */
export function baseBehindSmear({ ycc, cell, gridW, gridH, base }: SmearInput): SmearBase | null {
  const { y, cb, cr } = ycc;
  const n = y.length;
  const N = gridW * gridH;
  const x = new Float64Array(N), x2 = new Float64Array(N), m = new Float64Array(N);
  let yb = 0, nb = 0, used = 0;
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(y[i])) continue;
    used++;
    if (base[i]) {
      yb += y[i];
      nb++;
    }
  }
  if (nb < 2 || used < 200) return null;
  yb /= nb;
  let vb = 0;
  for (let i = 0; i < n; i++) if (base[i] && !Number.isNaN(y[i])) vb += (y[i] - yb) ** 2;
  const noise = Math.sqrt(vb / (nb - 1));
  const cut = SHRINK * noise;
  const absX: number[] = [];
  for (let i = 0; i < n; i++) {
    if (Number.isNaN(y[i])) continue;
    const raw = y[i] - yb;
    const d = Math.sign(raw) * Math.max(0, Math.abs(raw) - cut);
    x[cell[i]] = d;
    x2[cell[i]] = d * d;
    m[cell[i]] = 1;
    absX.push(Math.abs(raw));
  }
  absX.sort((a, b) => a - b);
  const bw = Math.max(1e-3, LOCAL * absX[Math.floor(0.99 * (absX.length - 1))]);
  let best: {
    rss: number; sigma: number; coef: [Float64Array, Float64Array]; inv: Float64Array; weight: number;
    A: Float64Array; bCb: Float64Array; bCr: Float64Array; sCb: number; sCr: number;
  } | null = null;
  const fitAt = (sigma: number) => {
    const hm = blur(m, gridW, gridH, sigma), hx = blur(x, gridW, gridH, sigma), hx2 = blur(x2, gridW, gridH, sigma);
    // Normal equations for [1, u1, u2] against Cb and Cr.
    const A = new Float64Array(9), bCb = new Float64Array(3), bCr = new Float64Array(3);
    let sCb = 0, sCr = 0, weight = 0;
    for (let i = 0; i < n; i++) {
      if (Number.isNaN(y[i])) continue;
      const c = cell[i], w = hm[c];
      if (!(w > 0)) continue;
      const u = [1, hx[c] / w, hx2[c] / w];
      const k = Math.exp(-0.5 * (u[1] / bw) ** 2);
      weight += k;
      for (let p = 0; p < 3; p++) {
        for (let q = 0; q < 3; q++) A[p * 3 + q] += k * u[p] * u[q];
        bCb[p] += k * u[p] * cb[i];
        bCr[p] += k * u[p] * cr[i];
      }
      sCb += k * cb[i] * cb[i];
      sCr += k * cr[i] * cr[i];
    }
    const inv = invert3(A);
    if (!inv) return null;
    const kCb = mul3(inv, bCb), kCr = mul3(inv, bCr);
    const rss = sCb - dot(kCb, bCb) + (sCr - dot(kCr, bCr));
    return { rss, sigma, coef: [kCb, kCr] as [Float64Array, Float64Array], inv, weight, A, bCb, bCr, sCb, sCr };
  };
  const tried = SMEARS.map((sigma) => ({ sigma, fit: fitAt(sigma) }));
  // Refine σ: a parabola in log σ through the best coarse fit and its neighbours (rss), fitted once more at its vertex.
  const at = tried.reduce((k, t, j) => (t.fit && (!tried[k].fit || t.fit.rss < tried[k].fit!.rss) ? j : k), 0);
  if (at > 0 && at < tried.length - 1 && tried[at - 1].fit && tried[at].fit && tried[at + 1].fit) {
    const [x0, x1, x2] = [at - 1, at, at + 1].map((j) => Math.log(tried[j].sigma));
    const [y0, y1, y2] = [at - 1, at, at + 1].map((j) => tried[j].fit!.rss);
    const den = (x0 - x1) * (x0 - x2) * (x1 - x2);
    const A2 = (x2 * (y1 - y0) + x1 * (y0 - y2) + x0 * (y2 - y1)) / den;
    const B2 = (x2 * x2 * (y0 - y1) + x1 * x1 * (y2 - y0) + x0 * x0 * (y1 - y2)) / den;
    if (A2 > 0) {
      const sigma = Math.exp(Math.min(x2, Math.max(x0, -B2 / (2 * A2))));
      tried.push({ sigma, fit: fitAt(sigma) });
    }
  }
  for (const t of tried) if (t.fit && (!best || t.fit.rss < best.rss)) best = t.fit;
  if (!best) return null;
  // The straight path (k2 = 0) unless the bend earns its place (BIC, G. Schwarz, Ann. Stat. 6(2),
  // 1978: two more parameters, one per chroma channel): a nearly straight path leaves k2 and the
  // intercept trading off against each other.
  const { A, weight } = best;
  const det2 = A[0] * A[4] - A[1] * A[1];
  let cb0 = best.coef[0][0], cr0 = best.coef[1][0], rss = best.rss, v00 = best.inv[0], params = 3;
  if (det2 > 0) {
    const line = (b: Float64Array) => [(A[4] * b[0] - A[1] * b[1]) / det2, (A[0] * b[1] - A[1] * b[0]) / det2];
    const lCb = line(best.bCb), lCr = line(best.bCr);
    const rssLine = best.sCb - (lCb[0] * best.bCb[0] + lCb[1] * best.bCb[1]) + (best.sCr - (lCr[0] * best.bCr[0] + lCr[1] * best.bCr[1]));
    if (!(weight * Math.log(rssLine / best.rss) > 2 * Math.log(weight))) {
      cb0 = lCb[0];
      cr0 = lCr[0];
      rss = rssLine;
      v00 = A[4] / det2;
      params = 2;
    }
  }
  // σ² per chroma channel from the weighted residuals; the intercept's variance σ²·(AᵀWA)⁻¹₀₀.
  const se = Math.sqrt((rss / 2 / Math.max(1, weight - params)) * v00);
  return { y: yb, cb: cb0, cr: cr0, rgb: yccToLinear(yb, cb0, cr0), se, noise, smear: best.sigma };
}

const dot = (a: Float64Array, b: Float64Array) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const mul3 = (m: Float64Array, v: Float64Array) => Float64Array.from([0, 1, 2], (r) => m[r * 3] * v[0] + m[r * 3 + 1] * v[1] + m[r * 3 + 2] * v[2]);

/** The inverse of a symmetric 3×3 matrix (row-major), or null when it is singular. */
function invert3(a: Float64Array): Float64Array | null {
  const [p, q, r, , s, t, , , u] = a;
  const c00 = s * u - t * t, c01 = r * t - q * u, c02 = q * t - r * s;
  const det = p * c00 + q * c01 + r * c02;
  if (!(Math.abs(det) > 1e-12 * Math.abs(p * s * u))) return null;
  const c11 = p * u - r * r, c12 = q * r - p * t, c22 = p * s - q * q;
  return Float64Array.from([c00, c01, c02, c01, c11, c12, c02, c12, c22], (v) => v / det);
}

/** Separable Gaussian blur of a grid (σ in cells, cut at 2.5 σ), zero beyond the edges. */
function blur(src: Float64Array, w: number, h: number, sigma: number): Float64Array {
  const r = Math.ceil(2.5 * sigma);
  const k = Array.from({ length: 2 * r + 1 }, (_, i) => Math.exp(-0.5 * ((i - r) / sigma) ** 2));
  // One pass along x (step 1, length w) or y (step w, length h).
  const pass = (from: Float64Array, along: 'x' | 'y') => {
    const to = new Float64Array(from.length);
    const [len, stride] = along === 'x' ? [w, 1] : [h, w];
    for (let yy = 0; yy < h; yy++)
      for (let xx = 0; xx < w; xx++) {
        const at = along === 'x' ? xx : yy;
        let s = 0;
        for (let j = Math.max(-r, -at); j <= Math.min(r, len - 1 - at); j++) s += k[j + r] * from[yy * w + xx + j * stride];
        to[yy * w + xx] = s;
      }
    return to;
  };
  return pass(pass(src, 'x'), 'y');
}
