import 'server-only';
import { and, desc, eq } from 'drizzle-orm';
import type { DB } from '../open';
import { auditEvents, users } from '../schema';

export type MatchEdit = { at: number; by: string | null; changes: Record<string, { from: string | number | null; to: string | number | null }> };

// The edits of a match's name, notes and tolerance, newest first.
export function listMatchEdits(database: DB, teamId: string, matchId: string): MatchEdit[] {
  return database
    .select({ at: auditEvents.createdAt, by: users.name, data: auditEvents.data })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(and(eq(auditEvents.teamId, teamId), eq(auditEvents.action, 'match.edited'), eq(auditEvents.entityId, matchId)))
    .orderBy(desc(auditEvents.createdAt))
    .all()
    .map((r) => ({ at: r.at, by: r.by, changes: (r.data ?? {}) as MatchEdit['changes'] }));
}
