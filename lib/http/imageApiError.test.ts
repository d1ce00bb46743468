import { describe, expect, it } from 'vitest';
import { IMAGE_ERROR_STATUS, ImageError, type ImageErrorKind } from '@/lib/image';
import { ApiError } from './api';
import { imageApiError } from './imageApiError';

describe('imageApiError', () => {
  it('maps every kind of ImageError to its status (API.md: 413, 415, 422) with the kind as code', () => {
    const expected: Record<ImageErrorKind, number> = { too_large: 413, too_many_pixels: 413, too_much_work: 413, unsupported_type: 415, corrupt: 415, empty_region: 422, unusable_neutral: 422 };
    expect(IMAGE_ERROR_STATUS).toEqual(expected);
    for (const kind of Object.keys(expected) as ImageErrorKind[]) {
      const out = imageApiError(new ImageError(kind, `about ${kind}`)) as ApiError;
      expect(out).toBeInstanceOf(ApiError);
      expect([out.status, out.code, out.message]).toEqual([expected[kind], kind, `about ${kind}`]);
    }
  });

  it("rewords the message when asked, and passes anything else through untouched", () => {
    expect((imageApiError(new ImageError('empty_region', 'Region "x" is too small'), (m) => m.replace('"x"', 'the belly')) as ApiError).message).toBe('Region the belly is too small');
    const other = new Error('boom');
    expect(imageApiError(other)).toBe(other);
  });
});
