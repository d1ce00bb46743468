import { db } from '@/db';
import { requireRole } from '@/lib/auth/current';
import { appUrl } from '@/lib/appUrl';
import { json, readJson, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { createInvitation } from '@/lib/team/invitations';
import { invitationSchema } from '@/lib/validations/auth';

export const POST = withApi(async (req) => {
  assertSameOrigin(req);
  const owner = await requireRole('owner');
  const input = await readJson(req, invitationSchema);
  const inv = await createInvitation(db(), owner, input, appUrl(req));
  return json({ id: inv.id, email: inv.email, role: inv.role }, 201);
});
