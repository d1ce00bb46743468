import { db } from '@/db';
import { getBatch, listBatches, pageMatchBatches } from '@/db/queries/batches';
import { appUrl } from '@/lib/appUrl';
import { requireMember, requireRole } from '@/lib/auth/current';
import { logBatch } from '@/lib/batches/logBatch';
import { json, readJson, withApi } from '@/lib/http/api';
import { withMeasureSlot } from '@/lib/http/measureSlots';
import { assertSameOrigin } from '@/lib/http/origin';
import { listJson, pageOf, readQuery } from '@/lib/http/paging';
import { pageQuerySchema } from '@/lib/validations/paging';
import { loadMatch } from '@/lib/matches/loadMatch';
import { batchSchema } from '@/lib/validations/production';

// GET: the match's batches, oldest first (a run chart's order).
// `limit`/`cursor` page them as { items, nextCursor }.
export const GET = withApi<{ id: string }>(async (req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const page = pageOf(readQuery(req, pageQuerySchema));
  loadMatch(db(), member.team.id, id);
  return listJson(page, () => listBatches(db(), member.team.id, id), (p) => pageMatchBatches(db(), member.team.id, id, p));
});

// POST: logs a production batch against the match's standard → 201 Batch.
export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  const input = await readJson(req, batchSchema);
  const batchId = await withMeasureSlot(member.user.id, () => logBatch(db(), member, id, input, appUrl(req)));
  return json(getBatch(db(), member.team.id, batchId), 201);
});
