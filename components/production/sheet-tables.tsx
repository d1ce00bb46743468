import type { loadBatchSheet } from '@/lib/batches/loadBatchSheet';
import { formatDose, formatMl, formatVolume, trimmed } from '@/lib/format';

export type Sheet = Awaited<ReturnType<typeof loadBatchSheet>>;
const th = 'border-b border-panel-line p-2 text-left font-semibold';
const td = 'border-b border-panel-line p-2 align-top';
// Columns a phone can do without (they come back on wider screens and on paper).
const wide = 'hidden sm:table-cell print:table-cell';
const paper = 'hidden print:table-cell';

// The standard's recipe scaled to each layer's own cups, one table per layer, in the
// units the pourer doses; approximate millilitres where the unit allows
// (drops through the team's dropper setting, teaspoons by 1/48 cup).
export function SheetRecipe({ sheet }: { sheet: Sheet }) {
  return (
    <div className="space-y-3">
      {sheet.layout.map((layer) => (
        <div key={layer.zone} className="sheet-keep overflow-x-auto">
          <h3 className="font-semibold"><span className="capitalize">{layer.zone}</span> <span className="num font-normal">— {sheet.laminate ? 'its own cup: ' : 'for '}{formatVolume(layer.cups, sheet.volumeUnit)}{sheet.volumeUnit === 'ml' ? '' : ` (${formatMl(layer.ml)})`} of plastisol</span></h3>
          {layer.recipe.length === 0 ? (
            <p className="text-sm">No colorants recorded for this layer: plain plastisol.</p>
          ) : (
            <table className="mt-1 w-full border-collapse text-sm">
              <thead>
                <tr>
                  <th className={th}>Colorant</th><th className={`${th} text-right sm:w-44`}>This batch</th><th className={`${th} text-right sm:w-28`}>Per cup</th>
                  <th className={`${th} text-right sm:w-28`}>≈ mL</th><th className={`${th} ${paper} w-16 text-center`}>Done</th>
                </tr>
              </thead>
              <tbody>
                {layer.recipe.map((l, i) => (
                  <tr key={`${l.colorantId}-${i}`}>
                    <td className={td}>{l.colorant}</td>
                    <td className={`${td} num text-right text-base font-semibold`}>{formatDose(l.total, l.unit)}</td>
                    <td className={`${td} num text-right`}>{formatDose(l.perCup, l.unit)}</td>
                    <td className={`${td} num text-right`}>{l.unit === 'ml' ? '' : l.approxMl === null ? 'by weight' : `≈ ${formatMl(l.approxMl)}`}</td>
                    <td className={`${td} ${paper} text-center`}><span aria-hidden className="inline-block h-4 w-4 border border-ink" /></td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </div>
      ))}
      <p className="text-xs">Drops counted at {trimmed(sheet.dropsPerMl, 1)} drops per mL (the shop’s dropper setting); 1 tsp = 1/48 cup = 4.93 mL; 1 cup = 236.59 mL.</p>
    </div>
  );
}

// Every mold the batch could fill: full shots and baits, the batch's own mold first.
export function SheetMolds({ sheet }: { sheet: Sheet }) {
  if (sheet.molds.length === 0) return <p className="text-sm">No molds in the library.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-sm">
        <thead>
          <tr><th className={th}>Mold</th><th className={`${th} ${wide} text-right`}>Cavities × mL</th><th className={`${th} text-right`}>Per shot</th><th className={`${th} text-right`}>Shots</th><th className={`${th} text-right`}>Baits</th><th className={`${th} ${wide} text-right`}>Left over</th></tr>
        </thead>
        <tbody>
          {sheet.molds.map((m) => (
            <tr key={m.id} className={m.selected ? 'font-semibold' : undefined}>
              <td className={td}>{m.selected ? <span aria-hidden>► </span> : null}{m.name}{m.selected ? ' (this batch)' : ''}<span className="block text-xs font-normal">{m.thickness} body · {m.cavities} cavities</span></td>
              <td className={`${td} ${wide} num text-right`}>{m.cavities} × {formatMl(m.mlPerCavity)}</td>
              <td className={`${td} num text-right`}>{m.mlPerShot === null ? '—' : formatMl(m.mlPerShot)}</td>
              <td className={`${td} num text-right`}>{m.shots ?? '—'}</td>
              <td className={`${td} num text-right`}>{m.baits ?? '—'}</td>
              <td className={`${td} ${wide} num text-right`}>{m.leftoverMl === null ? '—' : formatMl(m.leftoverMl)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="mt-1 text-xs">
        Yield = batch volume ÷ (mL per cavity × cavities{sheet.sprueAllowanceMl ? ` + ${formatMl(sheet.sprueAllowanceMl)} sprue` : ''}), full shots only.
      </p>
    </div>
  );
}
