import { db } from '@/db';
import { listMatches } from '@/db/queries/matches';
import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';

export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listMatches(db(), member.team.id));
});
