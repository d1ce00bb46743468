import type { Draw, Undrawn } from './batchDraws';

export type CostMold = { id: string; name: string; cavities: number; mlPerCavity: number; baits?: number | null };

// The cost of a batch from its draws (amount in the colorant's unit × cost per
// unit). A line without a cost, or one whose amount could not be converted,
// is named in `missing` and left out of the total, which is then a lower
// bound, never a silent zero. Per bait in a mold: the batch's cost per mL of
// mixed plastisol × what one bait takes (mL per cavity + its share of the
// sprue allowance per shot).
export function batchCost(opts: { draws: Draw[]; undrawn: Undrawn[]; batchMl: number; sprueAllowanceMl: number; molds: CostMold[]; baits?: number | null }) {
  const lines = opts.draws.map((d) => ({ colorantId: d.colorantId, name: d.name, amount: d.amount, unit: d.unit, cost: d.costPerUnit === null ? null : d.amount * d.costPerUnit }));
  const missing = [
    ...lines.filter((l) => l.cost === null).map((l) => l.name),
    ...opts.undrawn.map((u) => u.name).filter((n) => !lines.some((l) => l.name === n && l.cost === null)),
  ].filter((n, i, all) => all.indexOf(n) === i);
  const total = lines.reduce((s, l) => s + (l.cost ?? 0), 0);
  const perMl = opts.batchMl > 0 ? total / opts.batchMl : 0;
  const molds = opts.molds.map((m) => {
    const mlPerBait = m.mlPerCavity + opts.sprueAllowanceMl / m.cavities;
    return { id: m.id, name: m.name, mlPerBait, perBait: perMl * mlPerBait };
  });
  return {
    total,
    complete: missing.length === 0,
    missing,
    lines,
    perMl,
    perBait: opts.baits && opts.baits > 0 ? total / opts.baits : null,
    molds,
  };
}

export type BatchCost = ReturnType<typeof batchCost>;
