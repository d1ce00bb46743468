import 'server-only';
import { z } from 'zod';
import { PHOTO_KINDS, type PhotoKind } from '@/lib/enums';
import { badRequest } from '@/lib/http/api';
import { formFile, readMultipart } from '@/lib/http/multipart';
import { MAX_PHOTO_BYTES, TOO_LARGE_MESSAGE } from './limits';

const kindField = z.enum(PHOTO_KINDS, { error: `kind must be one of ${PHOTO_KINDS.join(', ')}` });

/** POST /api/photos: multipart with `image` (a file) and `kind`. */
export async function readPhotoForm(req: Request): Promise<{ kind: PhotoKind; bytes: Buffer; name: string }> {
  const form = await readMultipart(req, MAX_PHOTO_BYTES, TOO_LARGE_MESSAGE, 'an `image` file and a `kind` field');
  const kind = kindField.safeParse(form.get('kind') ?? undefined);
  if (!kind.success) throw badRequest(`kind: ${kind.error.issues[0]?.message ?? 'invalid'}`);
  const { bytes, name } = await formFile(form, 'image', MAX_PHOTO_BYTES, TOO_LARGE_MESSAGE);
  return { kind: kind.data, bytes, name };
}
