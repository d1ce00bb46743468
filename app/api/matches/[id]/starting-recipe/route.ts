import { db } from '@/db';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { startingRecipeForMatch } from '@/lib/matches/startingRecipeForMatch';
import { startingRecipeSchema } from '@/lib/validations/swatch';

// A first-pour recipe per zone, predicted from the target by the shop's colorant model.
export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('viewer');
  const { id } = await params;
  const input = await readJson(req, startingRecipeSchema);
  return json(await startingRecipeForMatch(db(), member.team.id, id, input.colorantIds));
});
