import { db } from '@/db';
import { listMatchEdits } from '@/db/queries/matchEdits';
import { requireMember } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';
import { loadMatch } from '@/lib/matches/loadMatch';

// What was changed on the match (name, notes, tolerance), by whom and when.
export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  loadMatch(db(), member.team.id, id);
  return json(listMatchEdits(db(), member.team.id, id));
});
