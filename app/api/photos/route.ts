import { db } from '@/db';
import { listPhotos, pagePhotos } from '@/db/queries/photos';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { listJson, pageOf, readQuery } from '@/lib/http/paging';
import { pageQuerySchema } from '@/lib/validations/paging';
import { readPhotoForm } from '@/lib/uploads/readPhotoForm';
import { savePhotoBytes } from '@/lib/uploads/savePhoto';
import { assertUploadsConfigured } from '@/lib/uploads/service';

export const dynamic = 'force-dynamic';

// The team's 48 most recent photos, newest first; `limit`/`cursor` page them all as
// { items, nextCursor }.
export const GET = withApi(async (req) => {
  const member = await requireMember();
  const page = pageOf(readQuery(req, pageQuerySchema));
  return listJson(page, () => listPhotos(db(), member.team.id), (p) => pagePhotos(db(), member.team.id, p));
});

// For outside callers (a bench camera, scripts): the file goes through the same
// checks as a browser upload, then to the upload service via UTApi. Every refusal
// happens before anything is stored.
export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  assertUploadsConfigured();
  const { kind, bytes, name } = await readPhotoForm(req);
  const saved = await savePhotoBytes(db(), { teamId: member.team.id, userId: member.user.id, kind }, bytes, name);
  return json({ id: saved.photoId, kind, width: saved.width, height: saved.height }, 201);
});
