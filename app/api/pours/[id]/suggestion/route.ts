import { and, eq } from 'drizzle-orm';
import { db } from '@/db';
import { matches, pours } from '@/db/schema';
import { requireMember } from '@/lib/auth/current';
import { json, notFoundError, withApi } from '@/lib/http/api';
import { suggestNextPour } from '@/lib/matches/suggestNextPour';

// The next pour's doses for a pour, from the shop's colorant model corrected by this match's pours.
export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const row = db()
    .select({ tolerance: matches.tolerance })
    .from(pours)
    .innerJoin(matches, eq(matches.id, pours.matchId))
    .where(and(eq(pours.id, id), eq(pours.teamId, member.team.id)))
    .get();
  if (!row) throw notFoundError('No such pour in your team');
  return json(await suggestNextPour(db(), member.team.id, id, row.tolerance));
});
