/**
 * Binary erosion (op 'erode': a cell stays set only when every cell within Chebyshev distance r
 * is set) or dilation ('dilate': set when any is) with a (2r + 1)² square, done as two 1-D passes
 * with running counts (the square structuring element is separable; Gonzalez & Woods, Digital
 * Image Processing, 4th ed., §9.2). Cells outside the grid count as unset.
 */
export function boxMorphology(mask: Uint8Array, w: number, h: number, r: number, op: 'erode' | 'dilate'): Uint8Array {
  const need = op === 'erode' ? 2 * r + 1 : 1;
  const pass = (src: Uint8Array, along: 'x' | 'y'): Uint8Array => {
    const out = new Uint8Array(w * h);
    const [len, lines, stride, lineStride] = along === 'x' ? [w, h, 1, w] : [h, w, w, 1];
    for (let l = 0; l < lines; l++) {
      const base = l * lineStride;
      let count = 0;
      // Window [i − r, i + r].
      for (let i = 0; i < Math.min(r, len); i++) count += src[base + i * stride];
      for (let i = 0; i < len; i++) {
        if (i + r < len) count += src[base + (i + r) * stride];
        if (i - r - 1 >= 0) count -= src[base + (i - r - 1) * stride];
        out[base + i * stride] = count >= need ? 1 : 0;
      }
    }
    return out;
  };
  return pass(pass(mask, 'x'), 'y');
}
