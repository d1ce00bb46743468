import sharp, { type OutputInfo } from 'sharp';
import type { PixelBox, PixelWindow } from '@/lib/color';
import { ImageError } from './imageError';
import { type ImageHeader, inspectImage, MAX_IMAGE_PIXELS } from './inspectImage';

// Server-side only (sharp is native); kept free of React and Next so tests can import it.

export interface DecodedImage extends ImageHeader {
  /** 8-bit sRGB pixels, alpha dropped, of `crop` (or the whole image) in displayed coordinates. */
  window: PixelWindow;
}

export interface DecodeOptions {
  /** Decode only this box of the displayed image (sharp extracts it before converting). */
  crop?: PixelBox;
  /** Result of inspectImage, when the caller already has it. */
  header?: ImageHeader;
}

const DECODE_MESSAGE =
  "This image couldn't be decoded: it looks cut short or damaged. Upload the original file again.";

/**
 * Decodes an upload to 8-bit sRGB: EXIF orientation applied (autoOrient), an embedded ICC
 * profile converted to sRGB (toColourspace('srgb') through the profile; Display P3 checked in
 * tests/color/decodeImage.test.ts), alpha dropped. Size, type and pixel count are checked from the
 * header first (inspectImage); sharp's limitInputPixels guards the decode as well, and the default
 * failOn ('warning') rejects truncated or damaged data.
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

  let data: Buffer;
  let info: OutputInfo;
  try {
    const whole = crop.width === header.width && crop.height === header.height;
    let img = sharp(buf, { limitInputPixels: MAX_IMAGE_PIXELS, autoOrient: true });
    if (!whole) img = img.extract(crop);
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
  };
}
