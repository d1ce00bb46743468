import { price } from '@/components/production/sheet-production';
import { trimmed, unitLabel } from '@/lib/format';
import { batchCost, batchDraws, type DrawColorant, type RunPlan } from '@/lib/recipes';
import type { PlannerStandard } from './types';

export type PlannerColorant = DrawColorant & { stock: number | null };

// What the planned run takes from the shelf and what it costs: each side's
// doses for its own cups and the plastisol from the shop's base (the same
// arithmetic a logged batch draws by), against the stock on the shelf now.
export function PlanMaterials({ plan, std, colorants, baseId, currency, dropsPerMl, sprueAllowanceMl }: {
  plan: RunPlan; std: PlannerStandard; colorants: PlannerColorant[]; baseId: string | null; currency: string; dropsPerMl: number; sprueAllowanceMl: number;
}) {
  const base = colorants.find((c) => c.id === baseId) ?? null;
  // A recipe line of a colorant since archived is named, not priced.
  const recipe = std.recipe.filter((l) => colorants.some((c) => c.id === l.colorantId));
  const gone = std.recipe.filter((l) => !recipe.includes(l)).map((l) => ({ colorantId: l.colorantId, name: `${l.colorant} (archived)`, reason: 'no longer in the library' }));
  const drawn = batchDraws({ zoneCups: plan.zones.map((z) => ({ zone: z.zone, cups: z.cups })), recipe, colorants, base, dropsPerMl });
  const draws = drawn.draws;
  const undrawn = [...drawn.undrawn, ...gone];
  const used = plan.molds.filter((m) => m.shots > 0);
  const cost = batchCost({ draws, undrawn, batchMl: plan.mixedMl, sprueAllowanceMl, molds: used, baits: plan.baits });
  const atLeast = cost.complete ? '' : 'at least ';
  const short = draws.filter((d) => {
    const c = colorants.find((x) => x.id === d.colorantId);
    return c?.stock !== null && c?.stock !== undefined && c.stock < d.amount;
  });
  return (
    <div className="space-y-2 text-sm">
      <h3 className="font-semibold">Cost and stock</h3>
      <p className="num">Run: {atLeast}{price(cost.total, currency)}{cost.perBait !== null ? ` · ${atLeast}${price(cost.perBait, currency)} per bait` : ''}</p>
      {cost.molds.length > 1 ? <ul className="num">{cost.molds.map((m) => <li key={m.id}>A bait in {m.name}: {price(m.perBait, currency)}</li>)}</ul> : null}
      {cost.missing.length ? <p>No cost in the library for {cost.missing.join(', ')}: left out of these figures.</p> : null}
      <ul className="num">
        {draws.map((d) => {
          const c = colorants.find((x) => x.id === d.colorantId);
          return (
            <li key={d.colorantId}>
              {d.name}: {trimmed(d.amount)} {unitLabel(d.unit)}
              {c?.stock === null || c?.stock === undefined ? ' (stock not kept)' : ` of ${trimmed(c.stock)} on the shelf`}
            </li>
          );
        })}
      </ul>
      {short.length ? <p role="status" className="font-medium"><span aria-hidden>▲ </span>Not enough on the shelf for {short.map((d) => d.name).join(', ')}: the batch can still be logged, and stock goes below zero.</p> : null}
    </div>
  );
}
