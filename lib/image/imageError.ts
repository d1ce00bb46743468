import 'server-only';
export type ImageErrorKind =
  | 'too_large' // file over MAX_IMAGE_BYTES → 413
  | 'too_many_pixels' // header says more than MAX_IMAGE_PIXELS → 413
  | 'too_much_work' // the regions' outlines ask for more than MAX_MEASURE_WORK → 413
  | 'unsupported_type' // not a decodable JPEG, PNG or WebP (HEIC, SVG, text, truncated…) → 415
  | 'corrupt' // decoded, but the pixels came out inconsistent → 415
  | 'empty_region' // a region (or the neutral patch) covers no pixel centre → 422
  | 'unusable_neutral'; // the neutral patch is clipped or black → 422

/** HTTP status for each kind (API.md, "Colour"). */
export const IMAGE_ERROR_STATUS: Record<ImageErrorKind, number> = {
  too_large: 413,
  too_many_pixels: 413,
  too_much_work: 413,
  unsupported_type: 415,
  corrupt: 415,
  empty_region: 422,
  unusable_neutral: 422,
};

/** A photo we cannot measure, with a message written for the maker. */
export class ImageError extends Error {
  readonly kind: ImageErrorKind;
  constructor(kind: ImageErrorKind, message: string) {
    super(message);
    this.name = 'ImageError';
    this.kind = kind;
  }
  get status(): number {
    return IMAGE_ERROR_STATUS[this.kind];
  }
}
