import { db } from '@/db';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { archiveMold, updateMold } from '@/lib/libraries/molds';
import { moldPatchSchema } from '@/lib/validations/library';

export const PATCH = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('lead');
  const { id } = await params;
  const patch = await readJson(req, moldPatchSchema);
  return json(updateMold(db(), member, id, patch));
});

// Archives: the mold leaves the library, pours and batches that used it keep showing it.
export const DELETE = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('lead');
  const { id } = await params;
  return json(archiveMold(db(), member, id));
});
