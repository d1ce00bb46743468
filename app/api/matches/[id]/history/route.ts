import { db } from '@/db';
import { matchHistory } from '@/db/queries/history';
import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';
import { loadMatch } from '@/lib/matches/loadMatch';

// GET: the match's submits and sign-off decisions, newest first.
export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  loadMatch(db(), member.team.id, id);
  return json(matchHistory(db(), member.team.id, id));
});
