import 'server-only';
import { createUploadthing, type FileRouter } from 'uploadthing/next';
import { UploadThingError } from 'uploadthing/server';
import { db } from '@/db';
import type { PhotoKind } from '@/db/schema';
import { requireRole } from '@/lib/auth/current';
import { ApiError } from '@/lib/http/api';
import { MAX_PHOTO_BYTES, type PhotoServerData, TOO_LARGE_MESSAGE } from './limits';
import { acceptStoredPhoto } from './savePhoto';

// The SDK reads `message` from an error body; `error` is the app's one error shape.
const f = createUploadthing({
  errorFormatter: (err) => {
    const code = err.cause instanceof ApiError ? err.cause.code : err.code.toLowerCase();
    return { message: err.message, error: { code, message: err.message } };
  },
});

// The SDK's sizes are powers of two (`FileSize` in @uploadthing/shared): 32MB is the
// smallest above our 25 MB limit, which the middleware enforces exactly.
const IMAGE = { maxFileSize: '32MB', maxFileCount: 1, acl: 'private' } as const;
const IMAGES = { 'image/jpeg': IMAGE, 'image/png': IMAGE, 'image/webp': IMAGE } as const;

// ApiError → UploadThingError. The SDK's codes have no 401, so signed-out is FORBIDDEN too.
function toUploadThingError(err: unknown): UploadThingError {
  if (err instanceof UploadThingError) return err;
  if (err instanceof ApiError) {
    const code = err.status === 413 ? 'TOO_LARGE' : err.status === 400 ? 'BAD_REQUEST' : err.status === 404 ? 'NOT_FOUND' : 'FORBIDDEN';
    return new UploadThingError({ code, message: err.message, cause: err });
  }
  console.error('[uploads] middleware failed', err);
  return new UploadThingError({ code: 'INTERNAL_SERVER_ERROR', message: 'The upload could not be started; nothing was saved.' });
}

function photoRoute(kind: PhotoKind) {
  return f(IMAGES)
    .middleware(async ({ files }) => {
      try {
        const member = await requireRole('maker');
        if (files.length !== 1) throw new ApiError(400, 'one_file', 'Upload one photo at a time');
        const [file] = files;
        if (file!.size > MAX_PHOTO_BYTES) throw new ApiError(413, 'too_large', TOO_LARGE_MESSAGE);
        if (file!.size === 0) throw new ApiError(400, 'empty_file', 'The file is empty (0 bytes)');
        return { teamId: member.team.id, userId: member.user.id, kind };
      } catch (err) {
        throw toUploadThingError(err);
      }
    })
    .onUploadComplete(async ({ metadata, file }): Promise<PhotoServerData> => {
      // A refusal is returned, not thrown: the SDK (7.7.4, handleCallbackRequest) swallows
      // an error thrown here and never reports back, so the browser would wait for the
      // service's timeout and see no reason. The file is already deleted from the service.
      try {
        return await acceptStoredPhoto(db(), metadata, file);
      } catch (err) {
        if (err instanceof ApiError) return { refused: { code: err.code, message: err.message } };
        console.error('[uploads] onUploadComplete failed', err);
        return { refused: { code: 'internal', message: 'The photo could not be saved; nothing was kept. Try again.' } };
      }
    });
}

export const photoRouter = {
  referencePhoto: photoRoute('reference'),
  pourPhoto: photoRoute('pour'),
  batchPhoto: photoRoute('batch'),
  swatchPhoto: photoRoute('swatch'),
} satisfies FileRouter;

export type PhotoRouter = typeof photoRouter;
