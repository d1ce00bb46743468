// Photo limits and the HEIC advice, shared by the measuring pipeline, the
// upload checks and the browser's dropzone (no sharp import here).

/** 25 MiB: a full-size phone JPEG is well under; 12 megapixels is plenty for colour. */
export const MAX_IMAGE_BYTES = 25 * 1024 * 1024;
/** 40 megapixels, checked from the header before any pixel is decoded (decompression bombs). */
export const MAX_IMAGE_PIXELS = 40_000_000;

export const HEIC_MESSAGE =
  "HEIC photos can't be decoded here. Send a JPEG instead: on an iPhone, set Settings › Camera › " +
  'Formats to "Most Compatible" before shooting, or export the photo as JPEG when you share it ' +
  '(many phones offer "JPEG" or "Most compatible" in the share options); on Android, have the ' +
  'camera save JPEG.';
