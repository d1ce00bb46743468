import { db } from '@/db';
import { listMolds } from '@/db/queries/libraries';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { createMold } from '@/lib/libraries/molds';
import { moldSchema } from '@/lib/validations/library';

export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listMolds(db(), member.team.id));
});

// Leads and owners keep the library.
export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const member = await requireRole('lead');
  const input = await readJson(req, moldSchema);
  return json(createMold(db(), member, input), 201);
});
