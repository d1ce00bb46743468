import { db } from '@/db';
import { getPour } from '@/db/queries/pours';
import { listPourSummaries, pagePourSummaries } from '@/db/queries/pourHistory';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { withMeasureSlot } from '@/lib/http/measureSlots';
import { assertSameOrigin } from '@/lib/http/origin';
import { addPour } from '@/lib/matches/addPour';
import { loadMatch } from '@/lib/matches/loadMatch';
import { listJson, pageOf, readQuery } from '@/lib/http/paging';
import { pageQuerySchema } from '@/lib/validations/paging';
import { pourSchema } from '@/lib/validations/match';

// GET: the match's pours as PourSummary, newest first; `limit`/`cursor` page them.
export const GET = withApi<{ id: string }>(async (req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const page = pageOf(readQuery(req, pageQuerySchema));
  loadMatch(db(), member.team.id, id);
  return listJson(page, () => listPourSummaries(db(), member.team.id, id), (p) => pagePourSummaries(db(), member.team.id, id, p));
});

export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  const input = await readJson(req, pourSchema);
  const pourId = await withMeasureSlot(member.user.id, () => addPour(db(), member, id, input));
  return json(getPour(db(), member.team.id, pourId), 201);
});
