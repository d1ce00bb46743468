import 'server-only';
import { and, eq } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { matches, photos } from '@/db/schema';
import { ApiError } from '@/lib/http/api';
import { loadMatch } from './loadMatch';

// Keeps an uploaded reference photo with its match as a draft target (or lets
// it go with photoId null), so a reload or a walk away before "Measure and
// save target" does not lose it. Only while the target may still change.
export function setDraftPhoto(database: DB, member: Member, matchId: string, photoId: string | null) {
  const teamId = member.team.id;
  const { match } = loadMatch(database, teamId, matchId);
  if (match.status !== 'open') {
    throw new ApiError(409, 'locked', `This match is ${match.status.replace('_', ' ')}: its target cannot change, so it takes no draft reference photo`);
  }
  if (photoId) {
    const photo = database.select({ id: photos.id }).from(photos).where(and(eq(photos.id, photoId), eq(photos.teamId, teamId))).get();
    if (!photo) throw new ApiError(400, 'invalid_body', 'photoId: no such photo in your team');
  }
  database.update(matches).set({ draftPhotoId: photoId }).where(eq(matches.id, match.id)).run();
}
