import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import type { DB } from '../open';
import { type Role, memberships, teams, users } from '../schema';

export type Member = {
  user: { id: string; email: string; name: string };
  team: { id: string; name: string };
  role: Role;
};

export function getMemberByUserId(database: DB, userId: string): Member | null {
  const row = database
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      teamId: teams.id,
      teamName: teams.name,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(teams, eq(teams.id, memberships.teamId))
    .where(eq(memberships.userId, userId))
    .get();
  if (!row) return null;
  return {
    user: { id: row.userId, email: row.email, name: row.name },
    team: { id: row.teamId, name: row.teamName },
    role: row.role,
  };
}

export function listTeamMembers(database: DB, teamId: string) {
  return database
    .select({ userId: users.id, email: users.email, name: users.name, role: memberships.role, since: memberships.createdAt })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(eq(memberships.teamId, teamId))
    .orderBy(asc(users.name))
    .all();
}

export function getTeamMember(database: DB, teamId: string, userId: string) {
  return database
    .select({ userId: memberships.userId, role: memberships.role })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)))
    .get();
}

export function countOwners(database: DB, teamId: string): number {
  return database
    .select({ id: memberships.id })
    .from(memberships)
    .where(and(eq(memberships.teamId, teamId), eq(memberships.role, 'owner')))
    .all().length;
}
