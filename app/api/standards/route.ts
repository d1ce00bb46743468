import { db } from '@/db';
import { listStandards } from '@/db/queries/standards';
import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';

// GET: the team's standards (matches with an approved standard pour).
export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listStandards(db(), member.team.id));
});
