import Link from 'next/link';
import { Figure } from '@/components/ui/figure';
import { StatusBadge } from '@/components/match/status-badge';
import type { StandardView as StandardRow } from '@/db/queries/standards';
import type { BatchCost } from '@/lib/recipes';
import { formatDose, formatLab, formatTemp } from '@/lib/format';
import { price } from './sheet-production';
import { PassBadge } from './pass-badge';
import { When } from '@/components/ui/when';

type StandardView = StandardRow & { cost?: BatchCost & { currency: string } };

const linkClass = 'inline-flex min-h-tap items-center rounded-md border border-panel-line bg-white px-4 font-medium';

// The team's approved colours: per standard, its zones on the grey stage with
// their Lab, the recipe per cup, the tolerance and how its batches have gone.
export function StandardsList({ standards, canLog = false }: { standards: StandardView[]; canLog?: boolean }) {
  if (standards.length === 0) {
    return <p className="rounded-lg border border-panel-line bg-white p-4 text-ink-soft">No standards yet. When a lead approves a submitted pour on its match page, its colour and recipe become the match’s standard and show here.</p>;
  }
  return (
    <ul aria-label="Standards" className="space-y-4">
      {standards.map((s) => (
        <li key={s.matchId} className="rounded-lg border border-panel-line bg-white p-4">
          <article aria-label={s.name} className="space-y-3">
            <header className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <h2 className="text-xl font-semibold">
                <Link href={`/matches/${s.matchId}?pour=${s.standardPourId}`} className="inline-flex min-h-tap items-center underline decoration-panel-line underline-offset-4">{s.name}</Link>
              </h2>
              <StatusBadge status={s.status} />
              {canLog ? (
                <Link href={`/matches/${s.matchId}?log=batch#batches`} className="ml-auto inline-flex min-h-tap items-center rounded-md bg-accent px-4 font-medium text-white hover:bg-accent-strong">
                  Log a batch<span className="sr-only"> of {s.name}</span>
                </Link>
              ) : null}
            </header>
            <p className="text-sm text-ink-soft">
              Standard: pour #{s.standardPourNumber}
              {s.approvedBy ? ` · approved by ${s.approvedBy}` : ''}
              {s.approvedAt ? <> on <When at={s.approvedAt} dayOnly /></> : ''}
            </p>
            <ul aria-label={`${s.name} colours`} className="flex flex-wrap gap-4 rounded-md bg-stage p-4">
              {s.zones.map((z) => (
                <li key={z.name} className="w-32 sm:w-36">
                  <div className="h-20 rounded-sm border border-stage-rule" style={{ background: z.hex }} />
                  <p className="mt-1 text-sm font-semibold capitalize text-white">{z.name}</p>
                  <p className="num text-xs text-white">{formatLab(z.lab)}</p>
                </li>
              ))}
            </ul>
            <dl className="grid grid-cols-2 gap-x-4 gap-y-2 text-sm sm:grid-cols-4">
              <Figure label="Tolerance"><span className="num">{s.tolerance.toFixed(1)} ΔE00</span></Figure>
              <Figure label="Batches"><span className="num">{s.batchCount}</span></Figure>
              <Figure label="Last batch">
                {s.lastBatch ? (
                  <span className="flex flex-wrap items-center gap-2"><PassBadge pass={s.lastBatch.pass} /><span className="num"><When at={s.lastBatch.createdAt} dayOnly /></span></span>
                ) : (
                  'none yet'
                )}
              </Figure>
              {s.cost ? (
                <Figure label="Cost">
                  <span className="num">{s.cost.complete ? '' : '≥ '}{price(s.cost.total, s.cost.currency)} a cup{s.cost.molds[0] ? ` · ${s.cost.complete ? '' : '≥ '}${price(s.cost.molds[0].perBait, s.cost.currency)} a bait in ${s.cost.molds[0].name}` : ''}</span>
                  {s.cost.missing.length ? <span className="block text-xs font-normal">no cost for {s.cost.missing.join(', ')}</span> : null}
                </Figure>
              ) : null}
              <Figure label="Temperature">
                <span className="num">{s.tempF === null ? 'not recorded' : formatTemp(s.tempF)}</span>
              </Figure>
            </dl>
            <div>
              <h3 className="text-sm font-semibold">Recipe per cup of plastisol</h3>
              {s.recipe.length === 0 ? (
                <p className="text-sm text-ink-soft">No recipe lines were recorded with this pour.</p>
              ) : (
                <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
                  {zonesOf(s).map((zone) => (
                    <div key={zone} className="contents">
                      <dt className="font-medium capitalize">{zone}</dt>
                      <dd>
                        <ul>
                          {s.recipe.filter((r) => r.zone === zone).map((l, i) => (
                            <li key={`${l.colorantId}-${i}`}><span className="num font-medium">{formatDose(l.amount, l.unit)}</span> {l.colorant}</li>
                          ))}
                        </ul>
                      </dd>
                    </div>
                  ))}
                </dl>
              )}
            </div>
            <div className="flex flex-wrap gap-2">
              <Link href={`/matches/${s.matchId}?pour=${s.standardPourId}`} className={linkClass}>Open the match</Link>
              <Link href={`/plan?standard=${s.matchId}`} className={linkClass}>Plan a run</Link>
              {s.lastBatch ? <Link href={`/batches/${s.lastBatch.id}/sheet`} className={linkClass}>Last batch sheet</Link> : null}
            </div>
          </article>
        </li>
      ))}
    </ul>
  );
}

// Zones that carry recipe lines, in the standard's zone order.
function zonesOf(s: StandardView): string[] {
  const names = [...s.zones.map((z) => z.name), ...s.recipe.map((r) => r.zone)];
  return names.filter((z, i) => names.indexOf(z) === i && s.recipe.some((r) => r.zone === z));
}
