import { db } from '@/db';
import { listColorants } from '@/db/queries/libraries';
import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';

export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listColorants(db(), member.team.id));
});
