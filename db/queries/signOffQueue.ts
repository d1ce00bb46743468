import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import type { DB } from '../open';
import { matches, pours, users } from '../schema';
import { getPour } from './pours';

export type QueueZone = { name: string; dE00: number; band: string; uncertainty: number | null };
export type QueueItem = {
  pourId: string;
  matchId: string;
  matchName: string;
  number: number;
  tolerance: number;
  submittedAt: number | null;
  submittedBy: string | null;
  zones: QueueZone[];
};

// Pours of the team waiting for a lead's sign-off, oldest first (the one
// waiting longest is the next to decide), with ΔE00 per zone and its ± where
// the measurement carries one.
export function listSignOffQueue(database: DB, teamId: string): QueueItem[] {
  const rows = database
    .select({ id: pours.id, matchId: pours.matchId, matchName: matches.name, number: pours.number, tolerance: matches.tolerance, submittedAt: pours.submittedAt, by: users.name })
    .from(pours)
    .innerJoin(matches, eq(matches.id, pours.matchId))
    .leftJoin(users, eq(users.id, pours.submittedBy))
    .where(and(eq(pours.teamId, teamId), eq(pours.status, 'submitted')))
    .orderBy(asc(pours.submittedAt))
    .all();
  return rows.map((r) => {
    const view = getPour(database, teamId, r.id);
    return {
      pourId: r.id,
      matchId: r.matchId,
      matchName: r.matchName,
      number: r.number,
      tolerance: r.tolerance,
      submittedAt: r.submittedAt,
      submittedBy: r.by,
      zones: (view?.zones ?? []).map((z) => {
        const u = (z as { uncertainty?: unknown }).uncertainty;
        return { name: z.name, dE00: z.dE00, band: z.band, uncertainty: typeof u === 'number' ? u : null };
      }),
    };
  });
}
