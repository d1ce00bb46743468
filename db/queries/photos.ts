import { and, desc, eq } from 'drizzle-orm';
import type { DB } from '../open';
import { type NewPhoto, type PhotoKind, photos } from '../schema';

// What the API shows of a photo: never its storage key.
const publicColumns = {
  id: photos.id,
  kind: photos.kind,
  width: photos.width,
  height: photos.height,
  size: photos.size,
  fileName: photos.fileName,
  mime: photos.mime,
  createdAt: photos.createdAt,
};

export type PhotoView = { id: string; kind: PhotoKind; width: number; height: number; size: number; fileName: string; mime: string; createdAt: number };

export function insertPhoto(database: Pick<DB, 'insert'>, values: NewPhoto & { id: string }): void {
  database.insert(photos).values(values).run();
}

export function getPhoto(database: DB, teamId: string, photoId: string): PhotoView | null {
  return database.select(publicColumns).from(photos).where(and(eq(photos.teamId, teamId), eq(photos.id, photoId))).get() ?? null;
}

/** The storage key and type of a team's photo, for serving its bytes. */
export function getPhotoFile(database: DB, teamId: string, photoId: string) {
  return (
    database
      .select({ fileKey: photos.fileKey, mime: photos.mime, size: photos.size, fileName: photos.fileName })
      .from(photos)
      .where(and(eq(photos.teamId, teamId), eq(photos.id, photoId)))
      .get() ?? null
  );
}

export function listPhotos(database: DB, teamId: string, limit = 48): PhotoView[] {
  return database.select(publicColumns).from(photos).where(eq(photos.teamId, teamId)).orderBy(desc(photos.createdAt)).limit(limit).all();
}
