import Link from 'next/link';
import { Figure } from '@/components/ui/figure';
import { formatDose, formatMl, formatVolume } from '@/lib/format';
import { encodeBatchPrefill, ML_PER_CUP, VOLUME_LABEL, type RunPlan, type VolumeUnit } from '@/lib/recipes';
import type { PlannerStandard } from './types';
import { PlanMaterials, type PlannerColorant } from './plan-materials';

export type Shelf = { colorants: PlannerColorant[]; baseId: string | null; currency: string; dropsPerMl: number; sprueAllowanceMl: number };

const th = 'border-b border-panel-line p-2 text-left font-semibold';
const td = 'border-b border-panel-line p-2 align-top';
const mlOf = formatMl;

// What a run plan comes to: yield per mold and in all, plastisol per side
// with its scaled recipe, sprue and leftover, and a link that opens the batch
// form pre-filled with it.
export function PlanResult({ plan, std, unit, laminate, shelf }: { plan: RunPlan; std: PlannerStandard; unit: VolumeUnit; laminate: boolean; shelf: Shelf }) {
  const used = plan.molds.filter((m) => m.shots > 0);
  const href = `/matches/${std.matchId}?${encodeBatchPrefill({
    cups: plan.mixedCups,
    zoneCups: laminate ? plan.zones.map((z) => ({ zone: z.zone, cups: z.cups })) : null,
    plan: used.map((m) => ({ moldId: m.id, shots: m.shots })),
    moldId: used.find((m) => m.id === std.moldId)?.id ?? used[0]?.id ?? null,
  })}`;
  return (
    <section aria-label="Run plan" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <h2 className="text-lg font-semibold">The plan</h2>
      <dl className="grid grid-cols-2 gap-x-4 gap-y-2 text-sm sm:grid-cols-4">
        <Figure label="Baits in all"><span className="num text-xl font-semibold">{plan.baits}</span></Figure>
        <Figure label="Plastisol the shots take"><span className="num">{formatVolume(plan.neededCups, unit)} ({mlOf(plan.neededMl)})</span></Figure>
        <Figure label="To mix"><span className="num">{formatVolume(plan.mixedCups, unit)}</span></Figure>
        <Figure label="Left over"><span className="num">{mlOf(plan.leftoverMl)}</span></Figure>
      </dl>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm" aria-label="Yield per mold">
          <thead><tr><th className={th}>Mold</th><th className={`${th} text-right`}>Shots</th><th className={`${th} text-right`}>Baits</th><th className={`${th} text-right`}>Plastisol</th></tr></thead>
          <tbody>
            {plan.molds.map((m) => (
              <tr key={m.id}>
                <td className={td}>{m.name}</td>
                <td className={`${td} num text-right font-semibold`}>{m.shots}</td>
                <td className={`${td} num text-right`}>{m.baits}</td>
                <td className={`${td} num text-right`}>{mlOf(m.ml)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="mt-1 text-xs">Each shot takes mL per cavity × cavities + the shop’s sprue allowance ({mlOf(plan.sprueMl)} of sprue in all). 1 cup = 236.59 mL.</p>
      </div>
      <div className="space-y-3">
        {plan.zones.map((z) => (
          <div key={z.zone} className="rounded-md border border-panel-line p-3">
            <h3 className="font-semibold"><span className="capitalize">{z.zone || 'The colour'}</span>: <span className="num">{formatVolume(z.cups, unit)}{unit === 'ml' ? '' : ` (${mlOf(z.ml)})`}</span>
              {laminate ? <span className="num font-normal"> — {Math.round(z.share * 100)} % of each shot, its own cup</span> : null}</h3>
            {z.recipe.length === 0 ? <p className="text-sm">Plain plastisol: no colorants recorded.</p> : (
              <ul className="num text-sm">{z.recipe.map((l, i) => <li key={`${l.colorantId}-${i}`}><span className="font-semibold">{formatDose(l.total, l.unit)}</span> {l.name} <span className="text-ink-soft">({formatDose(l.perCup, l.unit)} per cup)</span></li>)}</ul>
            )}
          </div>
        ))}
        <p className="text-xs">{plan.direction === 'baits' ? `Each side is rounded up to a whole ${unit === 'ml' ? '10 mL' : '¼ cup'}: the leftover is what that rounding adds.` : 'What is left over is less than one more shot of any mold.'} In {VOLUME_LABEL[unit]}, the shop’s batch size unit; {ML_PER_CUP.toFixed(2)} mL a cup.</p>
      </div>
      <PlanMaterials plan={plan} std={std} {...shelf} />
      <Link href={href} className="inline-flex min-h-tap items-center rounded-md bg-accent px-4 font-medium text-white">Log as batch</Link>
    </section>
  );
}
