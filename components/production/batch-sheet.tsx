import Link from 'next/link';
import { Figure } from '@/components/ui/figure';
import { SAFETY_CAUTIONS, TEMPERATURE_CAUTION } from '@/lib/batches/safetyCautions';
import { formatDeltaE, formatLab, formatMl, formatTemp, formatVolume } from '@/lib/format';
import { SheetCost, SheetPlan, SheetStock } from './sheet-production';
import { PassBadge } from './pass-badge';
import { SheetQc } from './sheet-qc';
import { PrintButton } from './print-button';
import { type Sheet, SheetMolds, SheetRecipe } from './sheet-tables';
import { ThicknessRedose } from './thickness-redose';
import { When } from '@/components/ui/when';

const box = 'rounded-lg border border-panel-line bg-white p-4';

function layerLabel(position: number, count: number) {
  if (count === 1) return 'one colour';
  if (position === 0) return `layer 1 of ${count}: top, the back side`;
  if (position === count - 1) return `layer ${count} of ${count}: bottom, the belly side`;
  return `layer ${position + 1} of ${count}`;
}

// The pourer's sheet for one batch of a standard: cautions first, then the
// temperature, the recipe scaled to the batch (mixed first), the laminate
// layout (loaded next) and the molds with their yield. Prints black on white (print.css beside the page).
export function BatchSheet({ sheet }: { sheet: Sheet }) {
  // The temperature caution stands beside the temperature; the rest go first.
  const safety = sheet.cautions.filter((c) => SAFETY_CAUTIONS.includes(c) && c !== TEMPERATURE_CAUTION);
  const notes = sheet.cautions.filter((c) => !SAFETY_CAUTIONS.includes(c));
  const mold = sheet.molds.find((m) => m.selected);
  return (
    <article className="batch-sheet mx-auto max-w-4xl space-y-4" aria-label="Batch sheet">
      <header className="space-y-2">
        <div className="flex flex-wrap items-start justify-between gap-2">
          <div>
            <p className="text-sm font-medium">Batch sheet</p>
            <h1 className="text-2xl font-semibold">{sheet.match.name}</h1>
          </div>
          <div className="no-print flex flex-wrap gap-2">
            <Link href={`/matches/${sheet.match.id}?batch=${sheet.batch.id}`} className="inline-flex min-h-tap items-center rounded-md border border-panel-line bg-white px-4 font-medium">Back to the match</Link>
            <PrintButton />
          </div>
        </div>
        <dl className="grid grid-cols-2 gap-x-4 gap-y-1 text-sm sm:grid-cols-4">
          <Figure label="Batch size"><span className="num">{formatVolume(sheet.cups, sheet.volumeUnit)}{sheet.volumeUnit === 'ml' ? '' : ` (${formatMl(sheet.batchMl)})`}</span></Figure>
          <Figure label="Standard">pour #{sheet.standard.number}</Figure>
          <Figure label="Mold">{mold ? mold.name : 'not given'}</Figure>
          <Figure label="Expected yield"><span className="num">{sheet.batch.baitsExpected ?? mold?.baits ?? '—'} baits</span></Figure>
          <Figure label="Cost per bait"><span className="num">{sheet.cost.perBait === null ? '—' : `${sheet.cost.complete ? '' : '≥ '}${sheet.cost.currency} ${sheet.cost.perBait.toFixed(3)}`}</span></Figure>
          <Figure label="Logged"><span className="num"><When at={sheet.batch.createdAt} dayOnly /></span></Figure>
          <Figure label="QC against the standard"><PassBadge pass={sheet.batch.pass} /></Figure>
          <Figure label="Tolerance"><span className="num">{formatDeltaE(sheet.match.tolerance)} ΔE00</span></Figure>
          <Figure label="Baits counted"><span className="num">{sheet.batch.baits ?? '____'}</span></Figure>
        </dl>
        <SheetQc sheet={sheet} />
      </header>

      <section aria-labelledby="sheet-safety" className={`${box} sheet-keep border-2 border-ink`}>
        <h2 id="sheet-safety" className="text-lg font-semibold"><span aria-hidden>⚠ </span>Safety first</h2>
        <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm">{safety.map((c) => <li key={c}>{c}</li>)}</ul>
      </section>

      <section aria-labelledby="sheet-temp" className={`${box} sheet-keep`}>
        <h2 id="sheet-temp" className="text-lg font-semibold">Temperature</h2>
        {sheet.tempF === null || sheet.tempC === null ? (
          <p className="text-sm">The standard pour has no temperature recorded.</p>
        ) : (
          <p className="num text-2xl font-semibold">{formatTemp(sheet.tempF)}</p>
        )}
        {sheet.tempNote ? <p className="mt-1 text-sm font-semibold"><span aria-hidden>▲ </span>{sheet.tempNote}</p> : null}
        <p className="mt-1 text-sm">{TEMPERATURE_CAUTION}</p>
      </section>

      <section aria-labelledby="sheet-recipe" className={box}>
        <h2 id="sheet-recipe" className="text-lg font-semibold">Recipe for this batch</h2>
        <SheetRecipe sheet={sheet} />
      </section>
      {sheet.thicknessRedose ? <ThicknessRedose redose={sheet.thicknessRedose} /> : null}

      <section aria-labelledby="sheet-layout" className={`${box} sheet-keep`}>
        <h2 id="sheet-layout" className="text-lg font-semibold">{sheet.laminate ? `Laminate: ${sheet.order}` : 'Colour'}</h2>
        {sheet.laminate ? <p className="text-sm">Load each colour in its own barrel or cup; the first layer is the top of the bait (the back), the last the bottom (the belly).</p> : null}
        <ol className="sheet-stage mt-2 flex flex-wrap gap-4 rounded-md bg-stage p-4">
          {sheet.layout.map((l) => (
            <li key={l.zone} className="w-44">
              <div className="swatch h-14 rounded-sm border border-stage-rule" style={{ background: l.hex ?? '#777777', ['--swatch' as string]: l.hex ?? '#777777' }} />
              <p className="mt-1 text-sm font-semibold capitalize text-white">{l.zone}</p>
              <p className="text-xs text-white">{layerLabel(l.position, sheet.layout.length)}</p>
              <p className="num text-sm font-semibold text-white">{formatVolume(l.cups, sheet.volumeUnit)}{sheet.volumeUnit === 'ml' ? '' : ` (${formatMl(l.ml)})`}</p>
              {l.lab ? <p className="num text-xs text-white">{formatLab(l.lab)}{l.uncertainty ? ` ± ${l.uncertainty.toFixed(2)} ΔE00` : ''}</p> : null}
            </li>
          ))}
        </ol>
        <p className="mt-1 text-xs">Swatches as measured on the standard pour (CIELAB, D65 white; ± about 95 % sure). Screen and paper colours are a guide only: judge the bait against the standard bait.</p>
      </section>

      {sheet.plan ? (
        <section aria-labelledby="sheet-plan" className={`${box} sheet-keep`}>
          <h2 id="sheet-plan" className="text-lg font-semibold">Run plan</h2>
          <SheetPlan sheet={sheet} />
        </section>
      ) : null}

      <section aria-labelledby="sheet-molds" className={`${box} sheet-keep`}>
        <h2 id="sheet-molds" className="text-lg font-semibold">Molds and expected yield</h2>
        <SheetMolds sheet={sheet} />
      </section>

      <section aria-labelledby="sheet-cost" className={`${box} sheet-keep`}>
        <h2 id="sheet-cost" className="text-lg font-semibold">Cost and stock</h2>
        <SheetCost sheet={sheet} />
        <h3 className="mt-2 font-semibold">Taken from stock</h3>
        <SheetStock sheet={sheet} />
      </section>

      <section aria-labelledby="sheet-notes" className={`${box} sheet-keep`}>
        <h2 id="sheet-notes" className="text-lg font-semibold">At the pot</h2>
        <ul className="mt-1 list-disc space-y-0.5 pl-5 text-sm">{notes.map((c) => <li key={c}>{c}</li>)}</ul>
        {sheet.batch.notes ? <p className="mt-2 text-sm"><span className="font-semibold">Batch notes:</span> {sheet.batch.notes}</p> : null}
      </section>
    </article>
  );
}
