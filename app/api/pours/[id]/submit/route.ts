import { db } from '@/db';
import { appUrl } from '@/lib/appUrl';
import { requireRole } from '@/lib/auth/current';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { submitPour } from '@/lib/signoff/submitPour';
import { submitSchema } from '@/lib/validations/production';

// POST /api/pours/:id/submit { note? } → 200 Pour; the match goes into review
// and the team's leads and owners are e-mailed.
export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const member = await requireRole('maker');
  const { id } = await params;
  const input = await readJson(req, submitSchema);
  return json(submitPour(db(), member, id, input, appUrl(req)));
});
