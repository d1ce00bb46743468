import 'server-only';
import { type SQL, and, asc, desc, eq, inArray, or, sql } from 'drizzle-orm';
import { labToHex } from '../../lib/color';
import type { DB } from '../open';
import { type MatchStatus, matches, pours, samples, users, zones } from '../schema';
import { matchReads } from './matchReads';
import { type PageOf, type PageRequest, afterCursor, cutPage } from './paging';

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

export type MatchFilter = { status?: MatchStatus; q?: string };

// The filters in SQL: status, and a search of name and notes (LIKE, case-blind in ASCII).
function matchWhere(teamId: string, filter: MatchFilter): SQL {
  const like = filter.q ? `%${filter.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
  return and(
    eq(matches.teamId, teamId),
    filter.status ? eq(matches.status, filter.status) : undefined,
    like ? or(sql`${matches.name} like ${like} escape '\\'`, sql`${matches.notes} like ${like} escape '\\'`) : undefined,
  )!;
}

const matchColumns = { m: matches, creator: users.name };
type MatchRow = { m: typeof matches.$inferSelect; creator: string | null };

function selectMatches(database: DB, where: SQL | undefined) {
  return database.select(matchColumns).from(matches).leftJoin(users, eq(users.id, matches.createdBy)).where(where);
}

// The team's matches in the API's Match shape, newest activity first.
export function listMatches(database: DB, teamId: string, filter: MatchFilter = {}): MatchView[] {
  return matchViews(database, selectMatches(database, matchWhere(teamId, filter)).orderBy(desc(matches.updatedAt), desc(matches.id)).all());
}

// One page of them: keyset on (updatedAt, id), newest first.
export function pageMatches(database: DB, teamId: string, filter: MatchFilter, page: PageRequest): PageOf<MatchView> {
  const rows = selectMatches(database, and(matchWhere(teamId, filter), afterCursor(matches.updatedAt, matches.id, page.cursor, 'desc')))
    .orderBy(desc(matches.updatedAt), desc(matches.id))
    .limit(page.limit + 1)
    .all();
  return cutPage(rows, page.limit, (r) => ({ at: r.m.updatedAt, id: r.m.id }), (kept) => matchViews(database, kept));
}

// One match, through the prepared reads of db/queries/matchReads.ts.
export function getMatch(database: DB, teamId: string, matchId: string): MatchView | null {
  const reads = matchReads(database);
  const args = { matchId, teamId };
  const row = reads.match.get(args);
  if (!row) return null;
  return assemble([row], {
    zonesOf: new Map([[matchId, reads.zones.all(args).map((r) => r.zones)]]),
    poursOf: new Map([[matchId, reads.pours.all(args)]]),
    samplesOf: groupBy(reads.pourSamples.all(args), (s) => s.pourId ?? ''),
  })[0]!;
}

type Parts = {
  zonesOf: Map<string, (typeof zones.$inferSelect)[]>;
  poursOf: Map<string, { id: string; matchId: string; number: number; status: string; createdAt: number }[]>;
  samplesOf: Map<string, { pourId: string | null; zone: string; dE00: number | null }[]>;
};

// Each match's zones, pours and the pours' ΔE00, read for just these matches and grouped by key.
function matchViews(database: DB, rows: MatchRow[]): MatchView[] {
  if (rows.length === 0) return [];
  const matchIds = rows.map((r) => r.m.id);
  const zonesOf = groupBy(
    database.select().from(zones).where(inArray(zones.matchId, matchIds)).orderBy(asc(zones.matchId), asc(zones.position)).all(),
    (z) => z.matchId,
  );
  const pourRows = database
    .select({ id: pours.id, matchId: pours.matchId, number: pours.number, status: pours.status, createdAt: pours.createdAt })
    .from(pours)
    .where(inArray(pours.matchId, matchIds))
    .orderBy(asc(pours.matchId), asc(pours.number))
    .all();
  const poursOf = groupBy(pourRows, (p) => p.matchId);
  // The pours' samples through the match (samples_match_idx), not a list of every pour id.
  const samplesOf = groupBy(
    database
      .select({ pourId: samples.pourId, zone: samples.zone, dE00: samples.dE00 })
      .from(samples)
      .where(and(inArray(samples.matchId, matchIds), eq(samples.purpose, 'pour')))
      .all(),
    (s) => s.pourId ?? '',
  );
  return assemble(rows, { zonesOf, poursOf, samplesOf });
}

function assemble(rows: MatchRow[], { zonesOf, poursOf, samplesOf }: Parts): MatchView[] {
  return rows.map(({ m, creator }) => {
    const zs = zonesOf.get(m.id) ?? [];
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
      pours: (poursOf.get(m.id) ?? []).map((p) => ({
        id: p.id,
        number: p.number,
        status: p.status,
        createdAt: p.createdAt,
        zones: (samplesOf.get(p.id) ?? []).map((s) => ({ name: s.zone, dE00: s.dE00 })),
      })),
      standardPourId: m.standardPourId,
      createdBy: creator,
      createdAt: m.createdAt,
      updatedAt: m.updatedAt,
    };
  });
}

function groupBy<T>(rows: T[], key: (r: T) => string): Map<string, T[]> {
  const out = new Map<string, T[]>();
  for (const r of rows) {
    const k = key(r);
    const list = out.get(k);
    if (list) list.push(r);
    else out.set(k, [r]);
  }
  return out;
}
