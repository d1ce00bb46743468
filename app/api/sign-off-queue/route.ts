import { db } from '@/db';
import { listSignOffQueue } from '@/db/queries/signOffQueue';
import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';

export const dynamic = 'force-dynamic';

// Pours waiting for sign-off in the caller's team (the lead's queue).
export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listSignOffQueue(db(), member.team.id));
});
