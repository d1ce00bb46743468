import 'server-only';
import { and, asc, desc, eq, isNotNull, sql } from 'drizzle-orm';
import type { DB } from '../open';
import { matches, photos, pours, samples, users, zones } from '../schema';

// The reads of one match (GET /api/matches/:id and the match page), prepared once per database
// client: SQLite compiles each statement once and drizzle builds its SQL once, instead of on
// every request. Each takes the team id with the match id.
const id = sql.placeholder('matchId');
const team = sql.placeholder('teamId');

function prepare(database: DB) {
  return {
    match: database.select({ m: matches, creator: users.name }).from(matches).leftJoin(users, eq(users.id, matches.createdBy))
      .where(and(eq(matches.id, id), eq(matches.teamId, team))).prepare(),
    zones: database.select().from(zones).innerJoin(matches, and(eq(matches.id, zones.matchId), eq(matches.teamId, team)))
      .where(eq(zones.matchId, id)).orderBy(asc(zones.position)).prepare(),
    pours: database.select({ id: pours.id, matchId: pours.matchId, number: pours.number, status: pours.status, createdAt: pours.createdAt })
      .from(pours).where(and(eq(pours.matchId, id), eq(pours.teamId, team))).orderBy(asc(pours.number)).prepare(),
    pourSamples: database.select({ pourId: samples.pourId, zone: samples.zone, dE00: samples.dE00 }).from(samples)
      .where(and(eq(samples.matchId, id), eq(samples.purpose, 'pour'), eq(samples.teamId, team))).prepare(),
    targetSamples: database.select({ s: samples, width: photos.width, height: photos.height }).from(samples)
      .innerJoin(photos, eq(photos.id, samples.photoId))
      .where(and(eq(samples.matchId, id), eq(samples.purpose, 'target'), eq(samples.teamId, team)))
      .orderBy(asc(samples.createdAt)).prepare(),
    draft: database.select({ photoId: photos.id, width: photos.width, height: photos.height }).from(matches)
      .innerJoin(photos, and(eq(photos.id, matches.draftPhotoId), eq(photos.teamId, team)))
      .where(and(eq(matches.id, id), eq(matches.teamId, team))).prepare(),
    // The grey card as last marked on any photo of the match (reference, pour or batch): its
    // shape and nominal L*, offered to the next photo's sampler.
    lastNeutral: database.select({ neutral: samples.neutral }).from(samples)
      .where(and(eq(samples.teamId, team), eq(samples.matchId, id), isNotNull(samples.neutral)))
      .orderBy(desc(samples.createdAt)).limit(1).prepare(),
  };
}

const cache = new WeakMap<DB, ReturnType<typeof prepare>>();

export function matchReads(database: DB) {
  let reads = cache.get(database);
  if (!reads) cache.set(database, (reads = prepare(database)));
  return reads;
}
