import 'server-only';
import { and, desc, eq, inArray } from 'drizzle-orm';
import type { DB } from '../open';
import { pours, samples } from '../schema';
import type { PourSummary } from './matches';
import { type PageOf, type PageRequest, afterCursor, cutPage } from './paging';

// A match's pours as PourSummary, newest first: the whole history, or one page of it
// (keyset on the pour's number, through pours_match_number). The caller has checked
// that the match is the team's; the team is in the WHERE all the same.
function poursQuery(database: DB, teamId: string, matchId: string, page: PageRequest | null) {
  const q = database
    .select({ id: pours.id, number: pours.number, status: pours.status, createdAt: pours.createdAt })
    .from(pours)
    .where(and(eq(pours.matchId, matchId), eq(pours.teamId, teamId), page?.cursor ? afterCursor(pours.number, pours.id, page.cursor, 'desc') : undefined))
    .orderBy(desc(pours.number));
  return page ? q.limit(page.limit + 1).all() : q.all();
}

type PourRow = ReturnType<typeof poursQuery>[number];

function summaries(database: DB, rows: PourRow[]): PourSummary[] {
  if (rows.length === 0) return [];
  const zonesOf = new Map<string, { name: string; dE00: number | null }[]>();
  for (const s of database
    .select({ pourId: samples.pourId, zone: samples.zone, dE00: samples.dE00 })
    .from(samples)
    .where(and(inArray(samples.pourId, rows.map((r) => r.id)), eq(samples.purpose, 'pour')))
    .all()) {
    const list = zonesOf.get(s.pourId!) ?? [];
    list.push({ name: s.zone, dE00: s.dE00 });
    zonesOf.set(s.pourId!, list);
  }
  return rows.map((p) => ({ ...p, zones: zonesOf.get(p.id) ?? [] }));
}

export function listPourSummaries(database: DB, teamId: string, matchId: string): PourSummary[] {
  return summaries(database, poursQuery(database, teamId, matchId, null));
}

export function pagePourSummaries(database: DB, teamId: string, matchId: string, page: PageRequest): PageOf<PourSummary> {
  return cutPage(poursQuery(database, teamId, matchId, page), page.limit, (r) => ({ at: r.number, id: r.id }), (kept) => summaries(database, kept));
}
