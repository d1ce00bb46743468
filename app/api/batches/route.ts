import { db } from '@/db';
import { listRecentBatches } from '@/db/queries/batches';
import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';

// GET: the team's 100 most recent production batches across its standards,
// newest first (viewer and above).
export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listRecentBatches(db(), member.team.id));
});
