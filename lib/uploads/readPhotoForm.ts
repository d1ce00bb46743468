import 'server-only';
import { z } from 'zod';
import { PHOTO_KINDS, type PhotoKind } from '@/db/schema';
import { ApiError, badRequest } from '@/lib/http/api';
import { MAX_PHOTO_BYTES, TOO_LARGE_MESSAGE } from './limits';

// Room for the multipart boundary, part headers and the `kind` field.
const FORM_SLACK = 64 * 1024;
const MAX_BODY = MAX_PHOTO_BYTES + FORM_SLACK;

const tooLarge = () => new ApiError(413, 'too_large', TOO_LARGE_MESSAGE);
const kindField = z.enum(PHOTO_KINDS, { error: `kind must be one of ${PHOTO_KINDS.join(', ')}` });

// Reads the body with a running count, so a body without (or lying about) its
// Content-Length is cut off at the limit instead of filling memory.
async function readLimited(req: Request): Promise<Buffer> {
  const declared = Number(req.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > MAX_BODY) throw tooLarge();
  if (!req.body) return Buffer.alloc(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > MAX_BODY) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/** POST /api/photos: multipart with `image` (a file) and `kind`. */
export async function readPhotoForm(req: Request): Promise<{ kind: PhotoKind; bytes: Buffer; name: string }> {
  const type = req.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data;\s*boundary=/i.test(type)) {
    throw badRequest('Send multipart/form-data with an `image` file and a `kind` field', 'not_multipart');
  }
  const body = await readLimited(req);
  let form: FormData;
  try {
    form = await new Response(new Uint8Array(body), { headers: { 'content-type': type } }).formData();
  } catch {
    throw badRequest('The multipart body could not be read', 'malformed_multipart');
  }
  const kind = kindField.safeParse(form.get('kind') ?? undefined);
  if (!kind.success) throw badRequest(`kind: ${kind.error.issues[0]?.message ?? 'invalid'}`);
  const image = form.get('image');
  if (!image || typeof image === 'string') throw badRequest('image: attach the photo as a file in the `image` field');
  if (image.size > MAX_PHOTO_BYTES) throw tooLarge();
  if (image.size === 0) throw badRequest('image: the file is empty (0 bytes)', 'empty_file');
  return { kind: kind.data, bytes: Buffer.from(await image.arrayBuffer()), name: image.name };
}
