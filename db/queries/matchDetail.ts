import 'server-only';
import type { Shape } from '../../lib/color/types';
import type { DB } from '../open';
import type { NeutralMark } from './light';
import { matchReads } from './matchReads';
import { getMatch, type MatchView } from './matches';

export type TargetPhoto = { photoId: string; width: number; height: number; zones: { name: string; shape: Shape; lab: { l: number; a: number; b: number }; hex: string }[] };
export type TargetDetail = {
  /** `uncertainty`: the ± (ΔE00, about 95 %) of the target colour, the mean of its reference photos' (as addPour uses it). */
  zones: { name: string; lab: { l: number; a: number; b: number }; hex: string; spread: number | null; flakeCoverage: number | null; flakeCoverageUncertainty: number | null; uncertainty: number | null }[];
  photos: TargetPhoto[];
};
export type DraftPhoto = { photoId: string; width: number; height: number };
export type MatchDetail = Omit<MatchView, 'target'> & { target: TargetDetail | null; targetPhotos: TargetPhoto[]; draft: DraftPhoto | null; lastNeutral: NeutralMark | null; targetHasCard: boolean };

// A match with the reference photos its target was sampled on and each
// zone's region, for the bench. `target` keeps the API's shape, with extras.
export function getMatchDetail(database: DB, teamId: string, matchId: string): MatchDetail | null {
  const match = getMatch(database, teamId, matchId);
  if (!match) return null;
  const reads = matchReads(database);
  const args = { matchId, teamId };
  const rows = reads.targetSamples.all(args);
  const byPhoto = new Map<string, TargetPhoto>();
  for (const { s, width, height } of rows) {
    const p = byPhoto.get(s.photoId) ?? { photoId: s.photoId, width, height, zones: [] };
    p.zones.push({ name: s.zone, shape: s.shape as Shape, lab: { l: s.l, a: s.a, b: s.b }, hex: s.hex });
    byPhoto.set(s.photoId, p);
  }
  const targetPhotos = [...byPhoto.values()];
  const flakeOf = (zone: string) => {
    const zs = rows.filter((r) => r.s.zone === zone).map((r) => (r.s.flake as { coverage: number }).coverage);
    return zs.length ? zs.reduce((a, b) => a + b, 0) / zs.length : null;
  };
  // The ± of the mean coverage: the mean of the photos' ± (like the colour's: their systematic parts do not average out).
  const flakeUncertaintyOf = (zone: string) => {
    const us = rows.filter((r) => r.s.zone === zone).map((r) => (r.s.flake as { coverageUncertainty?: number }).coverageUncertainty);
    // Photos measured before the ± existed have none: then the mean has none either.
    return us.length && us.every((u) => typeof u === 'number') ? (us as number[]).reduce((a, b) => a + b, 0) / us.length : null;
  };
  const uncertaintyOf = (zone: string) => {
    const us = rows.filter((r) => r.s.zone === zone && r.s.uncertainty !== null).map((r) => r.s.uncertainty!);
    return us.length ? us.reduce((a, b) => a + b, 0) / us.length : null;
  };
  const target = match.target
    ? { zones: match.target.zones.map((z) => ({ ...z, flakeCoverage: flakeOf(z.name), flakeCoverageUncertainty: flakeUncertaintyOf(z.name), uncertainty: uncertaintyOf(z.name) })), photos: targetPhotos }
    : null;
  // A reference photo uploaded but not yet measured (kept across reloads).
  const draft = reads.draft.get(args) ?? null;
  // Whether a reference was corrected from a grey card, from the target samples read above.
  const hasCard = rows.some((r) => Boolean((r.s.whiteBalance as { applied?: boolean } | null)?.applied));
  return { ...match, target, targetPhotos, draft, lastNeutral: (reads.lastNeutral.get(args)?.neutral as NeutralMark | undefined) ?? null, targetHasCard: hasCard };
}
