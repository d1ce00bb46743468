import 'server-only';
import sharp, { type OutputInfo } from 'sharp';
import { type PixelBox, type PixelWindow, parseIccProfile, type RgbProfile, SRGB8_TO_LINEAR, SRGB_TO_XYZ } from '@/lib/color';
import { ImageError } from './imageError';
import { type ImageHeader, inspectImage, MAX_IMAGE_PIXELS } from './inspectImage';

// Server-side only (sharp is native); kept free of React and Next so tests can import it.

export interface DecodedImage extends ImageHeader {
  /** 8-bit device pixels (in `profile`'s own RGB), alpha dropped, of `crop` (or the whole image) in displayed coordinates. */
  window: PixelWindow;
  /** How the window's code values turn into linear light and XYZ (D65). */
  profile: RgbProfile;
}

export interface DecodeOptions {
  /** Decode only this box of the displayed image (sharp extracts it before converting). */
  crop?: PixelBox;
  /** Result of inspectImage, when the caller already has it. */
  header?: ImageHeader;
}

const DECODE_MESSAGE =
  "This image couldn't be decoded: it looks cut short or damaged. Upload the original file again.";

/** IEC 61966-2-1 sRGB: the profile of untagged photos and of sRGB-tagged ones. */
export const SRGB_PROFILE: RgbProfile = { linear: [SRGB8_TO_LINEAR, SRGB8_TO_LINEAR, SRGB8_TO_LINEAR], toXyz: SRGB_TO_XYZ };

// A tagged profile within ICC's s15Fixed16 rounding of sRGB is read as exact sRGB, so an sRGB
// photo measures the same with or without its tag.
function isSrgb(p: RgbProfile): boolean {
  const m = p.toXyz.flat().every((v, k) => Math.abs(v - SRGB_TO_XYZ[Math.floor(k / 3)][k % 3]) < 2e-3);
  return m && p.linear.every((t) => t.every((v, i) => Math.abs(v - SRGB8_TO_LINEAR[i]) < 2e-4));
}

/**
 * Decodes an upload in its own colour space: EXIF orientation applied (autoOrient), alpha dropped,
 * and the 8-bit code values left as the camera wrote them (ignoreIcc) when the embedded profile is
 * of the matrix/TRC kind (parseIccProfile: sRGB, Display P3, Adobe RGB…). The caller turns them
 * into linear light and XYZ through `profile` in floating point, so a Display-P3 colour outside
 * sRGB keeps its value instead of being clipped to the sRGB gamut by an 8-bit conversion. Any
 * other profile (LUT-based) is converted to sRGB by sharp (toColourspace('srgb')).
 * Size, type and pixel count are checked from the header first (inspectImage); sharp's
 * limitInputPixels guards the decode as well, and the default failOn ('warning') rejects truncated
 * or damaged data.
 */
export async function decodeImage(buf: Buffer, options: DecodeOptions = {}): Promise<DecodedImage> {
  const header = options.header ?? (await inspectImage(buf));
  const crop = options.crop ?? { left: 0, top: 0, width: header.width, height: header.height };
  if (
    crop.left < 0 || crop.top < 0 || crop.width <= 0 || crop.height <= 0 ||
    crop.left + crop.width > header.width || crop.top + crop.height > header.height
  ) {
    throw new RangeError('crop box outside the image');
  }
  const own = header.icc ? parseIccProfile(header.icc) : null;
  const keep = own !== null;
  const profile = own && !isSrgb(own) ? own : SRGB_PROFILE;

  let data: Buffer;
  let info: OutputInfo;
  try {
    const whole = crop.width === header.width && crop.height === header.height;
    let img = sharp(buf, { limitInputPixels: MAX_IMAGE_PIXELS, autoOrient: true, ignoreIcc: keep });
    if (!whole) img = img.extract(crop);
    // With ignoreIcc this only brings 16-bit or grey pixels to 8-bit RGB; without it, it converts
    // through the embedded profile.
    ({ data, info } = await img
      .toColourspace('srgb')
      .removeAlpha()
      .raw({ depth: 'uchar' })
      .toBuffer({ resolveWithObject: true }));
  } catch (err) {
    const message = err instanceof Error ? err.message : String(err);
    if (/pixel limit/i.test(message)) {
      throw new ImageError('too_many_pixels', `This image has more than ${MAX_IMAGE_PIXELS / 1e6} megapixels. Resize it and upload again.`);
    }
    throw new ImageError('unsupported_type', DECODE_MESSAGE);
  }
  if (info.channels !== 3 || info.width !== crop.width || info.height !== crop.height || data.length !== crop.width * crop.height * 3) {
    throw new ImageError('corrupt', `The pixels of this image came out inconsistent (${info.width} × ${info.height} × ${info.channels}). Export it again as JPEG or PNG.`);
  }
  return {
    ...header,
    window: { ...crop, data: new Uint8Array(data.buffer, data.byteOffset, data.length) },
    profile,
  };
}
