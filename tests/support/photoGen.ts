// A realistic bait-photo generator for the colour tests. The scene is built in linear light
// (linear sRGB, unbounded so Display-P3 colours outside sRGB can be held), then the camera is
// imitated in the order light meets it: shading, glare, the light's cast, exposure, lens blur,
// Gaussian sensor noise, 8-bit encoding (IEC 61966-2-1 transfer function), JPEG 4:2:0 or PNG by
// sharp, and optionally Display P3 (pixels converted by matrix, the profile sharp ships attached).
// Truth is culori's `lab65` of the scene's own colours, so the engine is checked against an
// independent conversion.
import { converter } from 'culori';
import sharp from 'sharp';
import { gauss, rng } from '../color/synth';

export interface Lab { l: number; a: number; b: number }
export type Lin = [number, number, number];
type M3 = [Lin, Lin, Lin];

const toLrgb = converter('lrgb');
const toLab65 = converter('lab65');
export const labToLin = (c: Lab): Lin => {
  const v = toLrgb({ mode: 'lab65', l: c.l, a: c.a, b: c.b });
  return [v.r, v.g, v.b];
};
export const linToLab = (v: Lin): Lab => {
  const c = toLab65({ mode: 'lrgb', r: v[0], g: v[1], b: v[2] });
  return { l: c.l, a: c.a, b: c.b };
};

const mul = (m: M3, v: Lin): Lin => [0, 1, 2].map((i) => m[i][0] * v[0] + m[i][1] * v[1] + m[i][2] * v[2]) as Lin;
const mm = (a: M3, b: M3): M3 => [0, 1, 2].map((i) => [0, 1, 2].map((j) => a[i][0] * b[0][j] + a[i][1] * b[1][j] + a[i][2] * b[2][j])) as M3;
function inv(m: M3): M3 {
  const [[a, b, c], [d, e, f], [g, h, i]] = m;
  const det = a * (e * i - f * h) - b * (d * i - f * g) + c * (d * h - e * g);
  return [
    [(e * i - f * h) / det, (c * h - b * i) / det, (b * f - c * e) / det],
    [(f * g - d * i) / det, (a * i - c * g) / det, (c * d - a * f) / det],
    [(d * h - e * g) / det, (b * g - a * h) / det, (a * e - b * d) / det],
  ];
}
// Linear sRGB ↔ XYZ (IEC 61966-2-1 §5.2, eq. 7) and linear Display P3 (DCI-P3 primaries, D65
// white; SMPTE EG 432-1) ↔ XYZ, the matrices culori and CSS Color 4 §10 print.
const SRGB_XYZ: M3 = [[0.4123907992659595, 0.357584339383878, 0.1804807884018343], [0.21263900587151027, 0.715168678767756, 0.07219231536073371], [0.01933081871559182, 0.11919477979462598, 0.9505321522496607]];
const P3_XYZ: M3 = [[0.4865709486482162, 0.26566769316909306, 0.1982172852343625], [0.2289745640697488, 0.6917385218365064, 0.079286914093745], [0, 0.04511338185890264, 1.043944368900976]];
const SRGB_TO_P3 = mm(inv(P3_XYZ), SRGB_XYZ);
// Bradford cone matrix (Lam 1985; ICC.1:2010 Annex E.3), written out here so the test does not
// borrow the engine's own.
const BFD: M3 = [[0.8951, 0.2664, -0.1614], [-0.7502, 1.7135, 0.0367], [0.0389, -0.0685, 1.0296]];

/** Lights as CIE 1931 chromaticities (CIE 15:2004 Table T.8; shade ≈ D75; fluorescent F2 "cool white", F11 narrow-band). */
export const LIGHTS = {
  tungsten: [0.44757, 0.40745],
  shade: [0.29902, 0.31485],
  fluorescent: [0.37208, 0.37529],
  'green fluorescent': [0.38052, 0.37713],
} as const satisfies Record<string, [number, number]>;
export type Light = keyof typeof LIGHTS;
const D65xy = [0.3127, 0.329];
const xyToXyz = ([x, y]: readonly number[]): Lin => [x / y, 1, (1 - x - y) / y];

/**
 * The cast a light leaves on a camera balanced for D65, as a matrix on linear sRGB. 'channel':
 * per-channel gains in linear sRGB that turn white into the light's white (a camera's
 * white-balance error); 'bradford': the Bradford transform D65 → the light's white.
 */
export function castMatrix(light: Light, kind: 'channel' | 'bradford'): M3 {
  const w = xyToXyz(LIGHTS[light]);
  if (kind === 'channel') {
    const g = mul(inv(SRGB_XYZ), w);
    return [[g[0] / g[1], 0, 0], [0, 1, 0], [0, 0, g[2] / g[1]]];
  }
  const s = mul(BFD, xyToXyz(D65xy));
  const d = mul(BFD, w);
  const k: M3 = [[d[0] / s[0], 0, 0], [0, d[1] / s[1], 0], [0, 0, d[2] / s[2]]];
  return mm(inv(SRGB_XYZ), mm(inv(BFD), mm(k, mm(BFD, SRGB_XYZ))));
}

/** "Normal exposure" under a cast: the camera meters so that white under that light just does not clip. */
export function meteredExposure(light: Light, kind: 'channel' | 'bradford'): number {
  const w = mul(castMatrix(light, kind), [1, 1, 1]);
  return 1 / Math.max(...w);
}

export interface PhotoSpec {
  seed: number;
  width?: number;
  height?: number;
  /** The bait's base colour (D65 Lab). */
  base: Lab;
  /** Flake: colours (D65 Lab), area coverage of the body, speck sizes in px (squares). */
  flake?: { colours: Lab[]; coverage: number; sizes: [number, number]; sparkle?: number };
  /** Linear-light fall-off across the body: 1 ± amount (a tilt plus a curvature), mean 1 over the measured region. */
  shading?: number;
  /** Glare streaks: added white light (peak, linear), width in px, count. */
  glare?: { streaks: number; width: number; peak: number };
  /** A laminate line: rows from `at` down are the `other` colour; `bleed` px of soft transition. */
  laminate?: { other: Lab; at: number; bleed: number };
  cast?: { light: Light; kind: 'channel' | 'bradford' };
  exposure?: number;
  /** Lens blur σ in px. */
  blur?: number;
  /** Sensor noise: σ² = read² + shot·v in linear units. */
  noise?: { read: number; shot: number };
  format?: 'png' | 'jpeg75' | 'jpeg90';
  gamut?: 'srgb' | 'p3';
  /** A grey card of this L* in the lower right corner. */
  cardL?: number;
}

export interface PhotoTruth {
  file: Buffer;
  width: number;
  height: number;
  /** The measured region (pixel-aligned rect, normalised) and the card's rect. */
  region: { type: 'rect'; x: number; y: number; w: number; h: number };
  card: { type: 'rect'; x: number; y: number; w: number; h: number } | null;
  /** Base colour under the region's mean light (D65, culori lab65). */
  lab: Lab;
  coverage: number;
  glare: number;
  /** Share of the region that is the laminate's other colour. */
  other: number;
  /** L* range of the fall-off across the region's base (0 when unshaded). */
  shading: number;
}

/** Region rows/cols of the body; the card sits outside them. */
export function makePhoto(spec: PhotoSpec, regionBox?: { x0: number; y0: number; x1: number; y1: number }): Promise<PhotoTruth> {
  const W = spec.width ?? 200;
  const H = spec.height ?? 150;
  const rand = rng(spec.seed);
  const normal = gauss(rand);
  const box = regionBox ?? { x0: 20, y0: 20, x1: W - 60, y1: H - 20 };
  const cardBox = spec.cardL === undefined ? null : { x0: W - 50, y0: H - 50, x1: W - 10, y1: H - 10 };
  const N = W * H;
  const lin = new Float64Array(N * 3);
  const label = new Uint8Array(N); // 0 base, 1 flake, 2 other, 3 card, 4 surround
  const base = labToLin(spec.base);
  const surround: Lin = [0.08, 0.08, 0.09];
  for (let y = 0; y < H; y++)
    for (let x = 0; x < W; x++) {
      const i = y * W + x;
      let c: Lin = base;
      if (cardBox && x >= cardBox.x0 && x < cardBox.x1 && y >= cardBox.y0 && y < cardBox.y1) {
        const Y = labToLin({ l: spec.cardL!, a: 0, b: 0 })[1];
        c = [Y, Y, Y];
        label[i] = 3;
      } else if (x >= W - 55) {
        c = surround;
        label[i] = 4;
      } else if (spec.laminate) {
        const { other, at, bleed } = spec.laminate;
        const o = labToLin(other);
        // Bleed: a smooth (raised-cosine) blend over `bleed` px around the line.
        const t = bleed > 0 ? Math.min(1, Math.max(0, (y + 0.5 - at) / bleed + 0.5)) : y >= at ? 1 : 0;
        const s = 0.5 - 0.5 * Math.cos(Math.PI * t);
        c = [base[0] + s * (o[0] - base[0]), base[1] + s * (o[1] - base[1]), base[2] + s * (o[2] - base[2])];
        if (s >= 0.5) label[i] = 2;
      }
      lin.set(c, i * 3);
    }

  // Flake: squares on base pixels of the body until the coverage is reached (truth counted below).
  if (spec.flake && spec.flake.coverage > 0) {
    const { colours, coverage, sizes, sparkle = 0 } = spec.flake;
    const cols = colours.map(labToLin);
    let placed = 0;
    const bodyArea = (W - 55) * H;
    for (let guard = 0; placed < coverage * bodyArea && guard < 1e6; guard++) {
      const s = sizes[0] + Math.floor(rand() * (sizes[1] - sizes[0] + 1));
      const x0 = Math.floor(rand() * (W - 55 - s));
      const y0 = Math.floor(rand() * (H - s));
      const k = Math.floor(rand() * cols.length);
      const gain = 1 + sparkle * (rand() * 2 - 1);
      for (let y = y0; y < y0 + s; y++)
        for (let x = x0; x < x0 + s; x++) {
          const i = y * W + x;
          if (label[i] !== 0 && label[i] !== 1) continue;
          if (label[i] === 0) placed++;
          label[i] = 1;
          lin[i * 3] = cols[k][0] * gain;
          lin[i * 3 + 1] = cols[k][1] * gain;
          lin[i * 3 + 2] = cols[k][2] * gain;
        }
    }
  }

  // Shading over the body: s = 1 + A·u + 0.5·A·(v² − 1/3), u, v ∈ [−1, 1] across the region.
  const A = spec.shading ?? 0;
  const shadeAt = (x: number, y: number) => {
    const u = (2 * (x + 0.5 - box.x0)) / (box.x1 - box.x0) - 1;
    const v = (2 * (y + 0.5 - box.y0)) / (box.y1 - box.y0) - 1;
    return 1 + A * u + 0.5 * A * (v * v - 1 / 3);
  };
  // Glare: streaks of added white light with a Gaussian profile across them.
  const glareAdd = new Float64Array(N);
  if (spec.glare) {
    for (let k = 0; k < spec.glare.streaks; k++) {
      const angle = rand() * Math.PI;
      const cx = box.x0 + rand() * (box.x1 - box.x0);
      const cy = box.y0 + rand() * (box.y1 - box.y0);
      const len = 0.3 * (box.x1 - box.x0) + rand() * 0.3 * (box.x1 - box.x0);
      const nx = -Math.sin(angle), ny = Math.cos(angle);
      for (let y = 0; y < H; y++)
        for (let x = 0; x < W - 55; x++) {
          const dx = x + 0.5 - cx, dy = y + 0.5 - cy;
          const along = dx * Math.cos(angle) + dy * Math.sin(angle);
          if (Math.abs(along) > len / 2) continue;
          const across = dx * nx + dy * ny;
          glareAdd[y * W + x] += spec.glare.peak * Math.exp(-0.5 * (across / (spec.glare.width / 2.355)) ** 2);
        }
    }
  }
  for (let i = 0; i < N; i++) {
    if (label[i] >= 3) continue;
    const s = shadeAt(i % W, Math.floor(i / W));
    for (let c = 0; c < 3; c++) lin[i * 3 + c] = lin[i * 3 + c] * s + glareAdd[i];
  }

  // Truth over the region (pixel-aligned rect).
  let n = 0, flakeN = 0, glareN = 0, otherN = 0, shadeSum = 0, shadeN = 0, sMin = Infinity, sMax = -Infinity;
  for (let y = box.y0; y < box.y1; y++)
    for (let x = box.x0; x < box.x1; x++) {
      const i = y * W + x;
      n++;
      if (glareAdd[i] > 0.1) glareN++;
      else if (label[i] === 1) flakeN++;
      else if (label[i] === 2) otherN++;
      if (label[i] === 0) {
        const s = shadeAt(x, y);
        shadeSum += s;
        shadeN++;
        sMin = Math.min(sMin, s);
        sMax = Math.max(sMax, s);
      }
    }
  const meanShade = shadeN ? shadeSum / shadeN : 1;
  const lab = linToLab([base[0] * meanShade, base[1] * meanShade, base[2] * meanShade]);
  const shadingRange = shadeN && A > 0 ? linToLab([base[0] * sMax, base[1] * sMax, base[2] * sMax]).l - linToLab([base[0] * sMin, base[1] * sMin, base[2] * sMin]).l : 0;

  // Camera: cast, exposure, blur, noise, encoding.
  const cast = spec.cast ? castMatrix(spec.cast.light, spec.cast.kind) : null;
  const e = spec.exposure ?? 1;
  for (let i = 0; i < N; i++) {
    let v: Lin = [lin[i * 3], lin[i * 3 + 1], lin[i * 3 + 2]];
    if (cast) v = mul(cast, v);
    lin[i * 3] = v[0] * e;
    lin[i * 3 + 1] = v[1] * e;
    lin[i * 3 + 2] = v[2] * e;
  }
  if (spec.blur && spec.blur > 0) blurInPlace(lin, W, H, spec.blur);
  const noise = spec.noise ?? { read: 0.002, shot: 0.0003 };
  const out = Buffer.alloc(N * 3);
  for (let i = 0; i < N; i++) {
    let v: Lin = [lin[i * 3], lin[i * 3 + 1], lin[i * 3 + 2]];
    if (spec.gamut === 'p3') v = mul(SRGB_TO_P3, v);
    for (let c = 0; c < 3; c++) {
      const x = v[c] + Math.sqrt(noise.read ** 2 + noise.shot * Math.max(0, v[c])) * normal();
      out[i * 3 + c] = Math.round(255 * oetf(Math.min(1, Math.max(0, x))));
    }
  }
  return encodeFile(out, W, H, spec).then((file) => ({
    file,
    width: W,
    height: H,
    region: { type: 'rect' as const, x: box.x0 / W, y: box.y0 / H, w: (box.x1 - box.x0) / W, h: (box.y1 - box.y0) / H },
    card: cardBox && { type: 'rect' as const, x: (cardBox.x0 + 4) / W, y: (cardBox.y0 + 4) / H, w: (cardBox.x1 - cardBox.x0 - 8) / W, h: (cardBox.y1 - cardBox.y0 - 8) / H },
    lab,
    coverage: flakeN / n,
    glare: glareN / n,
    other: otherN / n,
    shading: shadingRange,
  }));
}

// IEC 61966-2-1 encoding (the same curve Display P3 uses).
const oetf = (v: number) => (v <= 0.0031308 ? 12.92 * v : 1.055 * Math.pow(v, 1 / 2.4) - 0.055);

function blurInPlace(img: Float64Array, W: number, H: number, sigma: number) {
  const r = Math.ceil(3 * sigma);
  const k = Array.from({ length: 2 * r + 1 }, (_, i) => Math.exp(-0.5 * ((i - r) / sigma) ** 2));
  const ks = k.reduce((s, v) => s + v, 0);
  const tmp = new Float64Array(img.length);
  for (const [dx, dy, src, dst] of [[1, 0, img, tmp], [0, 1, tmp, img]] as const)
    for (let y = 0; y < H; y++)
      for (let x = 0; x < W; x++)
        for (let c = 0; c < 3; c++) {
          let s = 0;
          for (let j = -r; j <= r; j++) {
            const xx = Math.min(W - 1, Math.max(0, x + j * dx));
            const yy = Math.min(H - 1, Math.max(0, y + j * dy));
            s += k[j + r] * src[(yy * W + xx) * 3 + c];
          }
          dst[(y * W + x) * 3 + c] = s / ks;
        }
}

let p3Icc: Promise<Buffer> | null = null;
/** The Display P3 profile sharp ships (withIccProfile('p3')), lifted from a 1-px image. */
export function displayP3Profile(): Promise<Buffer> {
  p3Icc ??= sharp({ create: { width: 1, height: 1, channels: 3, background: '#808080' } })
    .withIccProfile('p3')
    .png()
    .toBuffer()
    .then((b) => sharp(b).metadata())
    .then((m) => m.icc!);
  return p3Icc;
}

async function encodeFile(raw: Buffer, W: number, H: number, spec: PhotoSpec): Promise<Buffer> {
  const img = sharp(raw, { raw: { width: W, height: H, channels: 3 } });
  const fmt = spec.format ?? 'png';
  const file = fmt === 'png' ? await img.png().toBuffer() : await img.jpeg({ quality: fmt === 'jpeg75' ? 75 : 90, chromaSubsampling: '4:2:0' }).toBuffer();
  if (spec.gamut !== 'p3') return file;
  const icc = await displayP3Profile();
  return fmt === 'png' ? attachPngIcc(file, icc) : attachJpegIcc(file, icc);
}

// ICC.1:2010 Annex B.4: a profile in JPEG rides in APP2 segments tagged "ICC_PROFILE\0" with a
// sequence number and count; one segment holds up to 65519 bytes of it.
function attachJpegIcc(jpg: Buffer, icc: Buffer): Buffer {
  if (icc.length > 65519) throw new Error('profile too large for one APP2 segment');
  const head = Buffer.from('ICC_PROFILE\0', 'latin1');
  const seg = Buffer.alloc(4);
  seg[0] = 0xff;
  seg[1] = 0xe2;
  seg.writeUInt16BE(2 + head.length + 2 + icc.length, 2);
  return Buffer.concat([jpg.subarray(0, 2), seg, head, Buffer.from([1, 1]), icc, jpg.subarray(2)]);
}

async function attachPngIcc(png: Buffer, icc: Buffer): Promise<Buffer> {
  const { attachIcc } = await import('../color/synth');
  return attachIcc(png, icc, 'Display P3');
}

/** Scales a difference so that a second colour lies exactly `target` ΔE00 from `ref` (bisection). */
export function colourAtDistance(ref: Lab, dir: Lab, target: number, de: (a: Lab, b: Lab) => number): Lab {
  let lo = 0, hi = 1;
  const at = (t: number) => ({ l: ref.l + t * dir.l, a: ref.a + t * dir.a, b: ref.b + t * dir.b });
  while (de(ref, at(hi)) < target) hi *= 2;
  for (let k = 0; k < 60; k++) {
    const mid = (lo + hi) / 2;
    if (de(ref, at(mid)) < target) lo = mid;
    else hi = mid;
  }
  return at((lo + hi) / 2);
}
