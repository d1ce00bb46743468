import type { DB } from '@/db/open';
import { doseKey, loadDoseSteps } from '@/db/queries/doseSteps';
import { getPour } from '@/db/queries/pours';
import type { DoseUnit } from '@/db/schema';
import { estimateColorantEffects, suggestAdjustment } from '@/lib/color';
import { ApiError } from '@/lib/http/api';

// The smallest step each unit is dosed in at the bench.
const STEP: Record<DoseUnit, number> = { drops: 0.5, tsp: 1 / 32, g: 0.1, ml: 0.1 };

export type ZoneSuggestion =
  | { zone: string; status: 'within_tolerance'; dE00: number }
  | { zone: string; status: 'no_history'; dE00: number; reason: string }
  | {
      zone: string;
      status: 'suggested';
      dE00: number;
      changes: { colorantId: string; colorant: string; unit: DoseUnit; from: number; to: number }[];
      predicted: { lab: { l: number; a: number; b: number }; dE00: number };
      basis: { steps: number };
    };

// For each zone outside the tolerance: the dose changes per cup that the
// team's own history says should bring the next pour closer to the target.
export function suggestNextPour(database: DB, teamId: string, pourId: string, tolerance: number) {
  const pour = getPour(database, teamId, pourId);
  if (!pour) throw new ApiError(404, 'not_found', 'No such pour in your team');
  const effects = estimateColorantEffects(loadDoseSteps(database, teamId));
  const zones: ZoneSuggestion[] = pour.zones.map((z) => {
    if (z.dE00 <= tolerance) return { zone: z.name, status: 'within_tolerance', dE00: z.dE00 };
    const lines = pour.recipe.filter((l) => l.zone === z.name);
    const adj = suggestAdjustment(
      z.lab,
      z.target.lab,
      lines.map((l) => ({ key: doseKey(l.colorantId, l.unit), amount: l.amount, step: STEP[l.unit] })),
      effects,
    );
    if (!adj || adj.changes.length === 0) {
      const reason = lines.length === 0
        ? 'No recipe is recorded for this zone.'
        : 'Not enough history yet: the shop has no earlier pour-to-pour change of these colorants to learn from. Change one colorant at a time and the next pours will teach it.';
      return { zone: z.name, status: 'no_history', dE00: z.dE00, reason };
    }
    const byKey = new Map(lines.map((l) => [doseKey(l.colorantId, l.unit), l]));
    return {
      zone: z.name,
      status: 'suggested',
      dE00: z.dE00,
      changes: adj.changes.map((c) => {
        const l = byKey.get(c.key)!;
        return { colorantId: l.colorantId, colorant: l.colorant, unit: l.unit, from: c.from, to: c.to };
      }),
      predicted: { lab: adj.predicted, dE00: adj.predictedDE00 },
      basis: { steps: Math.max(...adj.changes.map((c) => effects[c.key]?.steps ?? 0)) },
    };
  });
  return { pourId, number: pour.number, zones };
}
