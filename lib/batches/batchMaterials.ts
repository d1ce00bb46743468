import 'server-only';
import { and, asc, eq, inArray, isNull } from 'drizzle-orm';
import type { DB } from '@/db/open';
import { colorants, recipeLines } from '@/db/schema';
import { batchCost, batchDraws, ML_PER_CUP, type CostMold, type DrawColorant } from '@/lib/recipes';

type Reader = Pick<DB, 'select'>;

const colorantCols = { id: colorants.id, name: colorants.name, unit: colorants.unit, costPerUnit: colorants.costPerUnit, stock: colorants.stock, lowStockAt: colorants.lowStockAt };

// The base a batch's plastisol comes from when it names none: the shop's
// first plastisol base still in the library.
export function defaultBase(database: Reader, teamId: string) {
  return database.select(colorantCols).from(colorants)
    .where(and(eq(colorants.teamId, teamId), eq(colorants.kind, 'base'), isNull(colorants.archivedAt)))
    .orderBy(asc(colorants.createdAt), asc(colorants.name)).get() ?? null;
}

export function getBase(database: Reader, teamId: string, id: string) {
  return database.select(colorantCols).from(colorants).where(and(eq(colorants.teamId, teamId), eq(colorants.id, id))).get() ?? null;
}

// What a batch of a standard takes from stock: the standard's recipe for each
// zone's own cups, and the batch's plastisol from its base (lib/recipes
// batchDraws), with each colorant's stock and cost as they are now.
// `standard`: the standard's recipe and colorants when the caller read them already (a list
// of batches of one standard reads them once).
export function batchMaterials(database: Reader, teamId: string, opts: { standardPourId: string; zoneCups: { zone: string; cups: number }[]; base: DrawColorant | null; dropsPerMl: number; standard?: StandardRecipe }) {
  const { recipe, colorants: rows } = opts.standard ?? standardRecipe(database, teamId, opts.standardPourId);
  return { ...batchDraws({ zoneCups: opts.zoneCups, recipe, colorants: rows, base: opts.base, dropsPerMl: opts.dropsPerMl }), colorants: rows };
}

// A standard pour's recipe per cup, with its colorants' stock and cost as they are now.
export function standardRecipe(database: Reader, teamId: string, standardPourId: string) {
  const recipe = database.select({ zone: recipeLines.zone, colorantId: recipeLines.colorantId, amount: recipeLines.amount, unit: recipeLines.unit })
    .from(recipeLines).where(eq(recipeLines.pourId, standardPourId)).orderBy(asc(recipeLines.position)).all();
  const ids = [...new Set(recipe.map((l) => l.colorantId))];
  const rows = ids.length ? database.select(colorantCols).from(colorants).where(and(eq(colorants.teamId, teamId), inArray(colorants.id, ids))).all() : [];
  return { recipe, colorants: rows };
}
export type StandardRecipe = ReturnType<typeof standardRecipe>;

// The batch's cost from its materials, per bait of the batch (actual count,
// else expected) and per bait in each mold it names.
export function costOfBatch(
  database: Reader,
  teamId: string,
  opts: { standardPourId: string; zoneCups: { zone: string; cups: number }[]; base: DrawColorant | null; dropsPerMl: number; sprueAllowanceMl: number; molds: CostMold[]; baits: number | null; standard?: StandardRecipe },
) {
  const m = batchMaterials(database, teamId, opts);
  const cups = opts.zoneCups.reduce((s, z) => s + z.cups, 0);
  const cost = batchCost({ draws: m.draws, undrawn: m.undrawn, batchMl: cups * ML_PER_CUP, sprueAllowanceMl: opts.sprueAllowanceMl, molds: opts.molds, baits: opts.baits });
  if (!opts.base) cost.missing.push('plastisol base (none in the library)');
  cost.complete = cost.missing.length === 0;
  return cost;
}

// What one cup of a standard costs (its zones split evenly, plastisol from the
// shop's default base) and a bait of it in the standard's mold.
export function standardCost(database: Reader, teamId: string, opts: { standardPourId: string; zones: string[]; mold: CostMold | null; dropsPerMl: number; sprueAllowanceMl: number }) {
  const names = opts.zones.length ? opts.zones : [''];
  return costOfBatch(database, teamId, {
    standardPourId: opts.standardPourId,
    zoneCups: names.map((zone) => ({ zone, cups: 1 / names.length })),
    base: defaultBase(database, teamId),
    dropsPerMl: opts.dropsPerMl,
    sprueAllowanceMl: opts.sprueAllowanceMl,
    molds: opts.mold ? [opts.mold] : [],
    baits: null,
  });
}
