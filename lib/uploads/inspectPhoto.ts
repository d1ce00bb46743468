import sharp, { type Metadata } from 'sharp';
import { ApiError } from '@/lib/http/api';
import { HEIC_MESSAGE, MAX_PHOTO_BYTES, MAX_PHOTO_PIXELS, PHOTO_FORMATS, type PhotoFormat, TOO_LARGE_MESSAGE, WRONG_TYPE_MESSAGE } from './limits';

export type InspectedPhoto = { format: PhotoFormat; mime: string; width: number; height: number };

const mp = (n: number) => (n / 1e6).toFixed(1);

// Magic numbers: JPEG SOI FF D8 FF (ITU-T T.81 / JFIF), PNG signature (ISO/IEC 15948 §5.2),
// WebP "RIFF....WEBP" (RFC 9649 §2). Only these reach sharp: an SVG or a PDF never gets parsed.
function sniff(buf: Buffer): PhotoFormat | null {
  if (buf.length >= 3 && buf[0] === 0xff && buf[1] === 0xd8 && buf[2] === 0xff) return 'jpeg';
  if (buf.length >= 8 && buf.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]))) return 'png';
  if (buf.length >= 12 && buf.toString('latin1', 0, 4) === 'RIFF' && buf.toString('latin1', 8, 12) === 'WEBP') return 'webp';
  return null;
}

// HEIF (ISO/IEC 23008-12) starts with an ISO BMFF 'ftyp' box naming its brands.
function looksLikeHeic(buf: Buffer): boolean {
  if (buf.length < 12 || buf.toString('latin1', 4, 8) !== 'ftyp') return false;
  const end = Math.min(buf.readUInt32BE(0), buf.length, 64);
  const brands = [buf.toString('latin1', 8, 12)];
  for (let o = 16; o + 4 <= end; o += 4) brands.push(buf.toString('latin1', o, o + 4));
  return brands.some((b) => /^(heic|heix|hevc|hevx|heim|heis|mif1|msf1)$/.test(b));
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
    if (looksLikeHeic(buf)) throw new ApiError(415, 'heic_unsupported', HEIC_MESSAGE);
    throw new ApiError(415, 'unsupported_type', `This file is not a JPEG, PNG or WebP image. ${WRONG_TYPE_MESSAGE}`);
  }
  let meta: Metadata;
  try {
    meta = await sharp(buf, { limitInputPixels: MAX_PHOTO_PIXELS }).metadata();
  } catch (err) {
    if (/pixel limit/i.test(String(err))) {
      throw new ApiError(413, 'too_many_pixels', `This image has more than ${mp(MAX_PHOTO_PIXELS)} megapixels. Resize it and upload again.`);
    }
    throw new ApiError(415, 'undecodable', `This ${sniffed.toUpperCase()} file could not be read; it may be damaged. Export it again and upload that.`);
  }
  if (meta.format !== sniffed || !meta.width || !meta.height) {
    throw new ApiError(415, 'unsupported_type', `This file is not a readable JPEG, PNG or WebP image. ${WRONG_TYPE_MESSAGE}`);
  }
  try {
    // failOn 'warning' (the default) refuses truncated data.
    await sharp(buf, { limitInputPixels: MAX_PHOTO_PIXELS }).resize(64, 64, { fit: 'inside' }).raw().toBuffer();
  } catch {
    throw new ApiError(415, 'undecodable', `This ${sniffed.toUpperCase()} file is cut short or damaged. Export it again and upload that.`);
  }
  // EXIF 2.32, tag 0x0112 Orientation: values 5–8 transpose the stored image.
  const turned = (meta.orientation ?? 1) >= 5;
  return {
    format: sniffed,
    mime: PHOTO_FORMATS[sniffed].mime,
    width: turned ? meta.height : meta.width,
    height: turned ? meta.width : meta.height,
  };
}
