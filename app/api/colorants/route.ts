import { db } from '@/db';
import { listColorants } from '@/db/queries/libraries';
import { requireMember, requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { createColorant } from '@/lib/libraries/colorants';
import { colorantSchema } from '@/lib/validations/library';

export const GET = withApi(async () => {
  const member = await requireMember();
  return json(listColorants(db(), member.team.id));
});

// Leads and owners keep the library.
export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const member = await requireRole('lead');
  const input = await readJson(req, colorantSchema);
  return json(createColorant(db(), member, input), 201);
});
