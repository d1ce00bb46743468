import { db } from '@/db';
import { getPhoto } from '@/db/queries/photos';
import { requireMember } from '@/lib/auth/current';
import { json, notFoundError, withApi } from '@/lib/http/api';

export const dynamic = 'force-dynamic';

export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const photo = getPhoto(db(), member.team.id, id);
  if (!photo) throw notFoundError('No such photo');
  return json(photo);
});
