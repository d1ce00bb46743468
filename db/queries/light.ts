import 'server-only';
import { and, eq } from 'drizzle-orm';
import type { Shape } from '../../lib/color/types';
import type { DB } from '../open';
import { type Sample, samples } from '../schema';

export type NeutralMark = { shape: Shape; L?: number };
export type LightState = { corrected: boolean; referenceCorrected: boolean };

const applied = (s: Pick<Sample, 'whiteBalance'>) => Boolean((s.whiteBalance as { applied?: boolean } | null)?.applied);

/** Whether any reference photo of the match was corrected from a grey card. */
export function targetHasCard(database: DB, teamId: string, matchId: string): boolean {
  return database
    .select({ whiteBalance: samples.whiteBalance })
    .from(samples)
    .where(and(eq(samples.teamId, teamId), eq(samples.matchId, matchId), eq(samples.purpose, 'target')))
    .all()
    .some(applied);
}

/** Light of a compared photo against its reference: both corrected, or one not. */
export function lightState(zoneSamples: Pick<Sample, 'whiteBalance'>[], referenceCorrected: boolean): LightState {
  return { corrected: zoneSamples.some(applied), referenceCorrected };
}
