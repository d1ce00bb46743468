import type { Mat3, Vec3 } from './types';
import { bradfordMatrix } from './bradfordMatrix';
import { invertMat3 } from './invertMat3';
import { multiplyMat3 } from './multiplyMat3';
import { D50, D65 } from './whitePoints';

/** An RGB matrix/TRC profile read from an ICC file: how to turn 8-bit device values into XYZ (D65). */
export interface RgbProfile {
  /** Per channel, 8-bit code value → linear light (0..1). */
  linear: [Float64Array, Float64Array, Float64Array];
  /** Linear device RGB → XYZ relative to D65 (Y of white = 1). */
  toXyz: Mat3;
}

const s15 = (buf: Uint8Array, o: number) => new DataView(buf.buffer, buf.byteOffset + o, 4).getInt32(0) / 65536;
const u16 = (buf: Uint8Array, o: number) => (buf[o] << 8) | buf[o + 1];
const u32 = (buf: Uint8Array, o: number) => new DataView(buf.buffer, buf.byteOffset + o, 4).getUint32(0);
const sig = (buf: Uint8Array, o: number) => String.fromCharCode(buf[o], buf[o + 1], buf[o + 2], buf[o + 3]);

/**
 * Reads a display-class RGB profile of the matrix/TRC kind (ICC.1:2010 §F.3: rXYZ, gXYZ, bXYZ
 * columns, rTRC, gTRC, bTRC curves; sRGB and Display P3 profiles are of this kind) and returns its
 * decoding tables and its linear RGB → XYZ (D65) matrix, or null for any other kind (LUT-based,
 * CMYK, grey), which the caller hands to a full colour-management engine instead.
 *
 * Curves: 'curv' (§10.6: identity, a gamma as u8Fixed8, or a table interpolated linearly) and
 * 'para' (§10.18, function types 0–4). Colorants are relative to the D50 PCS; the chromatic
 * adaptation tag 'chad' (§9.2.15, D65 → D50 for display profiles) is undone to return to D65, or
 * Bradford D50 → D65 (ICC.1:2010 Annex E.3) when the profile has none.
 */
export function parseIccProfile(icc: Uint8Array): RgbProfile | null {
  if (icc.length < 132 || sig(icc, 36) !== 'acsp' || sig(icc, 16) !== 'RGB ' || sig(icc, 20) !== 'XYZ ') return null;
  const count = u32(icc, 128);
  const tags = new Map<string, [number, number]>();
  for (let t = 0; t < count && 132 + 12 * t + 12 <= icc.length; t++) {
    const at = 132 + 12 * t;
    tags.set(sig(icc, at), [u32(icc, at + 4), u32(icc, at + 8)]);
  }
  const xyz = (name: string): Vec3 | null => {
    const tag = tags.get(name);
    if (!tag || tag[0] + 20 > icc.length || sig(icc, tag[0]) !== 'XYZ ') return null;
    return [s15(icc, tag[0] + 8), s15(icc, tag[0] + 12), s15(icc, tag[0] + 16)];
  };
  const r = xyz('rXYZ'), g = xyz('gXYZ'), b = xyz('bXYZ');
  const curves = ['rTRC', 'gTRC', 'bTRC'].map((n) => curve(icc, tags.get(n)));
  if (!r || !g || !b || curves.some((c) => !c)) return null;
  const pcs: Mat3 = [
    [r[0], g[0], b[0]],
    [r[1], g[1], b[1]],
    [r[2], g[2], b[2]],
  ];
  const chadTag = tags.get('chad');
  let toD65: Mat3;
  if (chadTag && chadTag[0] + 44 <= icc.length && sig(icc, chadTag[0]) === 'sf32') {
    const m = Array.from({ length: 9 }, (_, k) => s15(icc, chadTag[0] + 8 + 4 * k));
    toD65 = invertMat3([m.slice(0, 3), m.slice(3, 6), m.slice(6, 9)] as Mat3);
  } else {
    toD65 = bradfordMatrix(D50, D65);
  }
  const toXyz = multiplyMat3(toD65, pcs);
  if (!toXyz.flat().every(Number.isFinite)) return null;
  return { linear: curves as [Float64Array, Float64Array, Float64Array], toXyz };
}

function curve(icc: Uint8Array, tag: [number, number] | undefined): Float64Array | null {
  if (!tag || tag[0] + 12 > icc.length) return null;
  const o = tag[0];
  const out = new Float64Array(256);
  const type = sig(icc, o);
  if (type === 'curv') {
    const n = u32(icc, o + 8);
    if (o + 12 + 2 * n > icc.length) return null;
    if (n === 0) for (let i = 0; i < 256; i++) out[i] = i / 255;
    else if (n === 1) {
      const gamma = u16(icc, o + 12) / 256;
      for (let i = 0; i < 256; i++) out[i] = Math.pow(i / 255, gamma);
    } else {
      for (let i = 0; i < 256; i++) {
        const p = (i / 255) * (n - 1);
        const k = Math.min(n - 2, Math.floor(p));
        const f = p - k;
        out[i] = ((1 - f) * u16(icc, o + 12 + 2 * k) + f * u16(icc, o + 14 + 2 * k)) / 65535;
      }
    }
    return out;
  }
  if (type === 'para') {
    const fn = u16(icc, o + 8);
    const nParams = [1, 3, 4, 5, 7][fn];
    if (nParams === undefined || o + 12 + 4 * nParams > icc.length) return null;
    const [G, a = 1, b = 0, c = 0, d = 0, e = 0, f = 0] = Array.from({ length: nParams }, (_, k) => s15(icc, o + 12 + 4 * k));
    for (let i = 0; i < 256; i++) {
      const x = i / 255;
      let y: number;
      if (fn === 0) y = Math.pow(x, G);
      else if (fn === 1) y = x >= -b / a ? Math.pow(a * x + b, G) : 0;
      else if (fn === 2) y = x >= -b / a ? Math.pow(a * x + b, G) + c : c;
      else if (fn === 3) y = x >= d ? Math.pow(a * x + b, G) : c * x;
      else y = x >= d ? Math.pow(a * x + b, G) + e : c * x + f;
      out[i] = Math.max(0, y);
    }
    return out;
  }
  return null;
}
