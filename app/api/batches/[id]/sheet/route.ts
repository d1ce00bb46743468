import { db } from '@/db';
import { getBatch } from '@/db/queries/batches';
import { requireMember } from '@/lib/auth/current';
import { loadBatchSheet } from '@/lib/batches/loadBatchSheet';
import { json, notFoundError, withApi } from '@/lib/http/api';

// GET: the data of the batch's printable sheet (scaled recipe, laminate
// layout, yield per mold, temperature, cautions).
export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const batch = getBatch(db(), member.team.id, id);
  if (!batch) throw notFoundError('No such batch in your team');
  return json(await loadBatchSheet(db(), member.team.id, batch));
});
