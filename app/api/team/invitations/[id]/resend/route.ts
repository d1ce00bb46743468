import { db } from '@/db';
import { requireRole } from '@/lib/auth/current';
import { appUrl } from '@/lib/appUrl';
import { json, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { resendInvitation } from '@/lib/team/invitationChanges';

// Sends a pending invitation again with a new link; owner only.
export const POST = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const owner = await requireRole('owner');
  const { id } = await params;
  return json(resendInvitation(db(), owner, id, appUrl(req)));
});
