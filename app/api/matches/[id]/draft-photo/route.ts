import { db } from '@/db';
import { getMatchDetail } from '@/db/queries/matchDetail';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { setDraftPhoto } from '@/lib/matches/setDraftPhoto';
import { draftPhotoSchema } from '@/lib/validations/match';

// Attaches an uploaded reference photo to the match as its draft target.
export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  const input = await readJson(req, draftPhotoSchema);
  setDraftPhoto(db(), member, id, input.photoId);
  return json(getMatchDetail(db(), member.team.id, id));
});

// Lets the draft go ("Use another photo"); the photo itself stays in Photos.
export const DELETE = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  setDraftPhoto(db(), member, id, null);
  return json(getMatchDetail(db(), member.team.id, id));
});
