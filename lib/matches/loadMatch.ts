import 'server-only';
import { and, asc, eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { matches, zones } from '@/db/schema';
import { ApiError } from '@/lib/http/api';

// A match of the team with its zones, or 404 — the same for another team's id.
export function loadMatch(database: Pick<DB, 'select'>, teamId: string, matchId: string) {
  const match = database.select().from(matches).where(and(eq(matches.id, matchId), eq(matches.teamId, teamId))).get();
  if (!match) throw new ApiError(404, 'not_found', 'No such match in your team');
  const zoneRows = database.select().from(zones).where(eq(zones.matchId, matchId)).orderBy(asc(zones.position)).all();
  return { match, zones: zoneRows };
}

export function assertZonesOfMatch(names: string[], zoneRows: { name: string }[], field = 'zones') {
  const known = new Set(zoneRows.map((z) => z.name));
  names.forEach((n, i) => {
    if (!known.has(n)) {
      throw new ApiError(400, 'invalid_body', `${field}[${i}].name: "${n}" is not a zone of this match (zones: ${[...known].join(', ')})`);
    }
  });
}
