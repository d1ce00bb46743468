import 'server-only';
import sharp, { type Metadata } from 'sharp';
import { ImageError } from './imageError';

import { HEIC_MESSAGE, MAX_IMAGE_BYTES, MAX_IMAGE_PIXELS } from './limits';

export { MAX_IMAGE_BYTES, MAX_IMAGE_PIXELS };
export type ImageFormat = 'jpeg' | 'png' | 'webp';

export interface ImageHeader {
  format: ImageFormat;
  /** Size of the image as displayed (EXIF orientation applied). */
  width: number;
  height: number;
  /** The embedded ICC profile, if any. */
  icc?: Buffer;
  /** JPEG only: chroma subsampling from the frame header's sampling factors (sharp), e.g. '4:2:0'. */
  chromaSubsampling?: string;
}

const TYPE_MESSAGE = "This file isn't a JPEG, PNG or WebP image we can read. Upload a JPEG, PNG or WebP photo.";

// ISO/IEC 23008-12 (HEIF) files start with an ISO BMFF 'ftyp' box whose brands name the codec.
const HEVC_BRANDS = new Set(['heic', 'heix', 'hevc', 'hevx', 'heim', 'heis', 'hevm', 'hevs']);
const AVIF_BRANDS = new Set(['avif', 'avis']);
export function heifKind(buf: Buffer): 'heic' | 'avif' | 'heif' | null {
  if (buf.length < 16 || buf.toString('latin1', 4, 8) !== 'ftyp') return null;
  const boxSize = Math.min(buf.readUInt32BE(0), buf.length, 256);
  const brands = [buf.toString('latin1', 8, 12)];
  for (let o = 16; o + 4 <= boxSize; o += 4) brands.push(buf.toString('latin1', o, o + 4));
  if (brands.some((b) => HEVC_BRANDS.has(b))) return 'heic';
  if (brands.some((b) => AVIF_BRANDS.has(b))) return 'avif';
  return brands.some((b) => b === 'mif1' || b === 'msf1') ? 'heif' : null;
}

const mb = (bytes: number) => (bytes / (1024 * 1024)).toFixed(1);

/**
 * Checks an upload before any pixel is decoded: byte size, container type, and the pixel count
 * the header declares (against decompression bombs). Returns the format and displayed size.
 */
export async function inspectImage(buf: Buffer): Promise<ImageHeader> {
  if (buf.length === 0) throw new ImageError('unsupported_type', 'The file is empty. ' + TYPE_MESSAGE);
  if (buf.length > MAX_IMAGE_BYTES) {
    throw new ImageError(
      'too_large',
      `This photo is ${mb(buf.length)} MB; the limit is ${mb(MAX_IMAGE_BYTES)} MB. Export it as a JPEG at a smaller size — 12 megapixels is plenty for colour.`,
    );
  }
  const heif = heifKind(buf);
  if (heif === 'heic' || heif === 'heif') throw new ImageError('unsupported_type', HEIC_MESSAGE);
  if (heif === 'avif') throw new ImageError('unsupported_type', `AVIF images aren't accepted. ${TYPE_MESSAGE}`);

  let meta: Metadata;
  try {
    meta = await sharp(buf, { limitInputPixels: false }).metadata();
  } catch {
    throw new ImageError('unsupported_type', TYPE_MESSAGE);
  }
  if (meta.format === 'heif') throw new ImageError('unsupported_type', HEIC_MESSAGE);
  if (meta.format !== 'jpeg' && meta.format !== 'png' && meta.format !== 'webp') {
    throw new ImageError(
      'unsupported_type',
      `This file is ${String(meta.format).toUpperCase()}, not a JPEG, PNG or WebP photo. Upload a JPEG, PNG or WebP photo.`,
    );
  }
  const { width, height } = meta;
  if (!(width > 0 && height > 0)) throw new ImageError('unsupported_type', TYPE_MESSAGE);
  if (width * height > MAX_IMAGE_PIXELS) {
    throw new ImageError(
      'too_many_pixels',
      `This image is ${width} × ${height} pixels (${((width * height) / 1e6).toFixed(0)} megapixels); the limit is ${MAX_IMAGE_PIXELS / 1e6} megapixels. Resize it and upload again.`,
    );
  }
  const swap = (meta.orientation ?? 1) >= 5;
  return {
    format: meta.format,
    width: meta.autoOrient?.width ?? (swap ? height : width),
    height: meta.autoOrient?.height ?? (swap ? width : height),
    ...(meta.icc ? { icc: meta.icc } : {}),
    ...(meta.chromaSubsampling ? { chromaSubsampling: meta.chromaSubsampling } : {}),
  };
}
