import 'server-only';
import { ImageError } from '@/lib/image';
import { ApiError } from './api';

/**
 * The one mapping of a photo we cannot measure to the API's error shape: an ImageError becomes an
 * ApiError with its status (IMAGE_ERROR_STATUS: 413, 415, 422) and its kind as the code;
 * `reword` may adjust the message for the caller's words. Anything else is returned as it is, so
 * callers write `catch (err) { throw imageApiError(err); }`.
 */
export function imageApiError(err: unknown, reword: (message: string) => string = (m) => m): unknown {
  return err instanceof ImageError ? new ApiError(err.status, err.kind, reword(err.message)) : err;
}
