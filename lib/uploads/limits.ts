// Limits and types of photo uploads, shared by the server and the dropzone.
// No server-only imports here: the browser shows the same limits.
import type { PhotoKind } from '@/db/schema';

import { HEIC_MESSAGE, MAX_IMAGE_BYTES, MAX_IMAGE_PIXELS } from '@/lib/image/limits';

export const MAX_PHOTO_BYTES = MAX_IMAGE_BYTES;
export const MAX_PHOTO_PIXELS = MAX_IMAGE_PIXELS;
export { HEIC_MESSAGE };

export const PHOTO_FORMATS = {
  jpeg: { mime: 'image/jpeg', ext: 'jpg' },
  png: { mime: 'image/png', ext: 'png' },
  webp: { mime: 'image/webp', ext: 'webp' },
} as const;
export type PhotoFormat = keyof typeof PHOTO_FORMATS;
export const PHOTO_MIMES: readonly string[] = Object.values(PHOTO_FORMATS).map((f) => f.mime);

/** One upload route per photo kind; the kind is fixed by the route, never by the browser. */
export const PHOTO_ENDPOINTS = {
  referencePhoto: 'reference',
  pourPhoto: 'pour',
  batchPhoto: 'batch',
  swatchPhoto: 'swatch',
} as const satisfies Record<string, PhotoKind>;
export type PhotoEndpoint = keyof typeof PHOTO_ENDPOINTS;

/** What a finished upload hands back to the browser (the route's serverData). */
export type UploadedPhoto = { photoId: string; width: number; height: number; size: number };
/**
 * A file the service stored but the app refused after looking at its bytes (not a real
 * JPEG/PNG/WebP, too many pixels…). It has already been deleted from the service.
 */
export type RefusedPhoto = { refused: { code: string; message: string } };
export type PhotoServerData = UploadedPhoto | RefusedPhoto;

export function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

export const TOO_LARGE_MESSAGE = `Photos may be up to ${MAX_PHOTO_BYTES / (1024 * 1024)} MB. Export a smaller JPEG — 12 megapixels is plenty for colour.`;
export const WRONG_TYPE_MESSAGE = 'Upload a JPEG, PNG or WebP photo.';
