import { db } from '@/db';
import { getPour } from '@/db/queries/pours';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { withMeasureSlot } from '@/lib/http/measureSlots';
import { assertSameOrigin } from '@/lib/http/origin';
import { addPour } from '@/lib/matches/addPour';
import { pourSchema } from '@/lib/validations/match';

export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  const input = await readJson(req, pourSchema);
  const pourId = await withMeasureSlot(member.user.id, () => addPour(db(), member, id, input));
  return json(getPour(db(), member.team.id, pourId), 201);
});
