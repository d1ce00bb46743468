import 'server-only';
import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { matches } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { roleAtLeast } from '@/lib/auth/roles';
import { ApiError } from '@/lib/http/api';
import type { EditMatchInput } from '@/lib/validations/match';
import { loadMatch } from './loadMatch';

type Change = { from: string | number | null; to: string | number | null };

// Renames a match, rewrites its notes or changes its tolerance, and logs what
// changed (from → to) in its history. Pours are never edited. Once a match has
// a standard, its tolerance decides whether batches pass, so only a lead or
// the owner may change it then.
export function editMatch(database: DB, member: Member, matchId: string, input: EditMatchInput) {
  const teamId = member.team.id;
  const { match } = loadMatch(database, teamId, matchId);
  if (match.status === 'archived') throw new ApiError(409, 'archived', 'This match is archived; reopen it before editing it');
  if (input.tolerance !== undefined && input.tolerance !== match.tolerance && match.standardPourId && !roleAtLeast(member.role, 'lead')) {
    throw new ApiError(403, 'forbidden', 'This match has a standard: only a lead or the owner may change its tolerance');
  }
  const notes = input.notes === undefined ? undefined : input.notes?.trim() || null;
  const changes: Record<string, Change> = {};
  if (input.name !== undefined && input.name !== match.name) changes.name = { from: match.name, to: input.name };
  if (notes !== undefined && notes !== match.notes) changes.notes = { from: match.notes, to: notes };
  if (input.tolerance !== undefined && input.tolerance !== match.tolerance) changes.tolerance = { from: match.tolerance, to: input.tolerance };
  if (Object.keys(changes).length === 0) return changes;
  database.transaction((tx) => {
    tx.update(matches)
      .set({
        ...(changes.name ? { name: input.name } : {}),
        ...(changes.notes ? { notes } : {}),
        ...(changes.tolerance ? { tolerance: input.tolerance } : {}),
        updatedAt: Date.now(),
      })
      .where(eq(matches.id, match.id))
      .run();
    recordAudit(tx, { teamId, actorId: member.user.id, action: 'match.edited', entity: 'match', entityId: match.id, data: changes });
  });
  return changes;
}
