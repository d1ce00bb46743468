import 'server-only';
import type { DB } from '@/db/open';
import { listColorants } from '@/db/queries/libraries';
import { MIN_OBSERVATIONS, startingRecipe } from '@/lib/color';
import { ApiError } from '@/lib/http/api';
import { DOSE_STEP, doseKey, MODELLED_KINDS } from './doseModel';
import { loadMatch } from './loadMatch';
import { shopModel } from './shopModel';

/** The solve tries every set of up to three: this many colorants keeps it near a second. */
const MAX_CANDIDATES = 10;

// A first-pour recipe per zone from the match's target and the shop's characterised colorants
// (or the ones asked for): 409 without a target, 422 naming the colorants to calibrate.
export async function startingRecipeForMatch(database: DB, teamId: string, matchId: string, colorantIds?: string[]) {
  const { zones } = loadMatch(database, teamId, matchId);
  if (zones.length === 0 || zones.some((z) => z.targetL === null)) {
    throw new ApiError(409, 'no_target', 'This match has no target yet: sample every zone on a reference photo first');
  }
  const library = listColorants(database, teamId);
  const modelled = (kind: string) => (MODELLED_KINDS as readonly string[]).includes(kind);
  const { model, typical } = await shopModel(database, teamId);
  const known = (c: { id: string; unit: keyof typeof DOSE_STEP }) => (model?.colorants[doseKey(c.id, c.unit)]?.observations ?? 0) >= MIN_OBSERVATIONS;
  let chosen = library.filter((c) => modelled(c.kind));
  if (colorantIds) {
    chosen = colorantIds.map((id, i) => {
      const c = library.find((x) => x.id === id);
      if (!c) throw new ApiError(400, 'invalid_body', `colorantIds[${i}]: no such colorant in your library (or it was archived)`);
      if (!modelled(c.kind)) throw new ApiError(400, 'invalid_body', `colorantIds[${i}]: ${c.name} is a ${c.kind}; a starting recipe doses pigments, pearls and glow powders`);
      return c;
    });
    const unknown = chosen.filter((c) => !known(c));
    if (unknown.length) throw new ApiError(422, 'not_characterised', `The shop cannot predict these colorants yet; calibrate them with a swatch (or log pours with them): ${unknown.map((c) => c.name).join(', ')}`);
  } else {
    const usable = chosen.filter(known);
    if (usable.length === 0) {
      throw new ApiError(422, 'not_characterised', `The shop cannot predict any colorant yet; calibrate some with a swatch: ${chosen.map((c) => c.name).join(', ') || 'add pigments to the library first'}`);
    }
    chosen = usable;
  }
  if (!model) throw new ApiError(422, 'not_characterised', 'The shop has no logged colours to learn from yet');
  const candidates = chosen
    .map((c) => ({ c, key: doseKey(c.id, c.unit) }))
    .sort((x, y) => (model.colorants[y.key]?.observations ?? 0) - (model.colorants[x.key]?.observations ?? 0))
    .slice(0, MAX_CANDIDATES);
  return {
    zones: zones.map((z) => {
      const target = { l: z.targetL!, a: z.targetA!, b: z.targetB! };
      const r = startingRecipe(model, target, candidates.map(({ c, key }) => ({ key, step: DOSE_STEP[c.unit], typical: typical[key] ?? DOSE_STEP[c.unit] * 4 })))!;
      return {
        zone: z.name,
        recipe: r.lines.map((l) => {
          const { c } = candidates.find((x) => x.key === l.key)!;
          return { colorantId: c.id, colorant: c.name, amount: l.amount, unit: c.unit };
        }),
        predicted: { lab: r.predicted, dE00: r.dE00 },
      };
    }),
  };
}
