import { db } from '@/db';
import { getMatch, listMatches, pageMatches } from '@/db/queries/matches';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { listJson, pageOf, readQuery } from '@/lib/http/paging';
import { createMatch } from '@/lib/matches/createMatch';
import { createMatchSchema } from '@/lib/validations/match';
import { matchListQuerySchema } from '@/lib/validations/paging';

// The team's matches, newest activity first. Optional `status` and `q` (name or notes)
// filter in SQL; `limit`/`cursor` page the list as { items, nextCursor }.
export const GET = withApi(async (req) => {
  const member = await requireMember();
  const { status, q, ...paging } = readQuery(req, matchListQuerySchema);
  const filter = { status, q: q || undefined };
  return listJson(pageOf(paging), () => listMatches(db(), member.team.id, filter), (page) => pageMatches(db(), member.team.id, filter, page));
});

export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const input = await readJson(req, createMatchSchema);
  const id = createMatch(db(), member, input);
  return json(getMatch(db(), member.team.id, id), 201);
});
