import { db } from '@/db';
import { getMatchDetail } from '@/db/queries/matchDetail';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, notFoundError, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { editMatch } from '@/lib/matches/editMatch';
import { editMatchSchema } from '@/lib/validations/match';

export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const match = getMatchDetail(db(), member.team.id, id);
  if (!match) throw notFoundError('No such match in your team');
  return json(match);
});

// Changes a match's name, notes or tolerance (logged in its history).
export const PATCH = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  const input = await readJson(req, editMatchSchema);
  editMatch(db(), member, id, input);
  return json(getMatchDetail(db(), member.team.id, id));
});
