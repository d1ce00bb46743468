import 'server-only';
import type { DB } from '@/db/open';
import { insertPhoto } from '@/db/queries/photos';
import type { PhotoKind } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import { inspectPhoto, type InspectedPhoto } from './inspectPhoto';
import type { UploadedPhoto } from './limits';
import { deleteStored, fetchStoredBytes, storeBytes } from './service';
import { sanitiseFileName } from './sanitiseFileName';

export type Uploader = { teamId: string; userId: string; kind: PhotoKind };

function record(database: DB, who: Uploader, file: { key: string; name: string; size: number }, info: InspectedPhoto): UploadedPhoto {
  const id = newId();
  database.transaction((tx) => {
    insertPhoto(tx, {
      id,
      teamId: who.teamId,
      kind: who.kind,
      fileKey: file.key,
      fileName: file.name,
      mime: info.mime,
      size: file.size,
      width: info.width,
      height: info.height,
      uploadedBy: who.userId,
    });
    recordAudit(tx, { teamId: who.teamId, actorId: who.userId, action: 'photo.uploaded', entity: 'photo', entityId: id, data: { kind: who.kind } });
  });
  return { photoId: id, width: info.width, height: info.height, size: file.size };
}

/** POST /api/photos: checks the bytes, stores them through UTApi, records the row. */
export async function savePhotoBytes(database: DB, who: Uploader, bytes: Buffer, clientName: string): Promise<UploadedPhoto> {
  const info = await inspectPhoto(bytes);
  const name = sanitiseFileName(clientName, info.format);
  const stored = await storeBytes(bytes, name, info.mime);
  try {
    return record(database, who, { key: stored.key, name, size: bytes.length }, info);
  } catch (err) {
    await deleteStored(stored.key);
    throw err;
  }
}

/**
 * onUploadComplete: the browser put the file on the service directly, so the
 * bytes are fetched back and checked here; a refused file is deleted from the
 * service before the error goes on.
 */
export async function acceptStoredPhoto(database: DB, who: Uploader, file: { key: string; name: string }): Promise<UploadedPhoto> {
  try {
    const bytes = await fetchStoredBytes(file.key);
    const info = await inspectPhoto(bytes);
    return record(database, who, { key: file.key, name: sanitiseFileName(file.name, info.format), size: bytes.length }, info);
  } catch (err) {
    await deleteStored(file.key);
    throw err;
  }
}
