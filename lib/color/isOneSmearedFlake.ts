import type { Vec3 } from './types';
import type { SmearBase } from './baseBehindSmear';
import { chromaOf } from './chromaOf';
import { lumaOf } from './lumaOf';

/** Bounds for a group to count as the one flake seen through the smear (ours). */
const LUMA_SPAN: [number, number] = [-0.2, 1.2];
const CHROMA_SPAN: [number, number] = [-0.3, 2];
const CHROMA_OFF = 0.35;
/** Chroma closer than this to the line counts as on it whatever the line's length (lumaChroma's scale, ≈ 3 codes). */
const CHROMA_SLACK = 3 / 255;

/**
 * Whether flake groups clustered in a subsampled photo (JPEG 4:2:0) are one flake colour as the
 * smear leaves it. The smear moves a speck's chroma onto its neighbours while each pixel keeps
 * its own luma (ITU-T T.81): a dark speck's core loses colour and the base around it gains it, so
 * one flake shows as a core group and a rim group with the base's lightness and the flake's hue.
 * Each group must then lie, in luma, between the base and the group farthest from it in luma
 * (LUMA_SPAN of that span), and in chroma near the line from the base through that group's
 * chroma (CHROMA_SPAN along it, at most CHROMA_OFF of its length or CHROMA_SLACK off it). A second
 * flake of another hue or the other side of the base's lightness fails. `flakes`: linear RGB.
 */
export function isOneSmearedFlake(base: SmearBase, flakes: Vec3[]): boolean {
  if (flakes.length < 2) return true;
  const offsets = flakes.map((f) => lumaOf(f) - base.y);
  const main = offsets.reduce((best, v, k) => (Math.abs(v) > Math.abs(offsets[best]) ? k : best), 0);
  const [mb, mr] = chromaOf(flakes[main]);
  const db = mb - base.cb, dr = mr - base.cr, dd = db * db + dr * dr;
  return flakes.every((f, k) => {
    if (k === main) return true;
    const al = offsets[main] ? offsets[k] / offsets[main] : 0;
    if (al < LUMA_SPAN[0] || al > LUMA_SPAN[1]) return false;
    const [gb, gr] = chromaOf(f);
    const vb = gb - base.cb, vr = gr - base.cr;
    const t = dd > 0 ? (vb * db + vr * dr) / dd : 0;
    const off = Math.hypot(vb - t * db, vr - t * dr);
    return off <= CHROMA_SLACK || (t >= CHROMA_SPAN[0] && t <= CHROMA_SPAN[1] && off <= CHROMA_OFF * Math.sqrt(dd));
  });
}
