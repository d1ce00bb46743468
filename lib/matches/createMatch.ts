import 'server-only';
import { eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { matches, teams, zones } from '@/db/schema';
import { recordAudit } from '@/lib/audit';
import { newId } from '@/lib/ids';
import type { CreateMatchInput } from '@/lib/validations/match';

export function createMatch(database: DB, member: Member, input: CreateMatchInput): string {
  const id = newId();
  database.transaction((tx) => {
    const team = tx.select({ tol: teams.defaultTolerance }).from(teams).where(eq(teams.id, member.team.id)).get();
    tx.insert(matches)
      .values({ id, teamId: member.team.id, name: input.name, tolerance: input.tolerance ?? team?.tol ?? 2.0, notes: input.notes ?? null, createdBy: member.user.id })
      .run();
    input.zones.forEach((name, position) => tx.insert(zones).values({ id: newId(), matchId: id, name, position }).run());
    recordAudit(tx, { teamId: member.team.id, actorId: member.user.id, action: 'match.created', entity: 'match', entityId: id });
  });
  return id;
}
