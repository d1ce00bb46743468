import { db } from '@/db';
import { getMatchDetail } from '@/db/queries/matchDetail';
import { requireMember } from '@/lib/auth/current';
import { json, notFound, withApi } from '@/lib/http/api';

export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const match = getMatchDetail(db(), member.team.id, id);
  if (!match) throw notFound('No such match in your team');
  return json(match);
});
