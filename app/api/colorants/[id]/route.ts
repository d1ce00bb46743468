import { db } from '@/db';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { archiveColorant, updateColorant } from '@/lib/libraries/colorants';
import { colorantPatchSchema } from '@/lib/validations/library';

export const PATCH = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('lead');
  const { id } = await params;
  const patch = await readJson(req, colorantPatchSchema);
  return json(updateColorant(db(), member, id, patch));
});

// Archives: the colorant leaves the library, old recipes keep showing it.
export const DELETE = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('lead');
  const { id } = await params;
  return json(archiveColorant(db(), member, id));
});
