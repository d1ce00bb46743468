import { createRouteHandler, createUploadthing, type FileRouter } from 'uploadthing/server';
import { LOCAL_UPLOADS_TOKEN } from '../../../uploads-fake/token';
import { startTestApp } from './app-server';

export type Completed = { file: { key: string; name: string; size: number; fileHash: string; ufsUrl: string }; metadata: unknown };

// A file route shaped like the app's: images only, middleware adds metadata,
// onUploadComplete returns serverData for the browser.
export function photoRouter(completed: Completed[]) {
  const f = createUploadthing();
  return {
    photo: f({ image: { maxFileSize: '4MB', maxFileCount: 1 } })
      .middleware(() => ({ teamId: 'team-1' }))
      .onUploadComplete(({ file, metadata }) => {
        completed.push({ file, metadata });
        return { photoId: `photo-${completed.length}`, key: file.key };
      }),
    quick: f({ image: { maxFileSize: '4MB' } }, { presignedURLTTL: 1 })
      .onUploadComplete(() => ({ ok: true })),
  } satisfies FileRouter;
}

// The real `createRouteHandler` from `uploadthing/server`, configured through its
// documented `config` options, mounted in a plain Node server standing in for the app.
export async function startPhotoApp(ingestUrl: string, isDev: boolean) {
  const completed: Completed[] = [];
  const handler = createRouteHandler({
    router: photoRouter(completed),
    config: { token: LOCAL_UPLOADS_TOKEN, ingestUrl, isDev, logLevel: 'None' },
  });
  const app = await startTestApp(handler);
  return { app, completed, endpoint: `${app.url}/api/uploadthing` };
}
