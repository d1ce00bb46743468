import 'server-only';
import { and, eq, inArray } from 'drizzle-orm';
import type { DB } from '@/db/open';
import type { Member } from '@/db/queries/members';
import { matches, samples, zones } from '@/db/schema';
import { deltaE2000, type Lab } from '@/lib/color';
import { recordAudit } from '@/lib/audit';
import { ApiError } from '@/lib/http/api';
import type { TargetInput } from '@/lib/validations/match';
import { assertZonesOfMatch, loadMatch } from './loadMatch';
import { insertSample } from './insertSample';
import { measureZones } from './measureZones';

// Samples the target zones on a reference photo. Sampling the same photo again
// replaces its earlier samples; with several reference photos, each zone's
// target is the mean in Lab of the photos' samples, and its spread the largest
// ΔE00 of a photo's sample from that mean.
export async function setTarget(database: DB, member: Member, matchId: string, input: TargetInput) {
  const { match, zones: zoneRows } = loadMatch(database, member.team.id, matchId);
  if (match.status === 'archived') throw new ApiError(409, 'archived', 'This match is archived; its target cannot change');
  if (match.status === 'approved' || match.status === 'in_review') {
    throw new ApiError(409, 'locked', `This match is ${match.status.replace('_', ' ')}: its target is locked`);
  }
  assertZonesOfMatch(input.zones.map((z) => z.name), zoneRows);
  const measured = await measureZones(database, member.team.id, input.photoId, input.zones, input.neutral);
  const names = input.zones.map((z) => z.name);
  database.transaction((tx) => {
    tx.delete(samples)
      .where(and(eq(samples.matchId, matchId), eq(samples.purpose, 'target'), eq(samples.photoId, input.photoId), inArray(samples.zone, names)))
      .run();
    measured.regions.forEach((region, i) => {
      insertSample(tx, {
        teamId: member.team.id, photoId: input.photoId, of: { purpose: 'target', matchId }, region,
        shape: input.zones[i]!.shape, neutral: input.neutral, whiteBalance: measured.whiteBalance,
      });
    });
    // The draft reference photo is now a measured one.
    if (match.draftPhotoId === input.photoId) tx.update(matches).set({ draftPhotoId: null }).where(eq(matches.id, matchId)).run();
    for (const name of names) {
      const rows = tx.select({ l: samples.l, a: samples.a, b: samples.b }).from(samples)
        .where(and(eq(samples.matchId, matchId), eq(samples.purpose, 'target'), eq(samples.zone, name))).all();
      const mean: Lab = {
        l: rows.reduce((s, r) => s + r.l, 0) / rows.length,
        a: rows.reduce((s, r) => s + r.a, 0) / rows.length,
        b: rows.reduce((s, r) => s + r.b, 0) / rows.length,
      };
      const spread = rows.length > 1 ? Math.max(...rows.map((r) => deltaE2000(mean, r))) : 0;
      tx.update(zones).set({ targetL: mean.l, targetA: mean.a, targetB: mean.b, targetSpread: spread })
        .where(and(eq(zones.matchId, matchId), eq(zones.name, name))).run();
    }
    tx.update(matches).set({ updatedAt: Date.now() }).where(eq(matches.id, matchId)).run();
    recordAudit(tx, { teamId: member.team.id, actorId: member.user.id, action: 'match.target_sampled', entity: 'match', entityId: matchId, data: { photoId: input.photoId, zones: names } });
  });
}
