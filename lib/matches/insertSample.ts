import 'server-only';
import type { DB } from '@/db/open';
import { samples } from '@/db/schema';
import type { LabComparison, Shape } from '@/lib/color';
import type { NeutralPatch, PhotoMeasure } from '@/lib/image';
import { newId } from '@/lib/ids';
import type { comparedExtras } from './measureZones';

/** What a sample belongs to: a match's target, one of its pours, or a batch of its standard. */
export type SampleOf =
  | { purpose: 'target'; matchId: string }
  | { purpose: 'pour'; matchId: string; pourId: string }
  | { purpose: 'batch'; matchId: string; batchId: string };

export type SampleInput = {
  teamId: string;
  photoId: string;
  of: SampleOf;
  region: PhotoMeasure['regions'][number];
  shape: Shape;
  neutral?: NeutralPatch | null;
  whiteBalance: PhotoMeasure['whiteBalance'];
  /** For a pour or batch zone: the comparison with the target or standard, and its extras. */
  compared?: { cmp: LabComparison; extras: ReturnType<typeof comparedExtras> };
};

// One measured zone stored as a sample row: the one place the row is written, for targets,
// pours and batches alike (in the caller's transaction).
export function insertSample(tx: Pick<DB, 'insert'>, s: SampleInput): void {
  const r = s.region;
  tx.insert(samples)
    .values({
      id: newId(), teamId: s.teamId, photoId: s.photoId, ...s.of, zone: r.name, shape: s.shape, neutral: s.neutral ?? null,
      l: r.lab.l, a: r.lab.a, b: r.lab.b, hex: r.hex, pixels: r.pixels, kept: r.kept, spread: r.spread, glare: r.glare, flake: r.flake,
      whiteBalance: s.whiteBalance, uncertainty: r.uncertainty, shading: r.shading, other: r.other,
      ...(s.compared ? { dE00: s.compared.cmp.dE00, dL: s.compared.cmp.dL, dC: s.compared.cmp.dC, dH: s.compared.cmp.dH, ...s.compared.extras } : {}),
    })
    .run();
}
