import 'server-only';
import { db } from '@/db';
import { getMatchDetail } from '@/db/queries/matchDetail';
import { requireRole } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { setArchived } from '@/lib/matches/setArchived';

// POST /api/matches/:id/archive and /reopen (one handler for both): lead or owner only.
export function archiveRoute(archived: boolean) {
  return withApi<{ id: string }>(async (req, { params }) => {
    assertSameOrigin(req);
    const member = await requireRole('lead');
    const { id } = await params;
    setArchived(db(), member, id, archived);
    return json(getMatchDetail(db(), member.team.id, id));
  });
}
