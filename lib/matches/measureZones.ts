import { and, eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { photos } from '@/db/schema';
import type { Shape } from '@/lib/color';
import { ApiError } from '@/lib/http/api';
import { ImageError, type NeutralPatch, type PhotoMeasure } from '@/lib/image';
import { measureOffThread } from '@/lib/image/measurePool';
import { fetchStoredBytes } from '@/lib/uploads/service';

// Measures named zones on one of the team's stored photos. A photo of another
// team answers 404 like a missing one; a photo that cannot be measured answers
// the image error's status with its message.
export async function measureZones(
  database: DB,
  teamId: string,
  photoId: string,
  zones: { name: string; shape: Shape }[],
  neutral?: NeutralPatch,
): Promise<PhotoMeasure> {
  const photo = database.select().from(photos).where(and(eq(photos.id, photoId), eq(photos.teamId, teamId))).get();
  if (!photo) throw new ApiError(404, 'not_found', 'photoId: no such photo in your team');
  const bytes = await fetchStoredBytes(photo.fileKey);
  try {
    return await measureOffThread(bytes, zones, neutral);
  } catch (err) {
    if (err instanceof ImageError) throw new ApiError(err.status, err.kind, err.message);
    throw err;
  }
}
