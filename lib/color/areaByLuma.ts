/** The flake must differ from the base by at least this much L* for its area to be read from luminance alone (ours). */
export const LUMA_CONTRAST_MIN = 10;

const lstar = (y: number) => (y > 216 / 24389 ? 116 * Math.cbrt(y) - 16 : (24389 / 27) * y); // CIE 15:2004, Yn = 1

/**
 * The flake's area from luminance alone, for photos whose chroma is subsampled (JPEG 4:2:0:
 * ITU-T T.81 with the JFIF sampling factors, chroma kept at half the resolution both ways and
 * quantised more coarsely than luma). There a 1–3 px speck's luma stays in its own pixels while
 * its chroma is averaged over 2×2 blocks and spread over its neighbours, so unmixing all three
 * channels along the base→flake line misreads the partial pixels; luma is kept at full
 * resolution. By the linear mixing model in linear light (N. Keshava & J. F. Mustard, "Spectral
 * unmixing", IEEE Signal Processing Magazine 19(1), 2002), the summed deviation of luminance
 * `dySum` (Σ Y − by over `count` pixels) is area·(fy − by), with `by` the base's and `fy` the
 * flake's luminance (white = 1). Returns null when the flake's lightness is too close to the
 * base's (LUMA_CONTRAST_MIN) for Y to tell the area, or the answer is not a real mixture.
 */
export function areaByLuma(dySum: number, count: number, by: number, fy: number): number | null {
  if (!(Math.abs(lstar(fy) - lstar(by)) >= LUMA_CONTRAST_MIN)) return null;
  const area = dySum / (fy - by);
  return area >= 0 && area <= count ? area : null;
}
