import { measureRegion } from '@/lib/color/measureRegion';
import { regionPixels } from '@/lib/color/regionPixels';
import { SRGB_TO_XYZ } from '@/lib/color/rgbToXyzMatrix';
import { shapeSpans } from '@/lib/color/shapeSpans';
import type { Lab, Shape } from '@/lib/color/types';

/** At most about this many lattice points per region: a few milliseconds per preview. */
export const PREVIEW_POINTS = 12_000;

export type Preview = { lab: Lab; hex: string; pixels: number; other: { share: number; lab: Lab } | null };

/**
 * The server's own region measure (measureRegion: glare by shape, shading taken out, base, a
 * connected second colour, flake) run in the browser on a downscaled copy of the photo, so the
 * preview's colour and its "reaches into another colour" warning come from the same method as the
 * saved reading, only on fewer pixels: no grey card, no photo profile (the canvas is sRGB), and
 * specks finer than a preview pixel are averaged away. `rgba` is the canvas's ImageData.
 */
export function previewRegion(rgba: Uint8ClampedArray, width: number, height: number, shape: Shape): Preview | null {
  const spans = shapeSpans(shape, width, height);
  if (spans.length === 0) return null;
  let x0 = width, x1 = 0, y0 = height, y1 = 0, n = 0;
  for (let i = 0; i < spans.length; i += 3) {
    const y = spans[i]!, a = spans[i + 1]!, b = spans[i + 2]!;
    if (b <= a) continue;
    n += b - a;
    y0 = Math.min(y0, y); y1 = Math.max(y1, y + 1);
    x0 = Math.min(x0, a); x1 = Math.max(x1, b);
  }
  if (n === 0) return null;
  // The region's box as packed RGB, the pixel window regionPixels reads.
  const w = x1 - x0, h = y1 - y0;
  const data = new Uint8Array(w * h * 3);
  for (let y = 0; y < h; y++) {
    for (let x = 0, o = ((y + y0) * width + x0) * 4, j = y * w * 3; x < w; x++, o += 4, j += 3) {
      data[j] = rgba[o]!; data[j + 1] = rgba[o + 1]!; data[j + 2] = rgba[o + 2]!;
    }
  }
  const step = Math.max(1, Math.ceil(Math.sqrt(n / PREVIEW_POINTS)));
  let rp = regionPixels({ data, left: x0, top: y0, width: w, height: h }, spans, SRGB_TO_XYZ, step);
  if (rp.samples.total === 0) rp = regionPixels({ data, left: x0, top: y0, width: w, height: h }, spans, SRGB_TO_XYZ, 1);
  if (rp.samples.total === 0) return null;
  const m = measureRegion(rp);
  return { lab: m.lab, hex: m.hex, pixels: n, other: m.other ? { share: m.other.share, lab: m.other.lab } : null };
}
