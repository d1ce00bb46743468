/** Connected parts of a mask on a grid, with their size and bounding box. */
export interface Components {
  /** Component id + 1 per cell (0 = not in the mask). */
  labels: Int32Array;
  /** Per component: cell count, then bounding box min x, min y, max x, max y. */
  area: number[];
  box: [number, number, number, number][];
}

/**
 * Labels the 8-connected components of `mask` (1 = set) on a w × h grid by flood fill with an
 * explicit stack (each cell pushed once; linear in the grid size). Connected-component labelling
 * as in R. C. Gonzalez & R. E. Woods, Digital Image Processing, 4th ed., §9.5.3.
 */
export function labelComponents(mask: Uint8Array, w: number, h: number): Components {
  const labels = new Int32Array(w * h);
  const area: number[] = [];
  const box: [number, number, number, number][] = [];
  const stack = new Int32Array(w * h);
  for (let start = 0; start < w * h; start++) {
    if (!mask[start] || labels[start]) continue;
    const id = area.length + 1;
    let top = 0, n = 0;
    let x0 = w, y0 = h, x1 = -1, y1 = -1;
    stack[top++] = start;
    labels[start] = id;
    while (top > 0) {
      const c = stack[--top];
      const cx = c % w, cy = (c - cx) / w;
      n++;
      if (cx < x0) x0 = cx;
      if (cx > x1) x1 = cx;
      if (cy < y0) y0 = cy;
      if (cy > y1) y1 = cy;
      for (let dy = -1; dy <= 1; dy++) {
        const y = cy + dy;
        if (y < 0 || y >= h) continue;
        for (let dx = -1; dx <= 1; dx++) {
          const x = cx + dx;
          if (x < 0 || x >= w) continue;
          const k = y * w + x;
          if (mask[k] && !labels[k]) {
            labels[k] = id;
            stack[top++] = k;
          }
        }
      }
    }
    area.push(n);
    box.push([x0, y0, x1, y1]);
  }
  return { labels, area, box };
}
