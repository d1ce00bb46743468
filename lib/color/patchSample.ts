import type { PixelWindow } from './types';

/** Side of a patch, px: two 4:2:0 MCUs (ITU-T T.81), room for the smear of a speck's chroma. Ours. */
export const PATCH_PX = 32;
/** Empty cells between patches in the compact window, so neighbourhood steps do not reach across. */
const GAP = 8;

/**
 * Square patches of every pixel spread evenly over a region, copied side by side (GAP apart) into
 * a compact window, with the region's spans mapped into it: about `pixels` pixels in all. A
 * lattice sees one pixel in every few, too few to see a speck beside it; a patch sees each pixel's
 * neighbours, which the steps that model JPEG's chroma smear need (smearedFlake). Positions in
 * the compact window keep the patches' order, so a smooth fall-off across the region is still a
 * smooth one across the patches. Null when the region is small enough to measure whole.
 */
export function patchSample(window: PixelWindow, spans: Int32Array, pixels: number): { window: PixelWindow; spans: Int32Array } | null {
  let n = 0, y0 = Infinity, y1 = -Infinity, x0 = Infinity, x1 = -Infinity;
  const rows = new Map<number, number[]>();
  for (let s = 0; s < spans.length; s += 3) {
    const y = spans[s], a = spans[s + 1], b = spans[s + 2];
    n += b - a;
    y0 = Math.min(y0, y); y1 = Math.max(y1, y + 1);
    x0 = Math.min(x0, a); x1 = Math.max(x1, b);
    const row = rows.get(y);
    if (row) row.push(a, b); else rows.set(y, [a, b]);
  }
  if (n <= pixels) return null;
  const bw = x1 - x0, bh = y1 - y0;
  // Patches on a grid over the bounding box, enough that those inside the region hold `pixels`.
  const want = (pixels / (PATCH_PX * PATCH_PX)) * ((bw * bh) / n);
  const nx = Math.max(1, Math.min(Math.floor(bw / PATCH_PX), Math.round(Math.sqrt((want * bw) / bh))));
  const ny = Math.max(1, Math.min(Math.floor(bh / PATCH_PX), Math.round(want / nx)));
  const cellPx = PATCH_PX + GAP;
  const width = nx * cellPx, height = ny * cellPx;
  const data = new Uint8Array(width * height * 3);
  const out: number[] = [];
  for (let j = 0; j < ny; j++) {
    const py = y0 + Math.round(((j + 0.5) * bh) / ny - PATCH_PX / 2);
    for (let r = 0; r < PATCH_PX; r++) {
      const y = py + r;
      const row = rows.get(y);
      if (!row) continue;
      for (let i = 0; i < nx; i++) {
        const px = x0 + Math.round(((i + 0.5) * bw) / nx - PATCH_PX / 2);
        for (let k = 0; k < row.length; k += 2) {
          const a = Math.max(row[k], px), b = Math.min(row[k + 1], px + PATCH_PX);
          if (a >= b) continue;
          const cy = j * cellPx + r, ca = i * cellPx + (a - px);
          out.push(cy, ca, ca + (b - a));
          const src = ((y - window.top) * window.width + (a - window.left)) * 3;
          data.set(window.data.subarray(src, src + (b - a) * 3), (cy * width + ca) * 3);
        }
      }
    }
  }
  return { window: { data, left: 0, top: 0, width, height }, spans: Int32Array.from(out) };
}
