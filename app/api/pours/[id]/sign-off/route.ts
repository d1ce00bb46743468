import { db } from '@/db';
import { appUrl } from '@/lib/appUrl';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { signOffPour } from '@/lib/signoff/signOffPour';
import { signOffSchema } from '@/lib/validations/production';

// POST /api/pours/:id/sign-off { decision: 'approved' | 'rework', comment? }
// → 200 Pour. Leads and owners only; rework needs a comment.
export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('lead');
  const { id } = await params;
  const input = await readJson(req, signOffSchema);
  return json(signOffPour(db(), member, id, input, appUrl(req)));
});
