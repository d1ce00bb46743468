import 'server-only';
import { and, desc, eq, inArray, isNotNull, sql } from 'drizzle-orm';
import type { DB } from '../open';
import { type PageOf, type PageRequest, afterCursor, cutPage } from './paging';
import { type NewPhoto, type PhotoKind, matches, photos, samples } from '../schema';

// What the API shows of a photo: never its storage key.
const publicColumns = {
  id: photos.id,
  kind: photos.kind,
  width: photos.width,
  height: photos.height,
  size: photos.size,
  fileName: photos.fileName,
  mime: photos.mime,
  createdAt: photos.createdAt,
};

export type PhotoView = { id: string; kind: PhotoKind; width: number; height: number; size: number; fileName: string; mime: string; createdAt: number };

export function insertPhoto(database: Pick<DB, 'insert'>, values: NewPhoto & { id: string }): void {
  database.insert(photos).values(values).run();
}

export function getPhoto(database: DB, teamId: string, photoId: string): PhotoView | null {
  return database.select(publicColumns).from(photos).where(and(eq(photos.teamId, teamId), eq(photos.id, photoId))).get() ?? null;
}

/** The storage key and type of a team's photo, for serving its bytes. */
export function getPhotoFile(database: DB, teamId: string, photoId: string) {
  return (
    database
      .select({ fileKey: photos.fileKey, mime: photos.mime, size: photos.size, fileName: photos.fileName })
      .from(photos)
      .where(and(eq(photos.teamId, teamId), eq(photos.id, photoId)))
      .get() ?? null
  );
}

export type PhotoMatchLink = { id: string; name: string; status: string; use: 'draft' | 'target' | 'pour' | 'batch' | 'swatch' };
export type PhotoListItem = PhotoView & { match: PhotoMatchLink | null };

// The team's recent photos, each with the match it belongs to: the one it was
// measured for (target, pour or batch), or the one holding it as a draft reference.
export function listPhotos(database: DB, teamId: string, limit = 48): PhotoListItem[] {
  return pagePhotos(database, teamId, { limit, cursor: null }).items;
}

// One page of them, newest first (keyset on createdAt, id: photos_team_created_idx).
export function pagePhotos(database: DB, teamId: string, page: PageRequest): PageOf<PhotoListItem> {
  const rows = database.select(publicColumns).from(photos)
    .where(and(eq(photos.teamId, teamId), afterCursor(photos.createdAt, photos.id, page.cursor, 'desc')))
    .orderBy(desc(photos.createdAt), desc(photos.id)).limit(page.limit + 1).all();
  return cutPage(rows, page.limit, (r) => ({ at: r.createdAt, id: r.id }), (kept) => withMatchLinks(database, teamId, kept));
}

function withMatchLinks(database: DB, teamId: string, rows: PhotoView[]): PhotoListItem[] {
  if (rows.length === 0) return [];
  const ids = rows.map((r) => r.id);
  const links = new Map<string, PhotoMatchLink>();
  // The photos' samples through samples_photo_idx, then their matches by id. Without table
  // statistics SQLite would rather walk every sample of the team (one equality) than 48 photo
  // lookups; the unary + keeps the team test out of the index choice while still checking it
  // ("The SQLite Query Optimizer Overview", disqualifying WHERE clause terms using unary "+").
  const uses = database
    .selectDistinct({ photoId: samples.photoId, matchId: samples.matchId, use: samples.purpose })
    .from(samples)
    .where(and(sql`+${samples.teamId} = ${teamId}`, inArray(samples.photoId, ids), isNotNull(samples.matchId)))
    .all();
  const matchIds = [...new Set(uses.map((u) => u.matchId!))];
  const matchOf = new Map(
    (matchIds.length ? database.select({ id: matches.id, name: matches.name, status: matches.status }).from(matches).where(and(eq(matches.teamId, teamId), inArray(matches.id, matchIds))).all() : [])
      .map((m) => [m.id, m]),
  );
  for (const u of uses) {
    const m = matchOf.get(u.matchId!);
    if (m && !links.has(u.photoId)) links.set(u.photoId, { id: m.id, name: m.name, status: m.status, use: u.use });
  }
  const drafts = database
    .select({ photoId: matches.draftPhotoId, id: matches.id, name: matches.name, status: matches.status })
    .from(matches)
    .where(and(sql`+${matches.teamId} = ${teamId}`, inArray(matches.draftPhotoId, ids)))
    .all();
  for (const d of drafts) if (d.photoId && !links.has(d.photoId)) links.set(d.photoId, { id: d.id, name: d.name, status: d.status, use: 'draft' });
  return rows.map((r) => ({ ...r, match: links.get(r.id) ?? null }));
}
