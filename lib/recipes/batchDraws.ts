import type { DoseUnit } from '@/db/schema';
import { convertDose } from './convertDose';
import { ML_PER_CUP } from './units';

export type DrawColorant = { id: string; name: string; unit: DoseUnit; costPerUnit: number | null };
export type DrawLine = { zone: string; colorantId: string; amount: number; unit: DoseUnit };
export type Draw = { colorantId: string; name: string; unit: DoseUnit; amount: number; costPerUnit: number | null; plastisol: boolean };
export type Undrawn = { colorantId: string; name: string; reason: string };

// What one batch takes from the shelf: each zone's per-cup doses times that
// zone's own cups, and the plastisol of the whole batch from the base it is
// mixed from, each converted to the colorant's library unit (its stock unit;
// convertDose: drops through the dropper setting, teaspoons by 1/48 cup) and
// summed per colorant. A dose that cannot be converted (grams against a volume
// unit) is named, not guessed.
export function batchDraws(opts: {
  zoneCups: { zone: string; cups: number }[];
  recipe: DrawLine[];
  colorants: DrawColorant[];
  base: DrawColorant | null;
  dropsPerMl: number;
}) {
  const byId = new Map(opts.colorants.map((c) => [c.id, c]));
  const draws = new Map<string, Draw>();
  const undrawn: Undrawn[] = [];
  const add = (c: DrawColorant, amount: number, plastisol: boolean) => {
    const d = draws.get(c.id) ?? { colorantId: c.id, name: c.name, unit: c.unit, amount: 0, costPerUnit: c.costPerUnit, plastisol: false };
    d.amount += amount;
    d.plastisol ||= plastisol;
    draws.set(c.id, d);
  };
  for (const z of opts.zoneCups) {
    for (const l of opts.recipe.filter((r) => r.zone === z.zone)) {
      const c = byId.get(l.colorantId);
      if (!c) throw new RangeError(`colorant ${l.colorantId} is not in the list`);
      const amount = convertDose(l.amount * z.cups, l.unit, c.unit, opts.dropsPerMl);
      if (amount === null) undrawn.push({ colorantId: c.id, name: c.name, reason: `dosed in ${l.unit}, kept in ${c.unit}: no conversion without a density` });
      else add(c, amount, false);
    }
  }
  if (opts.base) {
    const totalMl = opts.zoneCups.reduce((s, z) => s + z.cups, 0) * ML_PER_CUP;
    const amount = convertDose(totalMl, 'ml', opts.base.unit, opts.dropsPerMl);
    if (amount === null) undrawn.push({ colorantId: opts.base.id, name: opts.base.name, reason: `kept in ${opts.base.unit}: no conversion from mL without a density` });
    else add(opts.base, amount, true);
  }
  return { draws: [...draws.values()], undrawn };
}
