import 'server-only';
// Server-side photo pipeline (sharp). Free of React and Next so tests and scripts can import it.
export { decodeImage, type DecodedImage, type DecodeOptions } from './decodeImage';
export { IMAGE_ERROR_STATUS, ImageError, type ImageErrorKind } from './imageError';
export { type ImageFormat, type ImageHeader, heifKind, inspectImage, MAX_IMAGE_BYTES, MAX_IMAGE_PIXELS } from './inspectImage';
export {
  DEFAULT_MAX_SAMPLES,
  type MeasureOptions,
  measurePhoto,
  type NeutralPatch,
  type PhotoMeasure,
  type PhotoRegion,
} from './measurePhoto';
export { assertWorkBudget, MAX_MEASURE_WORK } from './workBudget';
