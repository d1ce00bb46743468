import 'server-only';
import sharp from 'sharp';
import { ApiError } from '@/lib/http/api';
import { imageApiError } from '@/lib/http/imageApiError';
import { heifKind, ImageError, type ImageHeader, inspectImage } from '@/lib/image';
import { HEIC_MESSAGE, MAX_PHOTO_BYTES, MAX_PHOTO_PIXELS, PHOTO_FORMATS, type PhotoFormat, TOO_LARGE_MESSAGE, WRONG_TYPE_MESSAGE } from './limits';

export type InspectedPhoto = { format: PhotoFormat; mime: string; width: number; height: number };

// Magic numbers: JPEG SOI FF D8 FF (ITU-T T.81 / JFIF), PNG signature (ISO/IEC 15948 §5.2),
// WebP "RIFF....WEBP" (RFC 9649 §2). Only these reach sharp: an SVG or a PDF never gets parsed.
function sniff(buf: Buffer): PhotoFormat | null {
  if (buf.length >= 3 && buf[0] === 0xff && buf[1] === 0xd8 && buf[2] === 0xff) return 'jpeg';
  if (buf.length >= 8 && buf.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'png';
  if (buf.length >= 12 && buf.toString('latin1', 0, 4) === 'RIFF' && buf.toString('latin1', 8, 12) === 'WEBP') return 'webp';
  return null;
}

/**
 * Checks an uploaded file by its bytes, never its name or declared type: size, container
 * (JPEG, PNG or WebP), the pixel count its header declares (sharp's limitInputPixels, before
 * anything is decoded), then a small decode so a damaged file is refused now rather than at
 * measuring time. Width and height are of the image as displayed (EXIF orientation applied).
 */
export async function inspectPhoto(buf: Buffer): Promise<InspectedPhoto> {
  if (buf.length === 0) throw new ApiError(400, 'empty_file', `The file is empty (0 bytes). ${WRONG_TYPE_MESSAGE}`);
  if (buf.length > MAX_PHOTO_BYTES) throw new ApiError(413, 'too_large', TOO_LARGE_MESSAGE);
  const sniffed = sniff(buf);
  if (!sniffed) {
    if (heifKind(buf) === 'heic' || heifKind(buf) === 'heif') throw new ApiError(415, 'heic_unsupported', HEIC_MESSAGE);
    throw new ApiError(415, 'unsupported_type', `This file is not a JPEG, PNG or WebP image. ${WRONG_TYPE_MESSAGE}`);
  }
  // Size, container and declared pixel count from the header: the same checks
  // the measuring pipeline makes (lib/image/inspectImage.ts).
  let header: ImageHeader;
  try {
    header = await inspectImage(buf);
  } catch (err) {
    // The bytes start like a photo but the header does not read: a damaged file.
    if (err instanceof ImageError && err.kind === 'unsupported_type') {
      throw new ApiError(415, 'undecodable', `This ${sniffed.toUpperCase()} file could not be read; it may be damaged. Export it again and upload that.`);
    }
    throw imageApiError(err);
  }
  if (header.format !== sniffed) {
    throw new ApiError(415, 'unsupported_type', `This file is not a readable JPEG, PNG or WebP image. ${WRONG_TYPE_MESSAGE}`);
  }
  try {
    // failOn 'warning' (the default) refuses truncated data.
    await sharp(buf, { limitInputPixels: MAX_PHOTO_PIXELS }).resize(64, 64, { fit: 'inside' }).raw().toBuffer();
  } catch {
    throw new ApiError(415, 'undecodable', `This ${sniffed.toUpperCase()} file is cut short or damaged. Export it again and upload that.`);
  }
  return { format: sniffed, mime: PHOTO_FORMATS[sniffed].mime, width: header.width, height: header.height };
}
