import 'server-only';
import { and, eq, inArray } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { memberships, pours, recipeLines, users } from '@/db/schema';
import { ApiError } from '@/lib/http/api';

// Everyone in the team who may sign off: its leads and owners.
export function leadsAndOwners(database: Pick<DB, 'select'>, teamId: string) {
  return database
    .select({ id: users.id, email: users.email, name: users.name })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .where(and(eq(memberships.teamId, teamId), inArray(memberships.role, ['lead', 'owner'])))
    .all();
}

export function userById(database: Pick<DB, 'select'>, userId: string | null) {
  if (!userId) return null;
  return database.select({ id: users.id, email: users.email, name: users.name }).from(users).where(eq(users.id, userId)).get() ?? null;
}

// A pour of the team, or 404 — the same for another team's id.
export function loadPour(database: Pick<DB, 'select'>, teamId: string, pourId: string) {
  const pour = database.select().from(pours).where(and(eq(pours.id, pourId), eq(pours.teamId, teamId))).get();
  if (!pour) throw new ApiError(404, 'not_found', 'No such pour in your team');
  return pour;
}

// A pour without recipe lines cannot become a standard: production would have
// nothing to mix. Submitting and approving both refuse it (409).
export function assertHasRecipe(database: Pick<DB, 'select'>, pour: { id: string; number: number }, action: 'submitted' | 'approved') {
  const line = database.select({ id: recipeLines.id }).from(recipeLines).where(eq(recipeLines.pourId, pour.id)).limit(1).get();
  if (line) return;
  throw new ApiError(
    409,
    'no_recipe',
    `Pour #${pour.number} has no recipe lines, so it cannot be ${action}: log a new pour with the doses you mixed`,
  );
}
