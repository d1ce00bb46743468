import { money } from '@/components/library/format';
import { ML_PER_CUP } from '@/lib/recipes/units';
import { formatMl, formatVolume, trimmed, unitLabel } from '@/lib/format';
import type { Sheet } from './sheet-tables';

const th = 'border-b border-panel-line p-2 text-left font-semibold';
const td = 'border-b border-panel-line p-2 align-top';

export const price = (n: number, currency: string) => `${currency} ${money(n)}`;

// The run plan the batch was poured to: shots of each mold, baits, plastisol.
export function SheetPlan({ sheet }: { sheet: Sheet }) {
  const plan = sheet.plan;
  if (!plan) return null;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <thead><tr><th className={th}>Mold</th><th className={`${th} text-right`}>Shots</th><th className={`${th} text-right`}>Baits</th><th className={`${th} text-right`}>Plastisol</th><th className={`${th} hidden w-16 text-center print:table-cell`}>Done</th></tr></thead>
        <tbody>
          {plan.molds.map((m) => (
            <tr key={m.id}>
              <td className={td}>{m.name}<span className="block text-xs">{m.cavities} × {formatMl(m.mlPerCavity)}{sheet.sprueAllowanceMl ? ` + ${trimmed(sheet.sprueAllowanceMl)} mL sprue` : ''} per shot</span></td>
              <td className={`${td} num text-right text-base font-semibold`}>{m.shots}</td>
              <td className={`${td} num text-right`}>{m.baits}</td>
              <td className={`${td} num text-right`}>{formatMl(m.ml)}</td>
              <td className={`${td} hidden text-center print:table-cell`}><span aria-hidden className="inline-block h-4 w-4 border border-ink" /></td>
            </tr>
          ))}
          <tr className="font-semibold"><td className={td}>In all</td><td className={`${td} num text-right`}>{plan.shots}</td><td className={`${td} num text-right`}>{plan.baits}</td><td className={`${td} num text-right`}>{formatMl(plan.neededMl)}</td><td className={`${td} hidden print:table-cell`} /></tr>
        </tbody>
      </table>
      <p className="mt-1 text-sm">
        {plan.shortMl > 0
          ? <span className="font-semibold"><span aria-hidden>▲ </span>The batch is {formatMl(plan.shortMl)} short of the plan: mix more or pour fewer shots.</span>
          : `Left over after the plan: ${formatMl(plan.leftoverMl)} (${formatVolume(plan.leftoverMl / ML_PER_CUP, sheet.volumeUnit)}).`}
        {' '}Sprue: {formatMl(plan.sprueMl)} of the total.
      </p>
    </div>
  );
}

// What the batch cost, per bait and per bait in each mold; lines without a
// cost are named, never counted as free.
export function SheetCost({ sheet }: { sheet: Sheet }) {
  const c = sheet.cost;
  return (
    <div className="space-y-1 text-sm">
      <p><span className="font-semibold">Batch:</span> <span className="num">{c.complete ? '' : 'at least '}{price(c.total, c.currency)}</span>
        {c.perBait !== null ? <> · <span className="font-semibold">per bait:</span> <span className="num">{c.complete ? '' : 'at least '}{price(c.perBait, c.currency)}</span></> : null}</p>
      {c.molds.length ? (
        <ul className="num">{c.molds.map((m) => <li key={m.id}>Per bait in {m.name}: {price(m.perBait, c.currency)} ({formatMl(m.mlPerBait)} a bait with its share of sprue)</li>)}</ul>
      ) : null}
      {c.missing.length ? <p className="font-semibold"><span aria-hidden>▲ </span>No cost in the library for: {c.missing.join(', ')} — left out of these figures.</p> : null}
    </div>
  );
}

// What the batch took from stock, and where the shelf went below zero.
export function SheetStock({ sheet }: { sheet: Sheet }) {
  if (sheet.stock.length === 0) return <p className="text-sm">This batch moved no stock (logged before stock was kept, or nothing it uses is in the library).</p>;
  return (
    <div className="text-sm">
      <ul className="num">
        {sheet.stock.map((m) => (
          <li key={m.colorantId}>{m.name}: {trimmed(-m.amount)} {unitLabel(m.unit)} out, {trimmed(m.balance)} {unitLabel(m.unit)} left{m.balance < 0 ? ' — below zero' : ''}</li>
        ))}
      </ul>
      {sheet.belowZero.length ? <p className="mt-1 font-semibold"><span aria-hidden>▲ </span>Stock went below zero for {sheet.belowZero.join(', ')}: count the shelf and record a delivery or an adjustment.</p> : null}
    </div>
  );
}
