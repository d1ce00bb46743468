import { db } from '@/db';
import { getMatchDetail } from '@/db/queries/matchDetail';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { withMeasureSlot } from '@/lib/http/measureSlots';
import { assertSameOrigin } from '@/lib/http/origin';
import { setTarget } from '@/lib/matches/setTarget';
import { targetSchema } from '@/lib/validations/match';

export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  const input = await readJson(req, targetSchema);
  await withMeasureSlot(member.user.id, () => setTarget(db(), member, id, input));
  return json(getMatchDetail(db(), member.team.id, id));
});
