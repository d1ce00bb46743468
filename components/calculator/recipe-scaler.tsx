'use client';

import { useState } from 'react';
import useSWR from 'swr';
import { HeatCaution } from '@/components/safety/heat-caution';
import { Button } from '@/components/ui/button';
import { Field, inputClass } from '@/components/ui/field';
import { DOSE_UNITS, type DoseUnit } from '@/db/schema';
import { swrFetcher } from '@/lib/http/client';
import { ML_PER_CUP, moldYield, scaleRecipe, toCups, VOLUME_LABEL, VOLUME_UNITS, type VolumeUnit } from '@/lib/recipes';

type Row = { name: string; amount: string; unit: DoseUnit; side: string };
type Mold = { id: string; name: string; cavities: number; mlPerCavity: number };
const SIDES = ['back', 'belly'];

// Scales a per-cup recipe to a batch in cups, fluid ounces, gallons or
// millilitres (the shop's batch size unit first), and says how many baits the
// batch fills in a mold. A laminate mixes each side in its own cup, so each
// side's doses scale to that side's own size.
export function RecipeScaler({ dropsPerMl, sprueAllowanceMl, volumeUnit = 'cups' }: { dropsPerMl: number; sprueAllowanceMl: number; volumeUnit?: VolumeUnit }) {
  const { data: molds } = useSWR<Mold[]>('/api/molds', swrFetcher);
  const [laminate, setLaminate] = useState(false);
  const [sizes, setSizes] = useState<Record<string, string>>({ one: '2', back: '1', belly: '1' });
  const [unit, setUnit] = useState<VolumeUnit>(volumeUnit);
  const [moldId, setMoldId] = useState('');
  const [rows, setRows] = useState<Row[]>([{ name: 'Pigment', amount: '6', unit: 'drops', side: 'back' }, { name: 'Flake', amount: '0.25', unit: 'tsp', side: 'back' }]);
  const sides = laminate ? SIDES : ['one'];
  const cupsOf = (side: string) => toCups(Number(sizes[side]), unit);
  const valid = sides.every((s) => cupsOf(s) > 0 && Number.isFinite(cupsOf(s)));
  const totalCups = sides.reduce((s, side) => s + cupsOf(side), 0);
  const scaled = valid
    ? sides.map((side) => ({
      side,
      lines: scaleRecipe(rows.filter((r) => Number(r.amount) > 0 && (!laminate || r.side === side)).map((r) => ({ zone: side, colorantId: r.name, name: r.name, amount: Number(r.amount), unit: r.unit })), cupsOf(side), dropsPerMl),
    }))
    : [];
  const mold = molds?.find((m) => m.id === moldId);
  const yieldOf = valid && mold ? moldYield(totalCups, mold, sprueAllowanceMl) : null;
  const set = (i: number, patch: Partial<Row>) => setRows(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  return (
    <section aria-labelledby="scale-h" className="space-y-3 rounded-lg border border-panel-line bg-white p-4">
      <h2 id="scale-h" className="text-lg font-semibold">Scale a recipe</h2>
      <label className="flex min-h-tap items-center gap-3 text-sm">
        <input type="checkbox" checked={laminate} onChange={(e) => setLaminate(e.target.checked)} className="h-5 w-5" />
        Laminate: back and belly, each mixed in its own cup
      </label>
      <div className="grid gap-3 sm:grid-cols-3">
        {sides.map((side) => (
          <Field key={side} label={side === 'one' ? 'Batch size' : `${side[0]!.toUpperCase()}${side.slice(1)} cup`}>
            <input type="number" min="0" step="any" value={sizes[side]} onChange={(e) => setSizes({ ...sizes, [side]: e.target.value })} className={inputClass} />
          </Field>
        ))}
        <Field label="Unit">
          <select value={unit} onChange={(e) => setUnit(e.target.value as VolumeUnit)} className={inputClass}>{VOLUME_UNITS.map((u) => <option key={u} value={u}>{VOLUME_LABEL[u]}</option>)}</select>
        </Field>
        <Field label="Mold">
          <select value={moldId} onChange={(e) => setMoldId(e.target.value)} className={inputClass}>
            <option value="">—</option>
            {(molds ?? []).map((m) => <option key={m.id} value={m.id}>{m.name}</option>)}
          </select>
        </Field>
      </div>
      <fieldset>
        <legend className="mb-1 text-sm font-medium">Doses per cup of plastisol</legend>
        <ul className="grid gap-2">
          {rows.map((r, i) => (
            <li key={i} className={`grid gap-2 ${laminate ? 'grid-cols-[1fr_5.5rem] sm:grid-cols-[1fr_6rem_6rem_6rem_auto]' : 'grid-cols-[1fr_5.5rem] sm:grid-cols-[1fr_6rem_6rem_auto]'}`}>
              <input aria-label={`Dose ${i + 1} name`} value={r.name} onChange={(e) => set(i, { name: e.target.value })} className={inputClass} />
              <input aria-label={`Dose ${i + 1} amount`} type="number" min="0" step="any" value={r.amount} onChange={(e) => set(i, { amount: e.target.value })} className={inputClass} />
              <select aria-label={`Dose ${i + 1} unit`} value={r.unit} onChange={(e) => set(i, { unit: e.target.value as DoseUnit })} className={inputClass}>{DOSE_UNITS.map((u) => <option key={u}>{u}</option>)}</select>
              {laminate ? (
                <select aria-label={`Dose ${i + 1} side`} value={r.side} onChange={(e) => set(i, { side: e.target.value })} className={inputClass}>{SIDES.map((s) => <option key={s}>{s}</option>)}</select>
              ) : null}
              <Button type="button" variant="secondary" onClick={() => setRows(rows.filter((_, j) => j !== i))}>Remove</Button>
            </li>
          ))}
        </ul>
        <Button type="button" variant="secondary" className="mt-2" onClick={() => setRows([...rows, { name: '', amount: '', unit: 'drops', side: 'back' }])}>Add a dose</Button>
      </fieldset>
      {valid ? (
        scaled.map(({ side, lines }) => (
          <table key={side} className="w-full text-left text-sm" aria-label={side === 'one' ? 'Scaled recipe' : `Scaled recipe, ${side}`}>
            <thead><tr className="text-ink-soft"><th className="py-1 capitalize">{side === 'one' ? 'Colorant' : side}</th><th className="text-right">Per cup</th><th className="text-right">For {sizes[side]} {VOLUME_LABEL[unit]}</th><th className="text-right">≈ mL</th></tr></thead>
            <tbody>
              {lines.map((l, i) => (
                <tr key={i} className="border-t border-panel-line">
                  <td className="py-1">{l.name}</td>
                  <td className="text-right">{l.perCup} {l.unit}</td>
                  <td className="text-right font-semibold">{Number(l.total.toFixed(3))} {l.unit}</td>
                  <td className="text-right">{l.approxMl === null ? '—' : l.approxMl.toFixed(2)}</td>
                </tr>
              ))}
              {lines.length === 0 ? <tr><td colSpan={4} className="py-1 text-ink-soft">No doses for this side: plain plastisol.</td></tr> : null}
            </tbody>
          </table>
        ))
      ) : <p role="alert" className="text-sm text-band-off">Give {laminate ? 'each side' : 'a batch'} a size above 0.</p>}
      <p className="num text-sm text-ink-soft">
        {valid ? `${totalCups.toFixed(3)} cups = ${(totalCups * ML_PER_CUP).toFixed(1)} mL (1 cup = ${ML_PER_CUP.toFixed(7)} mL; drops at ${dropsPerMl} per mL, the shop's dropper setting).` : ''}
        {yieldOf ? ` ${mold!.name}: ${yieldOf.shots} shots of ${yieldOf.mlPerShot.toFixed(1)} mL → ${yieldOf.baits} baits, ${yieldOf.leftoverMl.toFixed(1)} mL left over.` : ''}
      </p>
      <HeatCaution compact />
    </section>
  );
}
