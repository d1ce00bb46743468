import 'server-only';
import { and, asc, desc, eq, inArray } from 'drizzle-orm';
import { labToHex } from '../../lib/color';
import type { DB } from '../open';
import { matches, pours, samples, users, zones } from '../schema';

export type LabValue = { l: number; a: number; b: number };
export type TargetZone = { name: string; lab: LabValue; hex: string; spread: number | null };
export type PourSummary = {
  id: string;
  number: number;
  status: string;
  createdAt: number;
  zones: { name: string; dE00: number | null }[];
};
export type MatchView = {
  id: string;
  name: string;
  status: string;
  zones: string[];
  tolerance: number;
  notes: string | null;
  target: { zones: TargetZone[] } | null;
  pours: PourSummary[];
  standardPourId: string | null;
  createdBy: string | null;
  createdAt: number;
  updatedAt: number;
};

// The team's matches in the API's Match shape, newest activity first.
export function listMatches(database: DB, teamId: string, ids?: string[]): MatchView[] {
  const where = ids ? and(eq(matches.teamId, teamId), inArray(matches.id, ids)) : eq(matches.teamId, teamId);
  const rows = database
    .select({ m: matches, creator: users.name })
    .from(matches)
    .leftJoin(users, eq(users.id, matches.createdBy))
    .where(where)
    .orderBy(desc(matches.updatedAt))
    .all();
  if (rows.length === 0) return [];
  const matchIds = rows.map((r) => r.m.id);
  const zoneRows = database.select().from(zones).where(inArray(zones.matchId, matchIds)).orderBy(asc(zones.position)).all();
  const pourRows = database
    .select({ id: pours.id, matchId: pours.matchId, number: pours.number, status: pours.status, createdAt: pours.createdAt })
    .from(pours)
    .where(inArray(pours.matchId, matchIds))
    .orderBy(asc(pours.number))
    .all();
  const pourIds = pourRows.map((p) => p.id);
  const sampleRows = pourIds.length
    ? database
        .select({ pourId: samples.pourId, zone: samples.zone, dE00: samples.dE00 })
        .from(samples)
        .where(and(eq(samples.purpose, 'pour'), inArray(samples.pourId, pourIds)))
        .all()
    : [];
  return rows.map(({ m, creator }) => {
    const zs = zoneRows.filter((z) => z.matchId === m.id);
    const hasTarget = zs.length > 0 && zs.every((z) => z.targetL !== null);
    return {
      id: m.id,
      name: m.name,
      status: m.status,
      zones: zs.map((z) => z.name),
      tolerance: m.tolerance,
      notes: m.notes,
      target: hasTarget
        ? {
            zones: zs.map((z) => ({
              name: z.name,
              lab: { l: z.targetL!, a: z.targetA!, b: z.targetB! },
              hex: labToHex({ l: z.targetL!, a: z.targetA!, b: z.targetB! }),
              spread: z.targetSpread,
            })),
          }
        : null,
      pours: pourRows
        .filter((p) => p.matchId === m.id)
        .map((p) => ({
          id: p.id,
          number: p.number,
          status: p.status,
          createdAt: p.createdAt,
          zones: sampleRows.filter((s) => s.pourId === p.id).map((s) => ({ name: s.zone, dE00: s.dE00 })),
        })),
      standardPourId: m.standardPourId,
      createdBy: creator,
      createdAt: m.createdAt,
      updatedAt: m.updatedAt,
    };
  });
}

export function getMatch(database: DB, teamId: string, matchId: string): MatchView | null {
  return listMatches(database, teamId, [matchId])[0] ?? null;
}
