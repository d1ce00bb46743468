import { db } from '@/db';
import { listRecentBatches, pageRecentBatches } from '@/db/queries/batches';
import { requireMember } from '@/lib/auth/current';
import { withApi } from '@/lib/http/api';
import { listJson, pageOf, readQuery } from '@/lib/http/paging';
import { pageQuerySchema } from '@/lib/validations/paging';

// GET: the team's 100 most recent production batches across its standards,
// newest first (viewer and above); `limit`/`cursor` page them all as { items, nextCursor }.
export const GET = withApi(async (req) => {
  const member = await requireMember();
  const page = pageOf(readQuery(req, pageQuerySchema));
  return listJson(page, () => listRecentBatches(db(), member.team.id), (p) => pageRecentBatches(db(), member.team.id, p));
});
