import 'server-only';
import { and, eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { countOwners, getTeamMember, type Member } from '@/db/queries/members';
import { type Role, memberships, users } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { endUserSessions } from '@/lib/auth/session';
import { ApiError } from '@/lib/http/api';

// A role change or a removal ends every session of that member, so the new
// rights apply at once.
export function changeRole(database: DB, owner: Member, userId: string, role: Role) {
  const target = getTeamMember(database, owner.team.id, userId);
  if (!target) throw new ApiError(404, 'not_found', 'No such member in your team');
  if (target.role === role) return;
  if (target.role === 'owner' && role !== 'owner' && countOwners(database, owner.team.id) <= 1) {
    throw new ApiError(409, 'last_owner', 'A shop needs at least one owner; make someone else owner first');
  }
  database.transaction((tx) => {
    tx.update(memberships).set({ role }).where(and(eq(memberships.teamId, owner.team.id), eq(memberships.userId, userId))).run();
    recordAudit(tx, { teamId: owner.team.id, actorId: owner.user.id, action: 'member.role_changed', entity: 'user', entityId: userId, data: { from: target.role, to: role } });
  });
  endUserSessions(database, userId);
}

export function removeMember(database: DB, owner: Member, userId: string) {
  const target = getTeamMember(database, owner.team.id, userId);
  if (!target) throw new ApiError(404, 'not_found', 'No such member in your team');
  if (target.role === 'owner' && countOwners(database, owner.team.id) <= 1) {
    throw new ApiError(409, 'last_owner', 'A shop needs at least one owner');
  }
  endUserSessions(database, userId);
  database.transaction((tx) => {
    // The account goes with its only membership; its records keep their
    // history with the author set to null.
    tx.delete(users).where(eq(users.id, userId)).run();
    recordAudit(tx, { teamId: owner.team.id, actorId: owner.user.id, action: 'member.removed', entity: 'user', entityId: userId, data: { role: target.role } });
  });
}
