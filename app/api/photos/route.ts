import { db } from '@/db';
import { listPhotos } from '@/db/queries/photos';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { readPhotoForm } from '@/lib/uploads/readPhotoForm';
import { savePhotoBytes } from '@/lib/uploads/savePhoto';
import { assertUploadsConfigured } from '@/lib/uploads/service';

export const dynamic = 'force-dynamic';

// The team's recent photos, newest first.
export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listPhotos(db(), member.team.id));
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
