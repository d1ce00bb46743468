import { db } from '@/db';
import { getPour } from '@/db/queries/pours';
import { requireMember } from '@/lib/auth/current';
import { json, notFoundError, withApi } from '@/lib/http/api';

export const GET = withApi<{ id: string }>(async (_req, { params }) => {
  const member = await requireMember();
  const { id } = await params;
  const pour = getPour(db(), member.team.id, id);
  if (!pour) throw notFoundError('No such pour in your team');
  return json(pour);
});
