import 'server-only';
import { and, asc, eq, inArray } from 'drizzle-orm';
import type { DB } from '../open';
import { auditEvents, pours, signOffs, users } from '../schema';

export type HistoryEntry = {
  kind: 'submitted' | 'approved' | 'rework';
  pourId: string;
  pourNumber: number;
  by: { id: string; name: string } | null;
  at: number;
  comment: string | null;
  /** For an approval that replaced an earlier standard: the pour it retired. */
  retiredPourId: string | null;
};

// A match's sign-off history, newest first: each submit (from the audit
// trail, with the maker's note as its comment) and each decision (from
// sign_offs, with the lead's comment). The caller has checked the match is
// the team's; every query filters by the team again all the same.
export function matchHistory(database: DB, teamId: string, matchId: string): HistoryEntry[] {
  const pourRows = database.select({ id: pours.id, number: pours.number }).from(pours)
    .where(and(eq(pours.matchId, matchId), eq(pours.teamId, teamId))).orderBy(asc(pours.number)).all();
  if (pourRows.length === 0) return [];
  const numberOf = new Map(pourRows.map((p) => [p.id, p.number]));
  const person = (id: string | null, name: string | null) => (id ? { id, name: name ?? '' } : null);

  const decisions = database
    .select({ s: signOffs, name: users.name })
    .from(signOffs)
    .leftJoin(users, eq(users.id, signOffs.decidedBy))
    .where(and(eq(signOffs.matchId, matchId), eq(signOffs.teamId, teamId)))
    .all();
  const events = database
    .select({ e: auditEvents, name: users.name })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(
      and(
        eq(auditEvents.teamId, teamId),
        inArray(auditEvents.action, ['pour.submitted', 'standard.changed']),
        inArray(auditEvents.entityId, [matchId, ...numberOf.keys()]),
      ),
    )
    .all();
  const submits = events.filter((x) => x.e.action === 'pour.submitted' && x.e.entityId && numberOf.has(x.e.entityId));
  const changes = events
    .filter((x) => x.e.action === 'standard.changed' && x.e.entityId === matchId)
    .map((x) => x.e.data as { to?: string; retired?: string | null } | null);

  const entries: HistoryEntry[] = [
    ...submits.map(({ e, name }) => ({
      kind: 'submitted' as const,
      pourId: e.entityId!,
      pourNumber: numberOf.get(e.entityId!)!,
      by: person(e.actorId, name),
      at: e.createdAt,
      comment: (e.data as { note?: string | null } | null)?.note ?? null,
      retiredPourId: null,
    })),
    ...decisions.map(({ s, name }) => ({
      kind: s.decision,
      pourId: s.pourId,
      pourNumber: numberOf.get(s.pourId) ?? 0,
      by: person(s.decidedBy, name),
      at: s.createdAt,
      comment: s.comment,
      retiredPourId: s.decision === 'approved' ? (changes.find((c) => c?.to === s.pourId)?.retired ?? null) : null,
    })),
  ];
  // Newest first; a decision made in the same millisecond as its submit
  // still comes after it in time, so it sorts first.
  return entries.sort((a, b) => b.at - a.at || (a.kind === 'submitted' ? 1 : 0) - (b.kind === 'submitted' ? 1 : 0));
}
