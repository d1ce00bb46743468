import 'server-only';
import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { matches } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { ApiError } from '@/lib/http/api';
import { loadMatch } from './loadMatch';

// Archiving retires a match and its standard: nothing more is poured, signed
// off or batched against it, and everything stays readable. Reopening brings
// it back as approved when it has a standard, else open.
export function setArchived(database: DB, member: Member, matchId: string, archived: boolean) {
  const { match } = loadMatch(database, member.team.id, matchId);
  if (archived && match.status === 'archived') throw new ApiError(409, 'archived', 'This match is already archived');
  if (!archived && match.status !== 'archived') throw new ApiError(409, 'not_archived', 'Only an archived match can be reopened');
  if (archived && match.status === 'in_review') {
    throw new ApiError(409, 'in_review', 'A pour of this match waits for sign-off; decide it before archiving');
  }
  const status = archived ? 'archived' : match.standardPourId ? 'approved' : 'open';
  database.transaction((tx) => {
    tx.update(matches).set({ status, updatedAt: Date.now() }).where(eq(matches.id, matchId)).run();
    recordAudit(tx, { teamId: member.team.id, actorId: member.user.id, action: archived ? 'match.archived' : 'match.reopened', entity: 'match', entityId: matchId, data: { standardPourId: match.standardPourId } });
  });
}
