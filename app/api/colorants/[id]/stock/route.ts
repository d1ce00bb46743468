import { db } from '@/db';
import { getStock, listMovements } from '@/db/queries/stock';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, notFoundError, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { recordMovement } from '@/lib/stock/recordMovement';
import { stockMovementSchema } from '@/lib/validations/stock';

// GET: the colorant's stock and its last movements, newest first.
export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const c = getStock(db(), member.team.id, id);
  if (!c) throw notFoundError('No such colorant in your library');
  return json({ ...c, movements: listMovements(db(), member.team.id, id) });
});

// POST: a delivery or a manual adjustment (leads and owners) → 201.
export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('lead');
  const { id } = await params;
  const input = await readJson(req, stockMovementSchema);
  return json(recordMovement(db(), member, id, input), 201);
});
