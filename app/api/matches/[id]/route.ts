import { db } from '@/db';
import { getMatch } from '@/db/queries/matches';
import { requireMember } from '@/lib/auth/current';
import { json, notFound, withApi } from '@/lib/http/api';

export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const match = getMatch(db(), member.team.id, id);
  if (!match) throw notFound('No such match in your team');
  return json(match);
});
