import { db } from '@/db';
import { requireRole } from '@/lib/auth/current';
import { json, withApi } from '@/lib/http/api';
import { assertSameOrigin } from '@/lib/http/origin';
import { revokeInvitation } from '@/lib/team/invitationChanges';

// Revokes a pending invitation; owner only.
export const DELETE = withApi<{ id: string }>(async (req, { params }) => {
  assertSameOrigin(req);
  const owner = await requireRole('owner');
  const { id } = await params;
  return json(revokeInvitation(db(), owner, id));
});
