import { db } from '@/db';
import { getMatch, listMatches } from '@/db/queries/matches';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { createMatch } from '@/lib/matches/createMatch';
import { createMatchSchema } from '@/lib/validations/match';

export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listMatches(db(), member.team.id));
});

export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const input = await readJson(req, createMatchSchema);
  const id = createMatch(db(), member, input);
  return json(getMatch(db(), member.team.id, id), 201);
});
